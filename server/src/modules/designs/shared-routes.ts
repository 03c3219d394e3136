import { Router } from 'express';
import { shareTokenParams } from '../../contracts/design-sharing.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { DesignSharingService } from './design-sharing-service.ts';

/** Designs shared by link: public and read-only; the link's code is the only key. */
export function createSharedDesignsRouter(deps: { sharing: DesignSharingService }): Router {
  const router = Router();
  router.get(
    '/:token',
    validated({ params: shareTokenParams }, async ({ params }, _req, res) => {
      sendResult(res, await deps.sharing.viewShared(params.token));
    }),
  );
  return router;
}
