import { describe, expect, it } from 'vitest';
import type { DesignDocument, DesignPlacement } from '../../../server/src/contracts/designs.ts';
import { DEFAULT_STITCH_SETTINGS, measureSvgArtwork } from '../../../server/src/engine/index.ts';
import { figureDesign } from '../../../server/src/modules/quotes/design-figures.ts';
import type { CatalogueMotifEntry, QuoteCatalogue } from '../../../server/src/modules/quotes/quote-catalogue-types.ts';
import { chestLettering } from '../../support/sample-designs.ts';
import { loadShippedFont } from '../engine/support/load-font.ts';

const daisyChain: CatalogueMotifEntry = {
  slug: 'daisy-chain',
  name: 'Daisy chain',
  kind: 'border',
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
const littleLamb: CatalogueMotifEntry = {
  ...daisyChain,
  slug: 'little-lamb',
  name: 'Little lamb',
  kind: 'single',
  widthMm: 62,
  heightMm: 43,
  minScalePct: 85,
  maxScalePct: 115,
};

/** Hoops out of area order, so the test shows the smallest workable one is chosen, not the first listed. */
const hoops = [
  { slug: 'large-200x300', name: 'Large 200 × 300 mm', fieldWidthMm: 200, fieldHeightMm: 300, clearanceMm: 3 },
  { slug: 'oblong-120x180', name: 'Oblong 120 × 180 mm', fieldWidthMm: 120, fieldHeightMm: 180, clearanceMm: 3 },
  { slug: 'square-100', name: 'Square 100 × 100 mm', fieldWidthMm: 100, fieldHeightMm: 100, clearanceMm: 3 },
];

function catalogueWith(changes: Partial<QuoteCatalogue> = {}): QuoteCatalogue {
  return {
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
      minAgeMonths: 6,
      zones: [
        { code: 'hem', label: 'Hem border', xMm: 36, yMm: 319, widthMm: 346, heightMm: 91, hemOffsetMm: 44.45 },
        { code: 'chest', label: 'Below the smocking', xMm: 164, yMm: 82, widthMm: 91, heightMm: 46 },
      ],
    },
    motifs: new Map([daisyChain, littleLamb].map((motif) => [motif.slug, motif])),
    fonts: new Map([
      [
        'rounded-block',
        {
          slug: 'rounded-block',
          name: 'Rounded Block',
          minHeightMm: 8,
          maxHeightMm: 60,
          outlines: loadShippedFont('fredoka'),
        },
      ],
    ]),
    hoops,
    machine: { stitchesPerMinute: 650, minutesPerColorChange: 0.5, minutesPerHooping: 4, setupMinutes: 10 },
    ...changes,
  };
}

const border = (changes: Partial<Extract<DesignPlacement, { kind: 'border' }>> = {}): DesignPlacement => ({
  id: 'hem',
  kind: 'border',
  zone: 'hem',
  motif: 'daisy-chain',
  run: 'circumference',
  hemOffsetMm: 44.45,
  threads: ['WB-118', 'WB-101', 'WB-103'],
  ...changes,
});
const lettering = (text: string, letterHeightMm: number) => chestLettering(text, 'rounded-block', letterHeightMm);
const design = (...placements: DesignPlacement[]): DesignDocument => ({ version: 1, placements });

describe('figureDesign', () => {
  it('when a 180 mm daisy chain allowed 90–110 % goes round a 692 mm hem, then it is 4 repeats of 173 mm in 4 hoopings of the 120 × 180 hoop', () => {
    // Issue 3's worked case (common practice, no source): 692 ÷ 4 = 173 mm a repeat, 96.1 % of 180 mm; one
    // 173 mm repeat per 180 mm field, so 4 hoopings. The 100 mm square is smaller but cannot hold a repeat.
    const figured = figureDesign(catalogueWith(), design(border()));
    if (!figured.ok) throw new Error(figured.error.message);
    const [hem] = figured.value.placements;
    expect(hem.border).toMatchObject({ count: 4, scalePct: 96.11, hoop: { slug: 'oblong-120x180' } });
    expect(hem.border!.repeatWidthMm).toBeCloseTo(173, 9);
    expect(hem.hoopings).toBe(4);
    expect(hem.estimate.widthMm).toBeCloseTo(692, 9);
    expect(figured.value.quotePlacements).toEqual([
      {
        id: 'hem',
        label: 'Hem border: Daisy chain',
        kind: 'stitching',
        stitches: hem.estimate.stitches,
        hoopings: 4,
        colorChanges: hem.estimate.colorChanges,
        hasCustomerArtwork: false,
      },
    ]);
  });

  it('when the hoops keep their 3 mm default clearance, then the 120 × 180 hoop still holds one 173 mm repeat, and at 4 mm the border moves to the 160 × 260 hoop', () => {
    // The trade's worked case (common practice, no source): a 120 × 180 mm hoop holds one repeat resized to
    // 173 mm. 173 + 2 × 3 = 179 ≤ 180, so the 3 mm default keeps it; 173 + 2 × 4 = 181 > 180 does not.
    const withClearance = (clearanceMm: number) =>
      catalogueWith({
        hoops: [
          ...hoops.map((hoop) => ({ ...hoop, clearanceMm })),
          { slug: 'long-160x260', name: 'Long 160 × 260 mm', fieldWidthMm: 160, fieldHeightMm: 260, clearanceMm },
        ],
      });
    const held = figureDesign(withClearance(3), design(border()));
    if (!held.ok) throw new Error(held.error.message);
    expect(held.value.placements[0].border).toMatchObject({ hoop: { slug: 'oblong-120x180', clearanceMm: 3 } });
    expect(held.value.placements[0].hoopings).toBe(4);
    const moved = figureDesign(withClearance(4), design(border()));
    if (!moved.ok) throw new Error(moved.error.message);
    // 260 − 2 × 4 = 252 mm: still one 173 mm repeat a hooping (two would need 346 mm), now in the long hoop.
    expect(moved.value.placements[0].border).toMatchObject({ hoop: { slug: 'long-160x260' } });
    expect(moved.value.placements[0].hoopings).toBe(4);
    const oblongOnly = hoops
      .filter((hoop) => hoop.slug === 'oblong-120x180')
      .map((hoop) => ({ ...hoop, clearanceMm: 4 }));
    const none = figureDesign(catalogueWith({ hoops: oblongOnly }), design(border()));
    expect(!none.ok && none.error.message).toMatch(
      /One repeat is 173 mm wide, but this hoop leaves 172 mm \(a 180 mm field less 4 mm clearance at each edge\)/,
    );
  });

  it('when the same border is priced again, then it gives the same figures, and a catalogue with other hoops or another motif is worked out afresh', () => {
    const catalogue = catalogueWith();
    const first = figureDesign(catalogue, design(border()));
    const again = figureDesign(catalogue, design(border()));
    if (!first.ok || !again.ok) throw new Error('the border should fit');
    expect(again.value).toEqual(first.value);
    // A new snapshot of the catalogue brings new hoop and motif objects: the studio's change counts at once.
    const onlyLong = figureDesign(
      catalogueWith({
        hoops: [
          { slug: 'long-160x260', name: 'Long 160 × 260 mm', fieldWidthMm: 160, fieldHeightMm: 260, clearanceMm: 3 },
        ],
      }),
      design(border()),
    );
    expect(onlyLong.ok && onlyLong.value.placements[0].border?.hoop.slug).toBe('long-160x260');
    const widerChain = { ...daisyChain, widthMm: 200, minScalePct: 80 };
    const wider = figureDesign(catalogueWith({ motifs: new Map([[widerChain.slug, widerChain]]) }), design(border()));
    // 692 mm round the hem in repeats of 200 mm allowed 80–110 %: 4 repeats at 86.5 %, not the 96.11 % above.
    expect(wider.ok && wider.value.placements[0].border?.scalePct).toBe(86.5);
  });

  it('when the customer asks for a count that cannot fit, then it is refused at the count with the engine’s reason and a count that fits', () => {
    const figured = figureDesign(catalogueWith(), design(border({ count: 3 })));
    expect(figured).toEqual({
      ok: false,
      error: {
        kind: 'invalid',
        message: expect.stringMatching(
          /^The Daisy chain doesn't fit round the hem in size 6 months: 3 repeats would need 128\.1 % — above the 110 % maximum for this motif\. 4 repeats would fit\.$/,
        ),
        fields: { 'document.placements.0.count': expect.any(String) },
      },
    });
  });

  it('when no count of repeats fits the front hem, then the message says what each count would need', () => {
    const size = { ...catalogueWith().size, hemFrontMm: 250 };
    const figured = figureDesign(catalogueWith({ size }), design(border({ run: 'front' })));
    expect(!figured.ok && figured.error).toEqual({
      kind: 'invalid',
      message:
        "The Daisy chain doesn't fit along the front hem in size 6 months: 1 repeat need 138.9 % and 2 repeats need 69.4 %; this motif allows 90 % to 110 %.",
      fields: { 'document.placements.0.motif': expect.any(String) },
    });
  });

  it('when the garment has no hem, then a border is refused at its zone', () => {
    const size = { ...catalogueWith().size, hemFrontMm: null, hemCircumferenceMm: null };
    const figured = figureDesign(catalogueWith({ size }), design(border()));
    expect(!figured.ok && figured.error.fields).toEqual({
      'document.placements.0.zone': 'The Bishop dress has no hem to take a border.',
    });
  });

  it('when lettering is added, then it is one hooping priced as lettering, with its stitched size', () => {
    const figured = figureDesign(catalogueWith(), design(border(), lettering('Noah', 16)));
    if (!figured.ok) throw new Error(figured.error.message);
    const name = figured.value.placements[1];
    expect(name).toMatchObject({ id: 'name', label: 'Lettering “Noah”', kind: 'lettering', hoopings: 1 });
    expect(name.estimate.stitches).toBeGreaterThan(300);
    expect(name.estimate.widthMm).toBeGreaterThan(30);
    // One thread of its own, but the border before it ended in another: one change into the name.
    expect(figured.value.quotePlacements[1]).toMatchObject({ kind: 'lettering', colorChanges: 1 });
    expect(figured.value.totals.colourChangesBetweenPlacements).toBe(1);
    expect(figured.value.totals.hoopings).toBe(5);
    expect(figured.value.totals.stitches).toBe(figured.value.placements[0].estimate.stitches + name.estimate.stitches);
  });

  it('when lettering is outside the font’s heights or larger than every hoop, then it is refused at the letter height', () => {
    const tooSmall = figureDesign(catalogueWith(), design(lettering('Noah', 6)));
    expect(!tooSmall.ok && tooSmall.error.fields).toEqual({
      'document.placements.0.letterHeightMm':
        'Rounded Block sews cleanly from 8 to 60 mm tall; choose a letter height in that range.',
    });
    const tooWide = figureDesign(catalogueWith(), design(lettering('Alexandra Rose', 60)));
    expect(!tooWide.ok && tooWide.error.fields?.['document.placements.0.letterHeightMm']).toMatch(
      /^“Alexandra Rose” at 60 mm comes to \d+(\.\d)? × \d+(\.\d)? mm, bigger than the 194 × 294 mm our largest hoop can sew in \(its 200 × 300 mm sewing field less 3 mm clearance at each edge\); make it smaller\.$/,
    );
  });

  it('when a placement names a motif the catalogue does not have, then it is refused at that field', () => {
    const figured = figureDesign(catalogueWith(), design(lettering('Noah', 16), border({ motif: 'dancing-hippos' })));
    expect(figured).toEqual({
      ok: false,
      error: {
        kind: 'invalid',
        message: 'There is no motif “dancing-hippos” in the catalogue; choose another.',
        fields: {
          'document.placements.1.motif': 'There is no motif “dancing-hippos” in the catalogue; choose another.',
        },
      },
    });
  });

  it('when several placements are wrong, then each is named at its own field', () => {
    const lamb: DesignPlacement = {
      id: 'lamb',
      kind: 'motif',
      zone: 'pocket',
      centerXMm: 50,
      centerYMm: 50,
      rotationDeg: 0,
      motif: 'little-lamb',
      scalePct: 100,
      threads: ['WB-127'],
    };
    const figured = figureDesign(
      catalogueWith(),
      design(border({ motif: 'little-lamb' }), lamb, { ...lamb, id: 'lamb-2', zone: 'chest', scalePct: 150 }),
    );
    expect(!figured.ok && figured.error.fields).toEqual({
      'document.placements.0.motif':
        'The Little lamb is a single motif, not a border; place it on the garment instead.',
      'document.placements.1.zone':
        'The Bishop dress has no place called “pocket”; choose Hem border or Below the smocking.',
      'document.placements.2.scalePct':
        'The Little lamb can be stitched from 85 % to 115 % of its size; choose a size in that range.',
    });
  });

  it('when a motif has fewer threads than colours, then it is refused at its threads', () => {
    const figured = figureDesign(catalogueWith(), design(border({ threads: ['WB-118'] })));
    expect(!figured.ok && figured.error.fields).toEqual({
      'document.placements.0.threads': 'The Daisy chain is sewn in 3 colours; choose a thread for each.',
    });
  });

  it('when the design has the customer’s own artwork and uploads are not supported, then it says they are coming soon', () => {
    const artwork: DesignPlacement = {
      id: 'sun',
      kind: 'artwork',
      zone: 'chest',
      centerXMm: 50,
      centerYMm: 50,
      rotationDeg: 0,
      artworkUploadId: 1,
      widthMm: 56,
    };
    const figured = figureDesign(catalogueWith(), design(artwork));
    expect(!figured.ok && figured.error).toEqual({
      kind: 'invalid',
      message: 'Uploading your own artwork is coming soon.',
      fields: { 'document.placements.0': 'Uploading your own artwork is coming soon.' },
    });
  });

  it('when uploads are given, then artwork is estimated from its SVG and carries the setup fee', () => {
    const svgText =
      '<svg xmlns="http://www.w3.org/2000/svg" width="40mm" height="40mm" viewBox="0 0 40 40"><circle cx="20" cy="20" r="18" fill="#fc0"/></svg>';
    const artwork: DesignPlacement = {
      id: 'sun',
      kind: 'artwork',
      zone: 'chest',
      centerXMm: 50,
      centerYMm: 50,
      rotationDeg: 0,
      artworkUploadId: 1,
      widthMm: 56,
    };
    const measured = measureSvgArtwork(svgText, DEFAULT_STITCH_SETTINGS);
    if (!measured.ok) throw new Error(measured.reason);
    const svgFigures = measured.figures;
    const figured = figureDesign(catalogueWith({ artworkUploads: new Map([[1, { svgFigures }]]) }), design(artwork));
    if (!figured.ok) throw new Error(figured.error.message);
    expect(figured.value.quotePlacements[0]).toMatchObject({
      label: 'Your artwork',
      kind: 'stitching',
      hoopings: 1,
      hasCustomerArtwork: true,
    });
    // The drawing is set 56 mm wide, so the 36 mm circle of its 40 mm view box stitches 36 × 56 ÷ 40 = 50.4 mm.
    expect(figured.value.placements[0].estimate.widthMm).toBeCloseTo(50.4, 1);
  });

  it('when the upload is a photo or scan, then it has no stitch count yet, keeps its proportions, and its price is marked provisional', () => {
    const artwork: DesignPlacement = {
      id: 'scan',
      kind: 'artwork',
      zone: 'chest',
      centerXMm: 50,
      centerYMm: 50,
      rotationDeg: 0,
      artworkUploadId: 2,
      widthMm: 60,
    };
    const figured = figureDesign(
      catalogueWith({ artworkUploads: new Map([[2, { rasterSizePx: { widthPx: 900, heightPx: 600 } }]]) }),
      design(artwork),
    );
    if (!figured.ok) throw new Error(figured.error.message);
    expect(figured.value.placements[0]).toMatchObject({
      isPriceProvisional: true,
      hasCustomerArtwork: true,
      estimate: { stitches: 0, widthMm: 60, heightMm: 40 },
    });
    expect(figured.value.quotePlacements[0]).toMatchObject({
      stitches: 0,
      hasCustomerArtwork: true,
      isStitchCountPending: true,
    });
  });

  it('when a design has nothing on it, then there is nothing to price', () => {
    const figured = figureDesign(catalogueWith(), design());
    expect(!figured.ok && figured.error.fields).toEqual({
      'document.placements': 'Add a border, a name or a motif so there is embroidery to price.',
    });
  });

  it('when the garment is knit, napped and for babies, then the advice is cut-away with a topping and a soft back, and the cautions start under 3', () => {
    const garment = { ...catalogueWith().garment, fabricType: 'knit' as const, isNapped: true, minAgeMonths: 0 };
    const figured = figureDesign(catalogueWith({ garment }), design(border()));
    if (!figured.ok) throw new Error(figured.error.message);
    const { stabilizer, cautions } = figured.value;
    expect(stabilizer).toMatchObject({ backing: 'cutaway', topping: 'water-soluble' });
    expect(stabilizer.messages.map((m) => m.code)).toEqual([
      'stabilizer.cutaway',
      'stabilizer.water-soluble-topping',
      'stabilizer.soft-back-cover',
    ]);
    expect(cautions.map((m) => m.code)).toEqual(['caution.thread-ends', 'caution.local-rules']);
  });

  it('when the machine time is figured, then it is for one garment: stitches at the shop’s speed, stops, hoopings and setup', () => {
    const figured = figureDesign(catalogueWith(), design(border()));
    if (!figured.ok) throw new Error(figured.error.message);
    const { runMinutes, totals } = figured.value;
    const minutesOf = (code: string) => runMinutes.items.find((item) => item.code === code)!.minutes;
    expect(minutesOf('sewing')).toBeCloseTo(totals.stitches / 650, 9);
    expect(minutesOf('hoopings')).toBe(16);
    expect(minutesOf('setup')).toBe(10);
    expect(runMinutes.totalMinutes).toBeCloseTo(
      runMinutes.items.reduce((sum, item) => sum + item.minutes, 0),
      9,
    );
  });
});
