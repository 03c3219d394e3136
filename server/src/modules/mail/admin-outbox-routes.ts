import { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { outboxIdParams, outboxPageSize, outboxQuery } from '../../contracts/admin-outbox.ts';
import { readOutboxMessage, readOutboxPage } from './outbox-repo.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { validate } from '../../middleware/validate.ts';

/** Every e-mail the server sent or tried to send, for the whole studio team. */
export function createAdminOutboxRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/', validate(outboxQuery, 'query'), async (_req, res) => {
    const query = res.locals.query as z.infer<typeof outboxQuery>;
    const { messages, total } = await readOutboxPage(deps.db, query, outboxPageSize);
    res.json({ messages, total, page: query.page, pageSize: outboxPageSize });
  });
  router.get('/:id', validate(outboxIdParams, 'params'), async (_req, res) => {
    const { id } = res.locals.params as z.infer<typeof outboxIdParams>;
    const message = await readOutboxMessage(deps.db, id);
    if (!message) throw new HttpError('not-found', `There is no message ${id} in the outbox.`);
    res.json({ message });
  });
  return router;
}
