import { Router } from 'express';
import { artworkOwnerForUpload, artworkOwnerOf } from './artwork-owner.ts';
import { sendArtworkImage } from './send-artwork-image.ts';
import { artworkIdParams } from '../../contracts/artwork.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validated } from '../../middleware/validate.ts';
import { singleUpload } from '../../middleware/upload.ts';
import type { ArtworkService } from './artwork-service.ts';

/** The customer's own artwork, for anyone designing, signed in or not; each upload reaches only its owner. */
export function createArtworkRouter(deps: { artwork: ArtworkService; uploadMaxBytes: number }): Router {
  const router = Router();
  router.post('/', singleUpload(deps.uploadMaxBytes), async (req, res) => {
    const file = req.file && { buffer: req.file.buffer, originalName: req.file.originalname };
    sendResult(res, await deps.artwork.upload(artworkOwnerForUpload(req), file), 201);
  });
  router.get('/', async (req, res) => {
    sendResult(res, await deps.artwork.list(artworkOwnerOf(req)));
  });
  router.get(
    '/:id',
    validated({ params: artworkIdParams }, async ({ params }, req, res) => {
      sendResult(res, await deps.artwork.get(artworkOwnerOf(req), params.id));
    }),
  );
  router.get(
    '/:id/image',
    validated({ params: artworkIdParams }, async ({ params }, req, res) => {
      const found = await deps.artwork.image(artworkOwnerOf(req), params.id);
      if (!found.ok) return sendResult(res, found);
      sendArtworkImage(res, found.value);
    }),
  );
  return router;
}
