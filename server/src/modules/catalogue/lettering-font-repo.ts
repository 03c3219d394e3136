import type { Db } from '../../db/knex.ts';
import type { LetteringFontSummary } from '../../contracts/catalogue.ts';

export const letteringFontColumns = ['id', 'slug', 'name', 'font_family', 'min_height_mm', 'max_height_mm'];

/** A lettering_fonts row as the catalogue shows it. */
export function toLetteringFont(row: Record<string, any>): LetteringFontSummary {
  return {
    id: row.id,
    slug: row.slug,
    name: row.name,
    fontFamily: row.font_family,
    // mysql2 returns DECIMAL columns as strings.
    minHeightMm: Number(row.min_height_mm),
    maxHeightMm: Number(row.max_height_mm),
  };
}

/** Active lettering fonts in the shop's display order, with the letter heights each sews cleanly at. */
export async function listActiveLetteringFonts(db: Db): Promise<LetteringFontSummary[]> {
  const rows = await db('lettering_fonts')
    .select(letteringFontColumns)
    .where({ is_active: true })
    .orderBy([{ column: 'sort_order' }, { column: 'id' }]);
  return rows.map(toLetteringFont);
}

/** The @fontsource packages the catalogue already has a row for, active or retired. */
export async function listCataloguedFontPackages(db: Db): Promise<Set<string>> {
  const rows = await db('lettering_fonts').select('fontsource_package');
  return new Set(rows.map((row) => row.fontsource_package as string));
}
