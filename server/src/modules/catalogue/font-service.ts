import type { Db } from '../../db/knex.ts';
import type {
  CreateFontRequest,
  ShippedFontListResponse,
  UpdateFontRequest,
} from '../../contracts/admin-catalogue-fonts.ts';
import { failure, ok } from '../../contracts/result.ts';
import { findShippedFont, listShippedFonts } from '../../integrations/shipped-fonts.ts';
import { createPlainRowService } from './catalogue-rows.ts';
import { listCataloguedFontPackages } from './lettering-font-repo.ts';

const editedRow = (font: UpdateFontRequest) => ({
  name: font.name,
  min_height_mm: font.minHeightMm,
  max_height_mm: font.maxHeightMm,
  ...(font.sortOrder === undefined ? {} : { sort_order: font.sortOrder }),
});

/** Lettering fonts: only fonts shipped with the app (so the server can measure them), activated, edited or retired. */
export function createFontService(deps: { db: Db }) {
  const rows = createPlainRowService<CreateFontRequest, UpdateFontRequest>(deps.db, {
    table: 'lettering_fonts',
    wording: {
      noun: 'lettering font',
      uniqueField: 'slug',
      duplicateMessage: 'Another lettering font already uses this short name',
    },
    newRow(font) {
      const shipped = findShippedFont(font.fontsourcePackage);
      if (!shipped) {
        const message = 'That font is not shipped with the shop, so lettering in it could not be measured';
        return failure('invalid', `${message}.`, { fontsourcePackage: message });
      }
      return ok({
        slug: font.slug,
        font_family: shipped.fontFamily,
        fontsource_package: shipped.fontsourcePackage,
        file_name: shipped.fileName,
        ...editedRow(font),
      });
    },
    editedRow,
  });

  /** Every font shipped with the app, and whether the catalogue already offers it. */
  async function shipped(): Promise<ShippedFontListResponse> {
    const used = await listCataloguedFontPackages(deps.db);
    return { fonts: listShippedFonts().map((font) => ({ ...font, isInCatalogue: used.has(font.fontsourcePackage) })) };
  }

  return { ...rows, shipped };
}
export type FontService = ReturnType<typeof createFontService>;
