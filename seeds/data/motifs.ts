/**
 * The studio's own motifs. Artwork is in seeds/artwork/<slug>.svg (viewBox in mm, one group per thread colour in
 * stitching order). Stitch counts are as measured from the digitized files at 100 %, underlay included, so they
 * run above the engine's SVG estimate of the same drawing; run + satin + fill = the count.
 */
export interface SeedMotif {
  id: number;
  slug: string;
  name: string;
  kind: 'border' | 'single';
  widthMm: number;
  heightMm: number;
  run: number;
  satin: number;
  fill: number;
  minScalePct: number;
  maxScalePct: number;
  /** Thread codes in stitching order, one per colour. */
  threadCodes: string[];
}

/** The borders are continuous lines that meet end to end: no gap between repeats. */
export const borderGapMm = 0;

export const motifs: SeedMotif[] = [
  // 180 mm at 100 %, 90–110 %: a 692 mm hem loop takes 4 repeats at 96.1 % (issue 3's worked case).
  {
    id: 1,
    slug: 'daisy-chain',
    name: 'Daisy and leaf chain',
    kind: 'border',
    widthMm: 180,
    heightMm: 40,
    run: 460,
    satin: 3420,
    fill: 500,
    minScalePct: 90,
    maxScalePct: 110,
    threadCodes: ['WB-118', 'WB-101', 'WB-103'],
  },
  {
    id: 2,
    slug: 'duckling-parade',
    name: 'Duckling parade',
    kind: 'border',
    widthMm: 64,
    heightMm: 42,
    run: 230,
    satin: 240,
    fill: 1090,
    minScalePct: 90,
    maxScalePct: 115,
    threadCodes: ['WB-119', 'WB-131', 'WB-104', 'WB-124'],
  },
  {
    id: 3,
    slug: 'sailboats',
    name: 'Sailboats on waves',
    kind: 'border',
    widthMm: 150,
    heightMm: 50,
    run: 520,
    satin: 560,
    fill: 1480,
    minScalePct: 90,
    maxScalePct: 110,
    threadCodes: ['WB-114', 'WB-106', 'WB-116'],
  },
  {
    id: 4,
    slug: 'strawberry-vine',
    name: 'Strawberry vine',
    kind: 'border',
    widthMm: 140,
    heightMm: 38,
    run: 380,
    satin: 1020,
    fill: 680,
    minScalePct: 90,
    maxScalePct: 110,
    threadCodes: ['WB-107', 'WB-119', 'WB-101', 'WB-103'],
  },
  {
    id: 5,
    slug: 'scallop-and-dot',
    name: 'Scallop and dot',
    kind: 'border',
    widthMm: 40,
    heightMm: 12,
    run: 40,
    satin: 340,
    fill: 0,
    minScalePct: 85,
    maxScalePct: 115,
    threadCodes: ['WB-108'],
  },
  {
    id: 6,
    slug: 'sitting-bunny',
    name: 'Sitting bunny',
    kind: 'single',
    widthMm: 36,
    heightMm: 71,
    run: 260,
    satin: 690,
    fill: 2770,
    minScalePct: 80,
    maxScalePct: 120,
    threadCodes: ['WB-128', 'WB-109', 'WB-124'],
  },
  {
    id: 7,
    slug: 'little-lamb',
    name: 'Little lamb',
    kind: 'single',
    widthMm: 62,
    heightMm: 43,
    run: 140,
    satin: 560,
    fill: 2560,
    minScalePct: 85,
    maxScalePct: 115,
    threadCodes: ['WB-127', 'WB-102', 'WB-109'],
  },
  {
    id: 8,
    slug: 'star-and-moon',
    name: 'Star and moon',
    kind: 'single',
    widthMm: 57,
    heightMm: 53,
    run: 90,
    satin: 380,
    fill: 1680,
    minScalePct: 80,
    maxScalePct: 120,
    threadCodes: ['WB-129', 'WB-103'],
  },
];
