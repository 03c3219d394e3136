import { describe, expect, it } from 'vitest';
import type { GarmentSummary } from '../../../server/src/contracts/catalogue.ts';
import {
  garmentTakesLettering,
  motifSuitsGarment,
} from '../../../storefront/src/features/catalogue/model/motif-suits-garment.ts';
import { bishopDress, daisyChain, sittingBunny } from '../designer/support/bishop-dress-setting.ts';

const withSizes = (sizes: GarmentSummary['sizes']): GarmentSummary => ({ ...bishopDress, sizes });
const [sixMonths, twelveMonths, tiny] = bishopDress.sizes as [
  GarmentSummary['sizes'][number],
  GarmentSummary['sizes'][number],
  GarmentSummary['sizes'][number],
];
const bibLike = withSizes([
  {
    ...sixMonths,
    hemFrontMm: null,
    hemCircumferenceMm: null,
    zones: sixMonths.zones.filter((zone) => zone.code !== 'hem'),
  },
]);

describe('motifSuitsGarment', () => {
  it("when some size's hem loop takes whole repeats within the motif's limits, then the border suits the garment", () => {
    // A 692 mm loop takes 4 daisy repeats at 96.1 % (common practice, no source: the trade's worked case).
    expect(motifSuitsGarment(daisyChain, bishopDress)).toBe(true);
    expect(motifSuitsGarment(daisyChain, withSizes([sixMonths, twelveMonths]))).toBe(true);
  });

  it('when no size can take whole repeats, or the garment has no hem, then the border does not suit it', () => {
    // A 250 mm loop needs 1 daisy at 139 % or 2 at 69 %, both outside 90–110 %.
    expect(motifSuitsGarment(daisyChain, withSizes([tiny]))).toBe(false);
    expect(motifSuitsGarment(daisyChain, bibLike)).toBe(false);
  });

  it('when a single motif at its smallest size fits a place other than the hem, then it suits; a hem alone is not enough', () => {
    // The bunny is 36 × 71 mm, 28.8 × 56.8 mm at 80 %; the chest is 100 × 50 mm at 12 months and 25 mm tall at "tiny".
    expect(motifSuitsGarment(sittingBunny, withSizes([twelveMonths]))).toBe(false);
    const tallChest = {
      ...twelveMonths,
      zones: twelveMonths.zones.map((zone) => (zone.code === 'chest' ? { ...zone, heightMm: 60 } : zone)),
    };
    expect(motifSuitsGarment(sittingBunny, withSizes([tallChest]))).toBe(true);
    const hemOnly = {
      ...tallChest,
      zones: tallChest.zones.filter((zone) => zone.code === 'hem').map((zone) => ({ ...zone, heightMm: 200 })),
    };
    expect(motifSuitsGarment(sittingBunny, withSizes([hemOnly]))).toBe(false);
  });
});

describe('garmentTakesLettering', () => {
  it('when the garment has a place other than the hem, then it takes lettering', () => {
    expect(garmentTakesLettering(bishopDress)).toBe(true);
    expect(
      garmentTakesLettering(
        withSizes([{ ...sixMonths, zones: sixMonths.zones.filter((zone) => zone.code === 'hem') }]),
      ),
    ).toBe(false);
  });
});
