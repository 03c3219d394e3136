/** What the catalogue can be narrowed to: one kind of embroidery, for one garment. */
export const catalogueKinds = ['border', 'single', 'lettering'] as const;
export type CatalogueKind = (typeof catalogueKinds)[number];

export interface CatalogueFilter {
  /** A garment's slug: only the embroidery that suits it. */
  garment?: string;
  kind?: CatalogueKind;
}

const GARMENT_SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/**
 * The filter as the address holds it (`?garment=bishop-dress&kind=border`), so a filtered catalogue can be
 * bookmarked and shared. Values that cannot be a filter are left out rather than refused: the page then shows more.
 */
export function readCatalogueFilter(params: URLSearchParams): CatalogueFilter {
  const garment = params.get('garment') ?? '';
  const kind = params.get('kind') ?? '';
  return {
    ...(GARMENT_SLUG.test(garment) ? { garment } : {}),
    ...((catalogueKinds as readonly string[]).includes(kind) ? { kind: kind as CatalogueKind } : {}),
  };
}

/** The address's search params for a filter; the other params on the page are kept. */
export function writeCatalogueFilter(params: URLSearchParams, filter: CatalogueFilter): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const key of ['garment', 'kind'] as const) {
    const value = filter[key];
    if (value) next.set(key, value);
    else next.delete(key);
  }
  return next;
}

/** Whether a section of the catalogue shows under the filter. */
export const showsKind = (filter: CatalogueFilter, kind: CatalogueKind) =>
  filter.kind === undefined || filter.kind === kind;
