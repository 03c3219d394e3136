import { Router } from 'express';
import { sharedUploadParams, shareTokenParams } from '../../contracts/design-sharing.ts';
import { sendArtworkImage } from '../artwork/send-artwork-image.ts';
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
  router.get(
    '/:token/uploads/:uploadId/image',
    validated({ params: sharedUploadParams }, async ({ params }, _req, res) => {
      const image = await deps.sharing.sharedUploadImage(params.token, params.uploadId);
      if (!image.ok) return sendResult(res, image);
      sendArtworkImage(res, image.value);
    }),
  );
  return router;
}
