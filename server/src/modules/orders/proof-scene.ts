import type { Db } from '../../db/knex.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import { artworkPicturesFor } from '../artwork/artwork-service.ts';
import { loadProofScene, type ProofScene, type SceneArtwork } from './proof-scene-repo.ts';

/**
 * The scene a proof draws: the order's design on its garment, with the customer's own uploads (a drawing or a
 * photo) taken from the artwork module's clean copies (the studio's changed version of the design when given), as every picture of a design takes them. Uploads are the
 * order's customer's: anyone else's id in the design draws nothing.
 */
export async function proofSceneFor(db: Db, orderId: number, design?: DesignDocument): Promise<ProofScene | undefined> {
  const loaded = await loadProofScene(db, orderId, design);
  if (!loaded) return undefined;
  const pictures = await artworkPicturesFor(db, { userId: loaded.customerId }, loaded.uploadIds);
  const artwork = new Map<number, SceneArtwork>(
    pictures.map((picture) => [
      picture.id,
      {
        href:
          picture.kind === 'svg'
            ? `data:image/svg+xml;base64,${Buffer.from(picture.svg).toString('base64')}`
            : `data:image/png;base64,${Buffer.from(picture.png).toString('base64')}`,
        widthPx: picture.widthPx,
        heightPx: picture.heightPx,
      },
    ]),
  );
  return { ...loaded.scene, artwork };
}
