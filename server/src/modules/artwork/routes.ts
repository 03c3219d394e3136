import { Router, type Response } from 'express';
import type { ArtworkImage } from './artwork-repo.ts';
import type { z } from 'zod';
import { artworkOwnerForUpload, artworkOwnerOf } from './artwork-owner.ts';
import { artworkIdParams } from '../../contracts/artwork.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validate } from '../../middleware/validate.ts';
import type { ArtworkService } from './artwork-service.ts';
import { singleUpload } from '../../middleware/upload.ts';

type ArtworkIdParams = z.infer<typeof artworkIdParams>;

/**
 * An SVG is only ever shown as a picture, but opened on its own it would be a document of this origin; so it gets
 * a policy that runs nothing and loads nothing (its inline styles aside), and the browser may not guess its type.
 */
const SVG_POLICY = "default-src 'none'; style-src 'unsafe-inline'";

/** Sends a stored upload as a picture, private to whoever may see it. */
export function sendArtworkImage(res: Response, image: ArtworkImage): void {
  res.set('X-Content-Type-Options', 'nosniff');
  // Private: a shared cache must not keep it, but the viewer's browser may for a moment.
  res.set('Cache-Control', 'private, max-age=300');
  if (image.kind === 'svg') {
    res.set('Content-Security-Policy', SVG_POLICY);
    res.type('image/svg+xml').send(image.svg);
  } else {
    res.type('image/png').send(image.png);
  }
}

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
  router.get('/:id', validate(artworkIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as ArtworkIdParams;
    sendResult(res, await deps.artwork.get(artworkOwnerOf(req), id));
  });
  router.get('/:id/image', validate(artworkIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as ArtworkIdParams;
    const found = await deps.artwork.image(artworkOwnerOf(req), id);
    if (!found.ok) return sendResult(res, found);
    sendArtworkImage(res, found.value);
  });
  return router;
}
