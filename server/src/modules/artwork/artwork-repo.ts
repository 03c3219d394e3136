import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type { SvgArtworkFigures } from '../../engine/index.ts';

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
  /** An SVG's measurements for stitch estimates, taken once at upload; null for a raster. */
  stitchFigures: SvgArtworkFigures | null;
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
    stitch_figures: write.stitchFigures === null ? null : JSON.stringify(write.stitchFigures),
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

/**
 * What a quote needs of the uploads a design names: an SVG's stitch measurements (not its text, which a quote no
 * longer parses), or a raster's proportions. Others' are left out.
 */
export async function loadOwnedArtworkForQuote(db: Db, owner: ArtworkOwner, ids: number[]) {
  if (ids.length === 0) return [];
  const rows: Record<string, unknown>[] = await ownedBy(
    db('artwork_uploads')
      .select('id', 'stitch_figures', 'width_px', 'height_px', db.raw('sanitized_svg IS NOT NULL AS is_svg'))
      .whereIn('id', ids),
    owner,
  );
  return rows.map((row) => ({
    id: Number(row.id),
    isSvg: Number(row.is_svg) === 1,
    stitchFigures:
      typeof row.stitch_figures === 'string' ? (JSON.parse(row.stitch_figures) as SvgArtworkFigures) : null,
    widthPx: Number(row.width_px),
    heightPx: Number(row.height_px),
  }));
}

/** An upload's clean copy with its proportions, for drawing it into pictures of a design. */
export type ArtworkPicture = { id: number; widthPx: number; heightPx: number } & ArtworkImage;

/** The clean copies of these uploads that the owner may use; others' are left out. */
export async function loadOwnedArtworkPictures(db: Db, owner: ArtworkOwner, ids: number[]): Promise<ArtworkPicture[]> {
  if (ids.length === 0) return [];
  const rows: Record<string, unknown>[] = await ownedBy(
    db('artwork_uploads').select('id', 'sanitized_svg', 'png', 'width_px', 'height_px').whereIn('id', ids),
    owner,
  );
  return rows.map((row) => {
    const base = { id: Number(row.id), widthPx: Number(row.width_px), heightPx: Number(row.height_px) };
    return row.sanitized_svg !== null
      ? { ...base, kind: 'svg' as const, svg: String(row.sanitized_svg) }
      : { ...base, kind: 'raster' as const, png: row.png as Buffer };
  });
}

const ownerKeyOf = (owner: ArtworkOwner) =>
  'userId' in owner ? `user:${owner.userId}` : `session:${owner.sessionKey}`;

/**
 * Takes the owner's lock row for the rest of the transaction (made on first use): an upload counted and inserted
 * under it cannot interleave with another upload of the same owner. `INSERT … ON DUPLICATE KEY UPDATE` takes the
 * row's exclusive lock at once, so two uploads never hold a shared lock each and deadlock upgrading it.
 */
export async function lockArtworkOwner(trx: Db, owner: ArtworkOwner, now: Date): Promise<void> {
  await trx.raw(
    'INSERT INTO artwork_owner_locks (owner_key, created_at) VALUES (?, ?) ON DUPLICATE KEY UPDATE owner_key = owner_key',
    [ownerKeyOf(owner), now],
  );
}

/** Hands a visitor's unclaimed uploads to the account they have just signed in to; returns how many. */
export async function claimSessionArtwork(db: Db, sessionKey: string, userId: number): Promise<number> {
  return db('artwork_uploads')
    .whereNull('owner_user_id')
    .andWhere({ session_key: sessionKey })
    .update({ owner_user_id: userId, session_key: null });
}
