import type { Db } from '../knex.ts';
import type { GarmentSummary } from '../../contracts/catalog.ts';

/** Active garments with their sizes and fabric colours, in the shop's display order. */
export async function listActiveGarments(db: Db): Promise<GarmentSummary[]> {
  const garments = await db('garments')
    .select('id', 'slug', 'name', 'kind', 'description', 'fabric_type', 'mockup_svg')
    .where({ is_active: true })
    .orderBy([{ column: 'sort_order' }, { column: 'id' }]);
  const ids = garments.map((g) => g.id as number);
  const [sizes, colours] = await Promise.all([
    db('garment_sizes')
      .select('id', 'garment_id', 'code', 'label', 'hem_front_mm', 'hem_circumference_mm')
      .whereIn('garment_id', ids)
      .orderBy([{ column: 'sort_order' }, { column: 'id' }]),
    db('fabric_colours')
      .select('id', 'garment_id', 'name', 'hex')
      .whereIn('garment_id', ids)
      .orderBy([{ column: 'sort_order' }, { column: 'id' }]),
  ]);
  return garments.map((g) => ({
    id: g.id,
    slug: g.slug,
    name: g.name,
    kind: g.kind,
    description: g.description ?? '',
    fabricType: g.fabric_type,
    mockupSvg: g.mockup_svg,
    sizes: sizes
      .filter((s) => s.garment_id === g.id)
      .map((s) => ({
        id: s.id,
        code: s.code,
        label: s.label,
        hemFrontMm: s.hem_front_mm === null ? null : Number(s.hem_front_mm),
        hemCircumferenceMm: s.hem_circumference_mm === null ? null : Number(s.hem_circumference_mm),
      })),
    colours: colours.filter((c) => c.garment_id === g.id).map((c) => ({ id: c.id, name: c.name, hex: c.hex })),
  }));
}
