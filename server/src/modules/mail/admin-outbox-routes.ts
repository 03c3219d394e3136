import { Router } from 'express';
import { outboxIdParams, outboxQuery } from '../../contracts/admin-outbox.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validated } from '../../middleware/validate.ts';
import type { OutboxService } from './outbox-service.ts';

/** Every e-mail the server sent or tried to send, for the whole studio team. */
export function createAdminOutboxRouter(deps: { outbox: OutboxService }): Router {
  const router = Router();
  router.get(
    '/',
    validated({ query: outboxQuery }, async ({ query }, _req, res) => {
      res.json(await deps.outbox.page(query));
    }),
  );
  router.get(
    '/:id',
    validated({ params: outboxIdParams }, async ({ params }, _req, res) => {
      sendResult(res, await deps.outbox.message(params.id));
    }),
  );
  router.post(
    '/:id/resend',
    validated({ params: outboxIdParams }, async ({ params }, _req, res) => {
      sendResult(res, await deps.outbox.resend(params.id));
    }),
  );
  return router;
}
