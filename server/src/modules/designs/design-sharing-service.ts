import { randomBytes } from 'node:crypto';
import type { Db } from '../../db/knex.ts';
import { findDesignByShareToken, findOwnedShareToken, setOwnedShareToken } from './design-share-repo.ts';
import { restoreDesign } from '../../contracts/designs.ts';
import type { DesignShareResponse, SharedDesignResponse } from '../../contracts/design-sharing.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import {
  designUploadPictures,
  ownedArtworkImage,
  uploadIdsIn,
  uploadsOf,
  type ArtworkImage,
} from '../artwork/artwork-service.ts';

/** Where a shared link's viewer fetches one of the design's uploads: through the link, as the owner's are private. */
export const sharedUploadImageUrl = (shareToken: string, uploadId: number) =>
  `/api/shared-designs/${shareToken}/uploads/${uploadId}/image`;

/** 18 random bytes: 144 bits, 24 URL-safe characters, far past guessing. */
export const randomShareToken = () => randomBytes(18).toString('base64url');

/**
 * Read-only links to a customer's designs. Only the owner turns a link on or off (anyone else's design answers as
 * a missing one); the link shows the design on its garment and nothing about the person who made it. A design keeps
 * one link: sharing again gives the same one, and switching it off makes that link dead for good.
 */
export function createDesignSharingService(deps: { db: Db; newShareToken?: () => string }) {
  const { db } = deps;
  const newShareToken = deps.newShareToken ?? randomShareToken;

  /** Turns the design's link on, or gives the one it already has. */
  async function share(customerId: number, id: number): Promise<Result<DesignShareResponse>> {
    return db.transaction(async (trx) => {
      const key = { id, customerId };
      const current = await findOwnedShareToken(trx, key);
      if (current === undefined) return noSuchDesign(id);
      if (current !== null) return ok({ shareToken: current });
      const shareToken = newShareToken();
      await setOwnedShareToken(trx, key, shareToken);
      return ok({ shareToken });
    });
  }

  /** Switches the design's link off; a design that was not shared stays so. */
  async function unshare(customerId: number, id: number): Promise<Result<void>> {
    const isFound = await setOwnedShareToken(db, { id, customerId }, null);
    return isFound ? ok(undefined) : noSuchDesign(id);
  }

  /** What a shared link shows: the garment choices and the document, restored, without the owner or any ids of theirs. */
  async function viewShared(shareToken: string): Promise<Result<SharedDesignResponse>> {
    const stored = await findDesignByShareToken(db, shareToken);
    if (!stored)
      return failure('not-found', 'This link does not open a design: its owner may have stopped sharing it.');
    const restored = restoreDesign(stored.document);
    if (!restored.success) throw new Error(`Shared design ${stored.id} no longer restores: ${restored.error.message}`);
    const { name, garmentId, sizeId, colourId } = stored;
    const pictures = await designUploadPictures(db, stored.customerId, [restored.data], (id) =>
      sharedUploadImageUrl(shareToken, id),
    );
    return ok({
      design: {
        name,
        garmentId,
        sizeId,
        colourId,
        document: restored.data,
        uploads: uploadsOf(restored.data, pictures),
      },
    });
  }

  /** A picture the shared design places, through its link: only one the design names and its owner uploaded. */
  async function sharedUploadImage(shareToken: string, uploadId: number): Promise<Result<ArtworkImage>> {
    const stored = await findDesignByShareToken(db, shareToken);
    const restored = stored ? restoreDesign(stored.document) : undefined;
    const image =
      stored && restored?.success && uploadIdsIn(restored.data).includes(uploadId)
        ? await ownedArtworkImage(db, stored.customerId, uploadId)
        : undefined;
    return image
      ? ok(image)
      : failure('not-found', 'This link shows no such picture: its owner may have stopped sharing it.');
  }

  return { share, unshare, viewShared, sharedUploadImage };
}

export type DesignSharingService = ReturnType<typeof createDesignSharingService>;

function noSuchDesign(id: number): Result<never> {
  return failure('not-found', `There is no design ${id}.`);
}
