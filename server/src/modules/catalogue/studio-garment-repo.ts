import type { Db } from '../../db/knex.ts';
import { listActiveGarments } from './garment-repo.ts';
import type { StudioGarment } from '../../contracts/admin-catalogue-garments.ts';

/**
 * Every garment, hidden ones too, as the storefront lists them plus what the studio edits: ages, nap, order, and
 * whether designs or orders use each size and colour (those cannot be deleted). The storefront's mapping is reused
 * by reading the hidden garments through it as well.
 */
export async function listStudioGarments(db: Db): Promise<StudioGarment[]> {
  const [summaries, garments, sizes, colours, sizeUses, colourUses] = await Promise.all([
    listActiveGarments(db, { includeRetired: true }),
    db('garments').select('id', 'is_active', 'is_napped', 'min_age_months', 'max_age_months', 'sort_order'),
    db('garment_sizes').select('id', 'sort_order'),
    db('fabric_colours').select('id', 'sort_order'),
    db('designs')
      .distinct('garment_size_id as id')
      .union((q) => q.from('order_items').distinct('garment_size_id as id')),
    db('designs').distinct('fabric_colour_id as id'),
  ]);
  const garmentById = new Map(garments.map((g) => [g.id as number, g]));
  const sizeOrder = new Map(sizes.map((s) => [s.id as number, s.sort_order as number]));
  const colourOrder = new Map(colours.map((c) => [c.id as number, c.sort_order as number]));
  const usedSizes = new Set(sizeUses.map((row: { id: number }) => row.id));
  const usedColours = new Set(colourUses.map((row: { id: number }) => row.id));
  return summaries.map((summary) => {
    const g = garmentById.get(summary.id)!;
    return {
      ...summary,
      isActive: Boolean(g.is_active),
      isNapped: Boolean(g.is_napped),
      minAgeMonths: g.min_age_months,
      maxAgeMonths: g.max_age_months,
      sortOrder: g.sort_order,
      sizes: summary.sizes.map((size) => ({
        ...size,
        sortOrder: sizeOrder.get(size.id) ?? 0,
        isInUse: usedSizes.has(size.id),
      })),
      colours: summary.colours.map((colour) => ({
        ...colour,
        sortOrder: colourOrder.get(colour.id) ?? 0,
        isInUse: usedColours.has(colour.id),
      })),
    };
  });
}
