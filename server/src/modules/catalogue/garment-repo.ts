import { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { placementZone, type GarmentDetail, type GarmentSummary } from '../../contracts/catalogue.ts';

const placementZones = z.array(placementZone);

/** The opening tag of the drawing's root element; `[^>]*` cannot backtrack, however long the drawing. */
const SVG_OPEN_TAG = /<svg\b[^>]*>/;
/** An attribute of that tag by exact (case-sensitive, as in SVG) name, not a suffix of another (`data-width`). */
const attribute = (name: string) => new RegExp(`\\s${name}\\s*=\\s*(?:"([^"]*)"|'([^']*)')`);
const VIEW_BOX = attribute('viewBox');
const WIDTH = attribute('width');
const HEIGHT = attribute('height');
/** A length in millimetres: unitless (user units, which are mm in our drawings) or with an explicit "mm". */
const MM_LENGTH = /^(\d+(?:\.\d+)?)(?:mm)?$/;

/**
 * The drawing's size at the reference size, mm. Garment drawings are made with the viewBox "0 0 W H" in
 * millimetres (see the garments migration), so the storefront can lay zones over the mockup without parsing
 * SVG itself; it is read here once, with a regex over the root tag rather than an XML parser, because only two
 * attributes of one tag are needed. A drawing without a viewBox falls back to its width and height attributes.
 * A drawing with neither is a broken catalogue row, so it throws rather than guessing a size.
 */
export function mockupSizeMm(svg: string, slug: string): { widthMm: number; heightMm: number } {
  const tag = SVG_OPEN_TAG.exec(svg)?.[0] ?? '';
  const valueOf = (pattern: RegExp) => {
    const match = pattern.exec(tag);
    return (match?.[1] ?? match?.[2] ?? '').trim();
  };
  const box = valueOf(VIEW_BOX)
    .split(/[\s,]+/)
    .map(Number);
  const [, , boxWidth = NaN, boxHeight = NaN] = box;
  if (box.length === 4 && box.every(Number.isFinite) && boxWidth > 0 && boxHeight > 0)
    return { widthMm: boxWidth, heightMm: boxHeight };
  const widthMm = Number(MM_LENGTH.exec(valueOf(WIDTH))?.[1] ?? NaN);
  const heightMm = Number(MM_LENGTH.exec(valueOf(HEIGHT))?.[1] ?? NaN);
  if (widthMm > 0 && heightMm > 0) return { widthMm, heightMm };
  throw new Error(`The mockup of garment ${slug} has neither a viewBox nor a width and height in millimetres`);
}

type Row = Record<string, any>;

/** Active garments (one, when a slug is given; retired ones too when asked) with their size and colour rows, in display order. */
async function readActiveGarments(
  db: Db,
  extra: { garmentColumns: string[]; sizeColumns: string[]; slug?: string; includeRetired?: boolean },
) {
  const garments: Row[] = await db('garments')
    .select('id', 'slug', 'name', 'kind', 'description', 'fabric_type', 'mockup_svg', ...extra.garmentColumns)
    .where({
      ...(extra.includeRetired ? {} : { is_active: true }),
      ...(extra.slug === undefined ? {} : { slug: extra.slug }),
    })
    .orderBy([{ column: 'sort_order' }, { column: 'id' }]);
  const ids = garments.map((g) => g.id as number);
  const [sizes, colours]: Row[][] = await Promise.all([
    db('garment_sizes')
      .select(
        'id',
        'garment_id',
        'code',
        'label',
        'hem_front_mm',
        'hem_circumference_mm',
        'mockup_scale',
        'placement_zones',
        ...extra.sizeColumns,
      )
      .whereIn('garment_id', ids)
      .orderBy([{ column: 'sort_order' }, { column: 'id' }]),
    db('fabric_colours')
      .select('id', 'garment_id', 'name', 'hex')
      .whereIn('garment_id', ids)
      .orderBy([{ column: 'sort_order' }, { column: 'id' }]),
  ]);
  return garments.map((g) => ({
    row: g,
    sizes: sizes.filter((s) => s.garment_id === g.id),
    colours: colours.filter((c) => c.garment_id === g.id),
  }));
}

// mysql2 returns DECIMAL columns as strings; JSON columns arrive parsed, and are checked because the storefront
// draws the zones as they come.
const millimetres = (value: unknown) => (value === null ? null : Number(value));

function toGarmentSummary({ row: g, sizes, colours }: { row: Row; sizes: Row[]; colours: Row[] }): GarmentSummary {
  const mockup = mockupSizeMm(g.mockup_svg, g.slug);
  return {
    id: g.id,
    slug: g.slug,
    name: g.name,
    kind: g.kind,
    description: g.description ?? '',
    fabricType: g.fabric_type,
    mockupSvg: g.mockup_svg,
    mockupWidthMm: mockup.widthMm,
    mockupHeightMm: mockup.heightMm,
    sizes: sizes.map((s) => ({
      id: s.id,
      code: s.code,
      label: s.label,
      mockupScale: Number(s.mockup_scale),
      zones: placementZones.parse(s.placement_zones),
      hemFrontMm: millimetres(s.hem_front_mm),
      hemCircumferenceMm: millimetres(s.hem_circumference_mm),
    })),
    colours: colours.map((c) => ({ id: c.id, name: c.name, hex: c.hex })),
  };
}

/**
 * Active garments with their sizes (mockup scale and placement zones) and fabric colours, in display order. The
 * studio's catalogue asks for the retired ones too (`includeRetired`).
 */
export async function listActiveGarments(
  db: Db,
  options: { includeRetired?: boolean } = {},
): Promise<GarmentSummary[]> {
  const garments = await readActiveGarments(db, {
    garmentColumns: [],
    sizeColumns: [],
    includeRetired: options.includeRetired,
  });
  return garments.map(toGarmentSummary);
}

/** One active garment for its product page, with its back drawing and each size's measurements; undefined if not on offer. */
export async function findActiveGarmentDetail(db: Db, slug: string): Promise<GarmentDetail | undefined> {
  const [garment] = await readActiveGarments(db, {
    garmentColumns: ['mockup_back_svg'],
    sizeColumns: ['chest_mm', 'length_mm'],
    slug,
  });
  if (!garment) return undefined;
  const summary = toGarmentSummary(garment);
  return {
    ...summary,
    mockupBackSvg: garment.row.mockup_back_svg ?? null,
    sizes: summary.sizes.map((size, index) => ({
      ...size,
      chestMm: millimetres(garment.sizes[index]!.chest_mm),
      lengthMm: millimetres(garment.sizes[index]!.length_mm),
    })),
  };
}
