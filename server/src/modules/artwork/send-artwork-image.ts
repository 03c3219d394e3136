import type { Response } from 'express';
import type { ArtworkImage } from './artwork-repo.ts';

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
