import type { Db } from '../../db/knex.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import {
  createCatalogueVersionWatch,
  keptWhileCatalogueUnchanged,
  type CatalogueVersionWatch,
} from '../catalogue/catalogue-version.ts';
import {
  readActiveQuoteCatalogue,
  type ActiveQuoteCatalogue,
  type QuoteCatalogueRecord,
} from './quote-catalogue-repo.ts';

/** Which catalogue rows a quote needs: the design names its motifs and fonts by slug. */
export interface QuoteCatalogueQuery {
  garmentId: number;
  sizeId: number;
  colourId?: number;
  motifSlugs: string[];
  fontSlugs: string[];
}

/**
 * What pricing a design on this garment, size (and colour) needs, picked from the active catalogue. `not-found`
 * when the garment is not on sale or the size or colour is not one of its own; `conflict` when the studio has no
 * published price list, no hoops or no shop settings, as no design can be priced until it has.
 */
export function pickQuoteCatalogue(
  active: ActiveQuoteCatalogue,
  query: QuoteCatalogueQuery,
): Result<QuoteCatalogueRecord> {
  const garment = active.garments.get(query.garmentId);
  if (!garment)
    return failure('not-found', 'That garment is not in the shop any more.', { garmentId: 'Choose another garment' });
  const sizeRow = active.sizes.get(query.sizeId);
  if (!sizeRow || sizeRow.garmentId !== garment.id)
    return failure('not-found', 'That size is not made in this garment.', {
      sizeId: 'Choose one of this garment’s sizes',
    });
  if (query.colourId !== undefined && active.colourGarments.get(query.colourId) !== garment.id) {
    return failure('not-found', 'That fabric colour is not made in this garment.', {
      colourId: 'Choose one of this garment’s colours',
    });
  }
  const { ruleSet, machine, hoops, shipping } = active;
  if (!ruleSet) return failure('conflict', 'The studio has not published its prices yet, so designs cannot be priced.');
  if (hoops.length === 0)
    return failure('conflict', 'The studio has no hoops set up yet, so designs cannot be priced.');
  if (!machine || !shipping)
    return failure('conflict', 'The studio has not set up its machine yet, so designs cannot be priced.');
  const { garmentId: _garmentId, ...size } = sizeRow;
  return ok({
    garment,
    size,
    motifs: query.motifSlugs.flatMap((slug) => active.motifs.get(slug) ?? []),
    fonts: query.fontSlugs.flatMap((slug) => active.fonts.get(slug) ?? []),
    hoops,
    machine,
    shipping,
    ruleSet: ruleSet.rules,
    ruleSetId: ruleSet.id,
  });
}

/** The catalogue rows one design is priced from, read afresh (production sheets, made rarely). */
export async function quoteCatalogueFor(db: Db, query: QuoteCatalogueQuery): Promise<Result<QuoteCatalogueRecord>> {
  return pickQuoteCatalogue(await readActiveQuoteCatalogue(db), query);
}

/**
 * The active catalogue kept in memory and replaced when the catalogue's change count moves, so a quote costs one
 * small query (shared by the requests arriving together) instead of a query per table.
 */
export function createQuoteCatalogueSnapshot(deps: { db: Db; versions?: CatalogueVersionWatch }) {
  const active = keptWhileCatalogueUnchanged(deps.versions ?? createCatalogueVersionWatch(deps.db), () =>
    readActiveQuoteCatalogue(deps.db),
  );
  return async (query: QuoteCatalogueQuery): Promise<Result<QuoteCatalogueRecord>> =>
    pickQuoteCatalogue(await active(), query);
}
