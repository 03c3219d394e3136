import { describe, expect, it } from 'vitest';
import { estimateStitches } from '../../../server/src/engine/index.ts';
import { figureDesign } from '../../../server/src/modules/quotes/design-figures.ts';
import { sheetBorderPlan } from '../../../server/src/modules/production/production-sheet-hoopings.ts';
import { formatLengthPlain } from '../../../server/src/modules/production/production-sheet-pdf-kit.ts';
import {
  templateArea,
  tileName,
  tileTemplate,
  TILE_OVERLAP_MM,
} from '../../../server/src/modules/production/production-sheet-pdf-templates.ts';
import type { QuoteCatalogue } from '../../../server/src/modules/quotes/quote-catalogue-types.ts';
import { letteringOutline } from '../../../server/src/modules/production/production-sheet-outlines.ts';
import { itemTemplate } from '../../../server/src/modules/production/production-sheet-templates.ts';
import type { SheetPlacement } from '../../../server/src/contracts/production-sheet.ts';
import { loadOpentypeFont, loadShippedFont } from '../engine/support/load-font.ts';

const daisyChain = {
  slug: 'daisy-chain',
  name: 'Daisy chain',
  kind: 'border' as const,
  widthMm: 180,
  heightMm: 40,
  gapMm: 0,
  run: 460,
  satin: 3420,
  fill: 500,
  colourCount: 3,
  minScalePct: 90,
  maxScalePct: 110,
  trims: [],
};
const catalogue: QuoteCatalogue = {
  garment: {
    id: 3,
    slug: 'bishop-dress',
    name: 'Bishop dress',
    fabricType: 'woven',
    isNapped: false,
    minAgeMonths: 6,
    safety: { tiePlaces: [], drawstringPlaces: [], closure: 'buttons', closesAtNeck: false, intendedUse: 'day_wear' },
  },
  size: {
    id: 301,
    code: '6m',
    label: '6 months',
    hemFrontMm: 346,
    hemCircumferenceMm: 692,
    zones: [],
    minAgeMonths: 6,
  },
  motifs: new Map([[daisyChain.slug, daisyChain]]),
  fonts: new Map(),
  hoops: [
    { slug: 'oblong-120x180', name: 'Oblong 120 × 180 mm', fieldWidthMm: 120, fieldHeightMm: 180, clearanceMm: 3 },
  ],
  machine: { stitchesPerMinute: 650, minutesPerColorChange: 0.5, minutesPerHooping: 4, setupMinutes: 10 },
};

function planFor(run: 'front' | 'circumference') {
  const figured = figureDesign(catalogue, {
    version: 1,
    placements: [
      {
        id: 'hem',
        kind: 'border',
        zone: 'hem',
        motif: 'daisy-chain',
        run,
        hemOffsetMm: 44.45,
        threads: ['WB-118', 'WB-101', 'WB-103'],
      },
    ],
  });
  if (!figured.ok) throw new Error(figured.error.message);
  return sheetBorderPlan(figured.value.placements[0].border!, 40 * (173 / 180), 44.45);
}

describe('sheetBorderPlan', () => {
  it('when 4 repeats of 173 mm go round a 692 mm loop, then the hoop centres are ±86.5 and ±259.5 mm from the centre mark, sewn outwards from it', () => {
    const plan = planFor('circumference');
    // Issue 11: the two beside the centre mark first (left, then right), then the outer left and the outer right.
    expect(plan.hoopings.map((h) => [h.order, h.side, h.fromCentreMm])).toEqual([
      [1, 'center', -86.5],
      [2, 'right', 86.5],
      [3, 'left', -259.5],
      [4, 'right', 259.5],
    ]);
    expect(plan.orderRule).toContain('each new hooping lies beside stitches already sewn');
    expect(plan.orderRule).toContain('From left to right the hoopings are numbered 3, 1, 2, 4.');
    expect(plan.clearanceNote).toBe(
      'Planned with 3 mm kept clear inside the sewing field at every edge (114 × 174 mm of the 120 × 180 mm field).',
    );
  });

  it('when 2 repeats of 173 mm fill the 346 mm front hem, then the centre mark is the middle of the front and the hoops sit 86.5 mm either side', () => {
    const plan = planFor('front');
    expect(plan).toMatchObject({ count: 2, isClosed: false, runLengthMm: 346 });
    expect(plan.hoopings.map((h) => [h.repeatNumbers, h.fromRowStartMm, h.fromCentreMm])).toEqual([
      [[1], 86.5, -86.5],
      [[2], 259.5, 86.5],
    ]);
  });
});

describe('tileName', () => {
  it('when a template is cut into parts, then each is named by its count and place in words, never a grid code', () => {
    const one = { row: 0, column: 0, rows: 1, columns: 1 };
    expect(tileName(one)).toBe('Part 1 of 1');
    expect([0, 1].map((column) => tileName({ ...one, column, columns: 2 }))).toEqual([
      'Part 1 of 2, left',
      'Part 2 of 2, right',
    ]);
    expect([0, 1, 2, 3].map((column) => tileName({ ...one, column, columns: 4 }))).toEqual([
      'Part 1 of 4, left',
      'Part 2 of 4, second from the left',
      'Part 3 of 4, third from the left',
      'Part 4 of 4, right',
    ]);
    expect(tileName({ row: 1, column: 1, rows: 3, columns: 3 })).toBe('Part 5 of 9, centre');
  });
});

describe('tileTemplate', () => {
  it('when a template fits the printable area, then it prints as one tile', () => {
    expect(tileTemplate({ widthMm: 188, heightMm: 128 }, templateArea('letter'))).toEqual([
      { xMm: 0, yMm: 0, widthMm: 188, heightMm: 128, row: 0, column: 0, rows: 1, columns: 1 },
    ]);
  });

  it('when a template is wider and taller than the page, then the tiles cover it, overlap by 10 mm and none is larger than the area', () => {
    const area = templateArea('a4');
    const template = { widthMm: 268, heightMm: 300 };
    const tiles = tileTemplate(template, area);
    expect(tiles.map(tileName)).toEqual([
      'Part 1 of 4, top left',
      'Part 2 of 4, top right',
      'Part 3 of 4, bottom left',
      'Part 4 of 4, bottom right',
    ]);
    for (const tile of tiles) {
      expect(tile.widthMm).toBeLessThanOrEqual(area.widthMm);
      expect(tile.heightMm).toBeLessThanOrEqual(area.heightMm);
    }
    const [a1, a2, b1] = tiles;
    expect(a1.xMm + a1.widthMm - a2.xMm).toBeCloseTo(TILE_OVERLAP_MM, 9);
    expect(a1.yMm + a1.heightMm - b1.yMm).toBeCloseTo(TILE_OVERLAP_MM, 9);
    expect(a2.xMm + a2.widthMm).toBeCloseTo(template.widthMm, 9);
    expect(b1.yMm + b1.heightMm).toBeCloseTo(template.heightMm, 9);
  });
});

describe('formatLengthPlain', () => {
  // 1 in = 25.4 mm exactly (NIST SP 811); to the nearest sixteenth as a ruler reads.
  it.each([
    [173, '173 mm (6 13/16 in)'],
    [86.5, '86.5 mm (3 3/8 in)'],
    [259.5, '259.5 mm (10 3/16 in)'],
    [50.8, '50.8 mm (2 in)'],
    [-12.7, '12.7 mm (1/2 in)'],
  ])('when %s mm is printed, then it reads %s', (mm, text) => {
    expect(formatLengthPlain(mm)).toBe(text);
  });
});

describe('template outlines', () => {
  it('when lettering is set 20 mm tall, then a capital H outline is 20 mm tall, as the engine sizes letters', () => {
    const outline = letteringOutline(loadShippedFont('fredoka'), 'H', 20, '#2f2f33');
    expect(outline?.heightMm).toBeCloseTo(20, 3);
    expect(outline?.outlines[0]).toMatchObject({ hex: '#2f2f33', isFilled: true });
  });

  it('when a Cyrillic name is set for the template, then it is drawn from the font’s cyrillic file as wide as the quote measured it', () => {
    // Issue 11: the sheet drew .notdef boxes for letters outside the latin file. Playfair Display ships a cyrillic
    // subset (@fontsource/playfair-display metadata.json); the quote's estimate and the template read the same letters.
    const font = loadShippedFont('playfair-display');
    const outline = letteringOutline(font, 'Маша', 20, '#2f2f33');
    const estimate = estimateStitches({ kind: 'lettering', text: 'Маша', font, letterHeightMm: 20 });
    expect(outline?.outlines.length).toBeGreaterThan(0);
    expect(estimate.ok && outline?.widthMm).toBeCloseTo(estimate.ok ? estimate.widthMm : NaN, 1);
    // The latin file alone draws four .notdef boxes of another width.
    const boxes = letteringOutline(loadOpentypeFont('playfair-display'), 'Маша', 20, '#2f2f33');
    expect(Math.abs(outline!.widthMm - boxes!.widthMm)).toBeGreaterThan(1);
  });

  it('when an item only fits the hoop turned, then its template turns the field and centres the item on the crosshair', () => {
    const placement = { id: 'bunny', label: 'Sitting bunny' } as SheetPlacement;
    const hoop = { slug: 'oblong', name: 'Oblong 180 × 120 mm', fieldWidthMm: 180, fieldHeightMm: 120, clearanceMm: 3 };
    const template = itemTemplate(placement, hoop, { widthMm: 60, heightMm: 150, outlines: [] });
    expect(template.field).toMatchObject({ widthMm: 120, heightMm: 180 });
    expect(template.subtitle).toMatch(/turned 90° in the hoop/);
    expect(template.subtitle).toMatch(
      /3 mm kept clear inside the sewing field at every edge \(174 × 114 mm of the 180 × 120 mm field\)/,
    );
    expect(template.artwork.xMm + template.artwork.widthMm / 2).toBeCloseTo(template.centre.xMm, 9);
    expect(template.artwork.yMm + template.artwork.heightMm / 2).toBeCloseTo(template.centre.yMm, 9);
  });
});
