/**
 * A designer setting shaped like the demo catalogue's bishop dress (seeds/data/garments.ts): drawn at 12 months,
 * with its 6-month size scaled by 346 / 380, the daisy border and the sitting bunny. Lettering is "measured" as
 * 0.6 × the letter height per character and 1.3 × the letter height tall, so tests need no fonts.
 */
import type { GarmentSummary, LetteringFontSummary, MotifSummary } from '../../../../server/src/contracts/catalogue.ts';
import type { DesignSetting } from '../../../../storefront/src/features/designer/model/design-setting.ts';

const hemOffsetMm = 44.45;
const zonesAt = (scale: number) => [
  {
    code: 'hem',
    label: 'Hem border',
    xMm: 40 * scale,
    yMm: 350 * scale,
    widthMm: 380 * scale,
    heightMm: 100 * scale,
    hemOffsetMm,
  },
  {
    code: 'chest',
    label: 'Below the smocking',
    xMm: 180 * scale,
    yMm: 90 * scale,
    widthMm: 100 * scale,
    heightMm: 50 * scale,
  },
];
const sixMonthScale = 346 / 380;

export const bishopDress: GarmentSummary = {
  id: 3,
  slug: 'bishop-dress',
  name: 'Bishop dress',
  kind: 'bishop_dress',
  description: '',
  fabricType: 'woven',
  safety: { tiePlaces: [], drawstringPlaces: [], closure: 'buttons', closesAtNeck: false, intendedUse: 'day_wear' },
  mockupSvg: '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 460 470"></svg>',
  mockupWidthMm: 460,
  mockupHeightMm: 470,
  sizes: [
    {
      id: 301,
      code: '6m',
      label: '6 months',
      mockupScale: sixMonthScale,
      zones: zonesAt(sixMonthScale),
      hemFrontMm: 346,
      hemCircumferenceMm: 692,
      minAgeMonths: 6,
      maxAgeMonths: 12,
    },
    {
      id: 302,
      code: '12m',
      label: '12 months',
      mockupScale: 1,
      zones: zonesAt(1),
      hemFrontMm: 380,
      hemCircumferenceMm: 760,
      minAgeMonths: 12,
      maxAgeMonths: 18,
    },
    // Not a real size: a hem so short that no whole number of daisy repeats fits within 90–110 %.
    {
      id: 399,
      code: 'tiny',
      label: 'Tiny',
      mockupScale: 0.5,
      zones: zonesAt(0.5),
      hemFrontMm: 130,
      hemCircumferenceMm: 250,
      minAgeMonths: 0,
      maxAgeMonths: 3,
    },
  ],
  colours: [
    { id: 301, name: 'Christening White', hex: '#FAF7F0' },
    { id: 302, name: 'Blush', hex: '#F4D6D4' },
  ],
};

const motif = (
  fields: Partial<MotifSummary> & Pick<MotifSummary, 'id' | 'slug' | 'name' | 'kind' | 'widthMm' | 'heightMm'>,
): MotifSummary => ({
  svg: '<svg xmlns="http://www.w3.org/2000/svg"></svg>',
  gapMm: 0,
  minScalePct: 90,
  maxScalePct: 110,
  colourCount: 1,
  stitchCount: 1000,
  threadCodes: ['WB-118'],
  trims: [],
  ...fields,
});

export const daisyChain = motif({
  id: 1,
  slug: 'daisy-chain',
  name: 'Daisy and leaf chain',
  kind: 'border',
  widthMm: 180,
  heightMm: 40,
  colourCount: 3,
  threadCodes: ['WB-118', 'WB-101', 'WB-103'],
});
export const sittingBunny = motif({
  id: 6,
  slug: 'sitting-bunny',
  name: 'Sitting bunny',
  kind: 'single',
  widthMm: 36,
  heightMm: 71,
  minScalePct: 80,
  maxScalePct: 120,
});

export const breezyScript: LetteringFontSummary = {
  id: 1,
  slug: 'breezy-script',
  name: 'Breezy Script',
  fontFamily: 'Pacifico',
  minHeightMm: 10,
  maxHeightMm: 60,
};

export const setting: DesignSetting = {
  garment: bishopDress,
  motifs: [daisyChain, sittingBunny],
  fonts: [breezyScript],
  measureLettering: ({ text, letterHeightMm }) => ({
    widthMm: [...text].length * letterHeightMm * 0.6,
    heightMm: letterHeightMm * 1.3,
  }),
  // The demo studio's largest two hoops (seeds/data/hoops.ts).
  hoops: [
    {
      slug: 'oblong-120x180',
      name: 'Oblong 120 × 180 mm (5 × 7 in)',
      fieldWidthMm: 120,
      fieldHeightMm: 180,
      clearanceMm: 3,
    },
    {
      slug: 'large-200x300',
      name: 'Large 200 × 300 mm (8 × 12 in)',
      fieldWidthMm: 200,
      fieldHeightMm: 300,
      clearanceMm: 3,
    },
  ],
  // A drawing twice as wide as it is tall, and a square scan.
  artworks: [
    {
      id: 41,
      kind: 'svg',
      originalName: 'sunshine.svg',
      byteSize: 900,
      widthPx: 200,
      heightPx: 100,
      imageUrl: '/api/artwork/41/image',
      createdAt: '2026-12-01T09:00:00.000Z',
    },
    {
      id: 42,
      kind: 'raster',
      originalName: 'scan.png',
      byteSize: 5000,
      widthPx: 300,
      heightPx: 300,
      imageUrl: '/api/artwork/42/image',
      createdAt: '2026-12-01T09:05:00.000Z',
    },
  ],
};

export const sixMonths = bishopDress.sizes[0]!;
export const zone = (sizeIndex: number, code: string) =>
  bishopDress.sizes[sizeIndex]!.zones.find((candidate) => candidate.code === code)!;
