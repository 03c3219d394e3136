import { describe, expect, it } from 'vitest';
import {
  readCatalogueFilter,
  showsKind,
  writeCatalogueFilter,
} from '../../../storefront/src/features/catalogue/model/catalogue-filter.ts';

describe('readCatalogueFilter', () => {
  it.each([
    ['', {}],
    ['?garment=bishop-dress', { garment: 'bishop-dress' }],
    ['?kind=border', { kind: 'border' }],
    ['?garment=terry-bib&kind=lettering', { garment: 'terry-bib', kind: 'lettering' }],
    // Anything that cannot be a filter is left out, so the page shows more rather than an error.
    ['?garment=Not%20a%20slug&kind=glitter', {}],
    ['?garment=&kind=', {}],
  ])('when the address has %s, then the filter is %j', (search, expected) => {
    expect(readCatalogueFilter(new URLSearchParams(search))).toEqual(expected);
  });
});

describe('writeCatalogueFilter', () => {
  it('when a filter is written, then its keys are set or removed and other params are kept', () => {
    const next = writeCatalogueFilter(new URLSearchParams('kind=single&utm=letter'), { garment: 'bishop-dress' });
    expect(next.toString()).toBe('utm=letter&garment=bishop-dress');
  });

  it('when it is read back, then it is the same filter', () => {
    const filter = { garment: 'sun-bonnet', kind: 'single' } as const;
    expect(readCatalogueFilter(writeCatalogueFilter(new URLSearchParams(), filter))).toEqual(filter);
  });
});

describe('showsKind', () => {
  it('when no kind is chosen, then every section shows; otherwise only the chosen one', () => {
    expect(['border', 'single', 'lettering'].map((kind) => showsKind({}, kind as 'border'))).toEqual([
      true,
      true,
      true,
    ]);
    expect(['border', 'single', 'lettering'].map((kind) => showsKind({ kind: 'single' }, kind as 'border'))).toEqual([
      false,
      true,
      false,
    ]);
  });
});
