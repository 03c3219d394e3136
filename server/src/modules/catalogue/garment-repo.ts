import { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import { jsonColumn } from '../../db/json-column.ts';
import { placementZone, type GarmentDetail, type GarmentSummary } from '../../contracts/catalogue.ts';
import { garmentSafetyFacts } from '../../contracts/guidance.ts';
import { mockupSizeMm } from '../../engine/garment-mockup-size.ts';

const placementZones = z.array(placementZone);

type Row = Record<string, any>;

/** Active garments (one, when a slug is given; retired ones too when asked) with their size and colour rows, in display order. */
async function readActiveGarments(
  db: Db,
  extra: { garmentColumns: string[]; sizeColumns: string[]; slug?: string; includeRetired?: boolean },
) {
  const garments: Row[] = await db('garments')
    .select(
      'id',
      'slug',
      'name',
      'kind',
      'description',
      'fabric_type',
      'mockup_svg',
      'tie_places',
      'drawstring_places',
      'closure',
      'closes_at_neck',
      'intended_use',
      ...extra.garmentColumns,
    )
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
        'min_age_months',
        'max_age_months',
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
    safety: garmentSafetyFacts.parse({
      tiePlaces: jsonColumn(g.tie_places),
      drawstringPlaces: jsonColumn(g.drawstring_places),
      closure: g.closure,
      closesAtNeck: Boolean(g.closes_at_neck),
      intendedUse: g.intended_use,
    }),
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
      minAgeMonths: s.min_age_months,
      maxAgeMonths: s.max_age_months,
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

/** A garment's page before the service adds each size's safety cautions. */
export type GarmentDetailRecord = Omit<GarmentDetail, 'sizes'> & {
  sizes: Omit<GarmentDetail['sizes'][number], 'cautions'>[];
};

/** One active garment for its product page, with its back drawing and each size's measurements; undefined if not on offer. */
export async function findActiveGarmentDetail(db: Db, slug: string): Promise<GarmentDetailRecord | undefined> {
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

export async function garmentIdExists(db: Db, garmentId: number): Promise<boolean> {
  return Boolean(await db('garments').where({ id: garmentId }).first('id'));
}
