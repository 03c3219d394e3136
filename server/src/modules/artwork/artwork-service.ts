import type { Db } from '../../db/knex.ts';
import {
  claimSessionArtwork,
  countOwnedArtwork,
  findOwnedArtwork,
  findOwnedArtworkImage,
  insertArtwork,
  listOwnedArtwork,
  loadOwnedArtworkForQuote,
  loadOwnedArtworkPictures,
  lockArtworkOwner,
  type ArtworkImage,
  type ArtworkMeta,
  type ArtworkOwner,
  type ArtworkPicture,
} from './artwork-repo.ts';
import type { ArtworkUpload, DesignUploadPicture } from '../../contracts/artwork.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { SvgArtworkFigures } from '../../engine/index.ts';
import { asBuffer, type HeavyWork } from '../../integrations/heavy-work.ts';
import type { InspectedUpload } from '../../integrations/inspect-upload.ts';

/** Enough to pick from earlier uploads; a studio's customers upload a drawing or two. */
const LISTED_UPLOADS = 50;
/**
 * Uploads are open to visitors who have not signed in, so each owner may keep only so many: a visitor a handful
 * (signing in moves them to the account), an account more than any family needs.
 */
const MAX_VISITOR_UPLOADS = 10;
const MAX_ACCOUNT_UPLOADS = 200;
/** Kept to the name's ending: browsers send a bare name, but some send a path. */
const MAX_NAME_LENGTH = 255;

/**
 * The customer's own artwork. The bytes decide the type (never the name or the browser's Content-Type), only the
 * clean copy is kept, and each upload is seen only by its owner: anyone else gets the same answer as for a
 * missing one, so ids reveal nothing.
 */
export function createArtworkService(deps: { db: Db; now: () => Date; heavyWork: HeavyWork }) {
  const { db } = deps;

  /** Refused when the owner has as many uploads as they may keep; `db` may be a transaction holding their lock. */
  async function checkCap(on: Db, owner: ArtworkOwner): Promise<Result<void>> {
    const isVisitor = 'sessionKey' in owner;
    if ((await countOwnedArtwork(on, owner)) < (isVisitor ? MAX_VISITOR_UPLOADS : MAX_ACCOUNT_UPLOADS))
      return ok(undefined);
    const message = isVisitor
      ? `You have uploaded ${MAX_VISITOR_UPLOADS} pictures already; sign in to upload more, and they come with you.`
      : `You have uploaded ${MAX_ACCOUNT_UPLOADS} pictures, as many as we keep for one account; get in touch with the studio for more.`;
    return failure('conflict', message, { file: message });
  }

  async function upload(
    owner: ArtworkOwner,
    file: { buffer: Buffer; originalName: string } | undefined,
  ): Promise<Result<{ artwork: ArtworkUpload }>> {
    if (!file) return failure('invalid', 'Choose a picture to upload.', { file: 'Choose a picture to upload.' });
    // A first look spares the inspection when the cap is plainly reached; the count that decides is taken below.
    const early = await checkCap(db, owner);
    if (!early.ok) return early;
    const inspected = await deps.heavyWork.run<{ upload: InspectedUpload; figures: SvgArtworkFigures | null }>(
      'inspectArtwork',
      { bytes: file.buffer },
    );
    if (!inspected.ok) return { ok: false, error: { ...inspected.error, fields: { file: inspected.error.message } } };
    const { upload: clean, figures } = inspected.value;
    const image: ArtworkImage =
      clean.kind === 'svg'
        ? { kind: 'svg', svg: withIntrinsicSize(clean.svg, clean.widthPx, clean.heightPx) }
        : { kind: 'raster', png: asBuffer(clean.png) };
    // Counted and inserted under the owner's lock, so parallel uploads cannot all pass the same count.
    const stored = await db.transaction(async (trx): Promise<Result<number>> => {
      await lockArtworkOwner(trx, owner, deps.now());
      const cap = await checkCap(trx, owner);
      if (!cap.ok) return cap;
      return ok(
        await insertArtwork(trx, owner, {
          originalName: nameOf(file.originalName),
          // What is stored, not what was sent: rasters are kept as PNG whatever they came as.
          mimeType: clean.kind === 'svg' ? 'image/svg+xml' : 'image/png',
          widthPx: clean.widthPx,
          heightPx: clean.heightPx,
          image,
          stitchFigures: figures,
          createdAt: deps.now(),
        }),
      );
    });
    return stored.ok ? get(owner, stored.value) : stored;
  }

  async function get(owner: ArtworkOwner | undefined, id: number): Promise<Result<{ artwork: ArtworkUpload }>> {
    const meta = owner && (await findOwnedArtwork(db, owner, id));
    return meta ? ok({ artwork: toUpload(meta) }) : noSuchArtwork(id);
  }

  async function image(owner: ArtworkOwner | undefined, id: number): Promise<Result<ArtworkImage>> {
    const found = owner && (await findOwnedArtworkImage(db, owner, id));
    return found ? ok(found) : noSuchArtwork(id);
  }

  async function list(owner: ArtworkOwner | undefined): Promise<Result<{ artworks: ArtworkUpload[] }>> {
    const stored = owner ? await listOwnedArtwork(db, owner, LISTED_UPLOADS) : [];
    return ok({ artworks: stored.map(toUpload) });
  }

  /** At sign-in: what the visitor uploaded in this browser becomes the account's. */
  async function claim(sessionKey: string, userId: number): Promise<void> {
    await claimSessionArtwork(db, sessionKey, userId);
  }

  return { upload, get, image, list, claim };
}

export type ArtworkService = ReturnType<typeof createArtworkService>;

function noSuchArtwork(id: number): Result<never> {
  return failure('not-found', `There is no artwork ${id}.`);
}

function nameOf(raw: string): string {
  const base = raw.split(/[\\/]/).at(-1)?.trim() ?? '';
  return (base || 'artwork').slice(-MAX_NAME_LENGTH);
}

/**
 * Gives the drawing's root its size in pixels. Shown as a picture, an SVG without a width and height is drawn at
 * CSS's default 300 × 150 whatever its viewBox, squashing a child's drawing; the viewBox keeps the content's own
 * coordinates, so stitch estimates are unchanged.
 */
export function withIntrinsicSize(svg: string, widthPx: number, heightPx: number): string {
  return svg.replace(/<svg\b[^>]*>/i, (root) =>
    root
      .replace(/\s(?:width|height)\s*=\s*("[^"]*"|'[^']*')/gi, '')
      .replace(/^<svg\b/i, `<svg width="${widthPx}" height="${heightPx}"`),
  );
}

export const artworkImageUrl = (id: number) => `/api/artwork/${id}/image`;

function toUpload(meta: ArtworkMeta): ArtworkUpload {
  return { ...meta, imageUrl: artworkImageUrl(meta.id) };
}

export type { ArtworkImage, ArtworkOwner, ArtworkPicture };

/**
 * The drawings of these uploads that this owner may use, for pricing and production sheets: other owners' uploads
 * are left out. `db` may be the caller's transaction.
 */
export const artworkForQuote = (db: Db, owner: ArtworkOwner, ids: number[]) => loadOwnedArtworkForQuote(db, owner, ids);

/**
 * The clean copies of these uploads that this owner may use, with their proportions: what every picture of a design
 * (the proof, the production sheet's template) draws an upload from. `db` may be the caller's transaction.
 */
export const artworkPicturesFor = (db: Db, owner: ArtworkOwner, ids: number[]) =>
  loadOwnedArtworkPictures(db, owner, ids);

/** The upload ids a design's artwork placements name, each once. */
export const uploadIdsIn = (document: DesignDocument) => [
  ...new Set(document.placements.flatMap((p) => (p.kind === 'artwork' ? [p.artworkUploadId] : []))),
];

/**
 * The uploads these designs place, as their pictures draw them: proportions and the address the viewer fetches
 * each from (`imageUrlOf`; the owner's own by default). Only the owner's uploads; one read for all the designs.
 */
export async function designUploadPictures(
  db: Db,
  ownerUserId: number,
  documents: readonly DesignDocument[],
  imageUrlOf: (id: number) => string = artworkImageUrl,
): Promise<Map<number, DesignUploadPicture>> {
  const ids = [...new Set(documents.flatMap(uploadIdsIn))];
  const rows = await loadOwnedArtworkForQuote(db, { userId: ownerUserId }, ids);
  return new Map(
    rows.map((row) => [
      row.id,
      { uploadId: row.id, widthPx: row.widthPx, heightPx: row.heightPx, imageUrl: imageUrlOf(row.id) },
    ]),
  );
}

/** The pictures of one design's uploads, from the map `designUploadPictures` read. */
export const uploadsOf = (document: DesignDocument, pictures: ReadonlyMap<number, DesignUploadPicture>) =>
  uploadIdsIn(document).flatMap((id) => {
    const picture = pictures.get(id);
    return picture ? [picture] : [];
  });

/** An upload's clean copy when this owner may use it, for a picture shown through a shared link. */
export async function ownedArtworkImage(db: Db, ownerUserId: number, id: number): Promise<ArtworkImage | undefined> {
  return findOwnedArtworkImage(db, { userId: ownerUserId }, id);
}
