import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';

/** Who is asking: the signed-in account, or the browser session of a visitor who has not signed in yet. */
export type ArtworkOwner = { userId: number } | { sessionKey: string };

export interface ArtworkMeta {
  id: number;
  /** `svg` when the clean copy is SVG text, `raster` when it is a PNG. */
  kind: 'svg' | 'raster';
  originalName: string;
  byteSize: number;
  widthPx: number;
  heightPx: number;
  createdAt: string;
}

/** The clean copy itself. */
export type ArtworkImage = { kind: 'svg'; svg: string } | { kind: 'raster'; png: Buffer };

export interface ArtworkWrite {
  originalName: string;
  mimeType: string;
  widthPx: number;
  heightPx: number;
  image: ArtworkImage;
  createdAt: Date;
}

const metaColumns = (db: Db) => [
  'id',
  'original_name',
  'byte_size',
  'width_px',
  'height_px',
  'created_at',
  db.raw('sanitized_svg IS NOT NULL AS is_svg'),
];

/** Rows the owner may see: an account's own, or a visitor's unclaimed ones. */
function ownedBy(query: Knex.QueryBuilder, owner: ArtworkOwner): Knex.QueryBuilder {
  return 'userId' in owner
    ? query.where({ owner_user_id: owner.userId })
    : query.whereNull('owner_user_id').andWhere({ session_key: owner.sessionKey });
}

function toMeta(row: Record<string, unknown>): ArtworkMeta {
  return {
    id: Number(row.id),
    kind: Number(row.is_svg) === 1 ? 'svg' : 'raster',
    originalName: String(row.original_name),
    byteSize: Number(row.byte_size),
    widthPx: Number(row.width_px),
    heightPx: Number(row.height_px),
    createdAt: (row.created_at as Date).toISOString(),
  };
}

export async function insertArtwork(db: Db, owner: ArtworkOwner, write: ArtworkWrite): Promise<number> {
  const { image } = write;
  const [id] = await db('artwork_uploads').insert({
    owner_user_id: 'userId' in owner ? owner.userId : null,
    session_key: 'sessionKey' in owner ? owner.sessionKey : null,
    original_name: write.originalName,
    mime_type: write.mimeType,
    byte_size: image.kind === 'svg' ? Buffer.byteLength(image.svg) : image.png.length,
    sanitized_svg: image.kind === 'svg' ? image.svg : null,
    png: image.kind === 'raster' ? image.png : null,
    width_px: write.widthPx,
    height_px: write.heightPx,
    created_at: write.createdAt,
    updated_at: write.createdAt,
  });
  return Number(id);
}

export async function findOwnedArtwork(db: Db, owner: ArtworkOwner, id: number): Promise<ArtworkMeta | undefined> {
  const row = await ownedBy(db('artwork_uploads').select(metaColumns(db)).where({ id }), owner).first();
  return row ? toMeta(row) : undefined;
}

export async function findOwnedArtworkImage(
  db: Db,
  owner: ArtworkOwner,
  id: number,
): Promise<ArtworkImage | undefined> {
  const row = await ownedBy(db('artwork_uploads').select('sanitized_svg', 'png').where({ id }), owner).first();
  if (!row) return undefined;
  return row.sanitized_svg !== null ? { kind: 'svg', svg: row.sanitized_svg } : { kind: 'raster', png: row.png };
}

export async function countOwnedArtwork(db: Db, owner: ArtworkOwner): Promise<number> {
  const row = await ownedBy(db('artwork_uploads').count({ count: '*' }), owner).first();
  return Number(row?.count ?? 0);
}

/** The owner's uploads, newest first. */
export async function listOwnedArtwork(db: Db, owner: ArtworkOwner, limit: number): Promise<ArtworkMeta[]> {
  const rows = await ownedBy(db('artwork_uploads').select(metaColumns(db)), owner)
    .orderBy([
      { column: 'created_at', order: 'desc' },
      { column: 'id', order: 'desc' },
    ])
    .limit(limit);
  return rows.map(toMeta);
}

/** What a quote needs of the uploads a design names: an SVG's text, or a raster's proportions. Others' are left out. */
export async function loadOwnedArtworkForQuote(db: Db, owner: ArtworkOwner, ids: number[]) {
  if (ids.length === 0) return [];
  const rows: Record<string, unknown>[] = await ownedBy(
    db('artwork_uploads').select('id', 'sanitized_svg', 'width_px', 'height_px').whereIn('id', ids),
    owner,
  );
  return rows.map((row) => ({
    id: Number(row.id),
    svgText: (row.sanitized_svg as string | null) ?? null,
    widthPx: Number(row.width_px),
    heightPx: Number(row.height_px),
  }));
}

/** Hands a visitor's unclaimed uploads to the account they have just signed in to; returns how many. */
export async function claimSessionArtwork(db: Db, sessionKey: string, userId: number): Promise<number> {
  return db('artwork_uploads')
    .whereNull('owner_user_id')
    .andWhere({ session_key: sessionKey })
    .update({ owner_user_id: userId, session_key: null });
}
