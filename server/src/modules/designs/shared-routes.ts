import { Router } from 'express';
import type { z } from 'zod';
import { shareTokenParams } from '../../contracts/design-sharing.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { DesignSharingService } from './design-sharing-service.ts';

/** Designs shared by link: public and read-only; the link's code is the only key. */
export function createSharedDesignsRouter(deps: { sharing: DesignSharingService }): Router {
  const router = Router();
  router.get('/:token', validate(shareTokenParams, 'params'), async (_req, res) => {
    const { token } = res.locals.params as z.infer<typeof shareTokenParams>;
    sendResult(res, await deps.sharing.viewShared(token));
  });
  return router;
}
