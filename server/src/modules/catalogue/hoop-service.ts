import type { Db } from '../../db/knex.ts';
import type { CreateHoopRequest, UpdateHoopRequest } from '../../contracts/admin-catalogue-hoops.ts';
import { ok } from '../../contracts/result.ts';
import { createPlainRowService } from './catalogue-rows.ts';

const editedRow = (hoop: UpdateHoopRequest) => ({
  name: hoop.name,
  field_width_mm: hoop.fieldWidthMm,
  field_height_mm: hoop.fieldHeightMm,
  ...(hoop.clearanceMm === undefined ? {} : { clearance_mm: hoop.clearanceMm }),
  ...(hoop.sortOrder === undefined ? {} : { sort_order: hoop.sortOrder }),
});

/** The studio's hoops: the sewing fields the hooping plan may use. */
export function createHoopService(deps: { db: Db }) {
  return createPlainRowService<CreateHoopRequest, UpdateHoopRequest>(deps.db, {
    table: 'hoops',
    wording: { noun: 'hoop', uniqueField: 'slug', duplicateMessage: 'Another hoop already uses this short name' },
    newRow: (hoop) => ok({ slug: hoop.slug, ...editedRow(hoop) }),
    editedRow,
  });
}
export type HoopService = ReturnType<typeof createHoopService>;
