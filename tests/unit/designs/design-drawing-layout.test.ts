import { describe, expect, it } from 'vitest';
import type { BorderPlacement, DesignDocument } from '../../../server/src/contracts/designs.ts';
import { layoutBorder } from '../../../storefront/src/features/designer/model/border-layout.ts';
import { artworkPictureBox } from '../../../server/src/engine/artwork-picture.ts';
import {
  drawingOf,
  layoutDesignDrawing,
  type DrawingCatalogue,
} from '../../../storefront/src/features/designs/model/design-drawing-layout.ts';
import {
  bishopDress,
  breezyScript,
  setting as bishopDressSetting,
  daisyChain,
  sittingBunny,
  sixMonths,
} from '../designer/support/bishop-dress-setting.ts';

const threads = [
  { code: 'WB-118', name: 'Leaf', hex: '#5A8A3C' },
  { code: 'WB-110', name: 'Rose', hex: '#C0506A' },
];
const catalogue: DrawingCatalogue = {
  garment: bishopDress,
  motifs: [daisyChain, sittingBunny],
  fonts: [breezyScript],
  threads,
};

const documentOf = (...placements: DesignDocument['placements']): DesignDocument => ({ version: 1, placements });
const daisyLoop: DesignDocument['placements'][number] = {
  id: 'hem',
  kind: 'border',
  zone: 'hem',
  motif: 'daisy-chain',
  run: 'circumference',
  hemOffsetMm: 44.45,
  threads: ['WB-118', 'WB-404'],
};

describe('layoutDesignDrawing', () => {
  it('when a border runs all the way round, then only the repeats on the front panel are drawn, on the centre line above the hem', () => {
    const layout = layoutDesignDrawing(catalogue, sixMonths.id, documentOf(daisyLoop))!;
    // The 6-month mockup is the 460 × 470 mm drawing scaled by 346 / 380.
    expect(layout.widthMm).toBeCloseTo(460 * (346 / 380), 6);
    expect(layout.heightMm).toBeCloseTo(470 * (346 / 380), 6);
    const [border] = layout.placements;
    if (border?.kind !== 'border') throw new Error(`expected a border, got ${border?.kind}`);
    // 4 repeats of 173 mm round the 692 mm loop at 96.1 % (common practice, no source: the trade's worked case); the
    // 346 mm front panel shows the middle two whole and nothing of the two at the back.
    expect(border.label).toBe('Border: Daisy and leaf chain, 4 repeats all the way round');
    expect(border.repeats).toHaveLength(2);
    expect(border.repeats.map((repeat) => repeat.widthMm)).toEqual([173, 173]);
    const hem = sixMonths.zones.find((zone) => zone.code === 'hem')!;
    const lineYMm = hem.yMm + hem.heightMm - 44.45;
    for (const repeat of border.repeats) expect(repeat.centerYMm).toBeCloseTo(lineYMm, 6);
    expect(border.band.leftMm).toBeCloseTo(hem.xMm + (hem.widthMm - 346) / 2, 6);
    expect(border.band.widthMm).toBe(346);
    // Threads are looked up in the palette; an unknown code keeps the drawing's own colour.
    expect(border.threadHexes).toEqual(['#5A8A3C', undefined]);
  });

  it('when the hem is drawn curved, then the picture lays the border exactly as the designer does: on the curve, turned to its slope', () => {
    const curvedDress = {
      ...bishopDress,
      sizes: bishopDress.sizes.map((size) => ({
        ...size,
        zones: size.zones.map((zone) => (zone.code === 'hem' ? { ...zone, hemCurveMm: 10 } : zone)),
      })),
    };
    const setting = { ...bishopDressSetting, garment: curvedDress };
    const layout = layoutDesignDrawing({ ...catalogue, garment: curvedDress }, sixMonths.id, documentOf(daisyLoop))!;
    const [border] = layout.placements;
    if (border?.kind !== 'border') throw new Error(`expected a border, got ${border?.kind}`);
    const designer = layoutBorder(setting, sixMonths.id, daisyLoop as BorderPlacement);
    if (!designer.ok) throw new Error(designer.reason);
    expect(border.repeats).toEqual(designer.repeats);
    expect(border.band).toEqual(designer.band);
    // The ends of the hem rise, so the two front repeats sit above the straight centre line and lean outwards.
    const hem = sixMonths.zones.find((zone) => zone.code === 'hem')!;
    const lineYMm = hem.yMm + hem.heightMm - 44.45;
    for (const repeat of border.repeats) expect(repeat.centerYMm).toBeLessThan(lineYMm - 1);
    expect(border.repeats[0]!.rotationDeg).toBeGreaterThan(0);
    expect(border.repeats[1]!.rotationDeg).toBeCloseTo(-border.repeats[0]!.rotationDeg, 9);
  });

  it('when the design has a motif and lettering, then each sits where the document puts it, at its size, in its thread', () => {
    const layout = layoutDesignDrawing(
      catalogue,
      sixMonths.id,
      documentOf(
        {
          id: 'bunny',
          kind: 'motif',
          zone: 'chest',
          centerXMm: 200,
          centerYMm: 100,
          rotationDeg: 10,
          motif: 'sitting-bunny',
          scalePct: 50,
          threads: ['WB-118'],
        },
        {
          id: 'name',
          kind: 'lettering',
          zone: 'chest',
          centerXMm: 210,
          centerYMm: 110,
          rotationDeg: 0,
          text: 'Mae',
          font: 'breezy-script',
          letterHeightMm: 20,
          thread: 'WB-110',
        },
      ),
    )!;
    expect(layout.placements).toEqual([
      {
        kind: 'motif',
        id: 'bunny',
        label: 'Motif: Sitting bunny',
        svg: sittingBunny.svg,
        threadHexes: ['#5A8A3C'],
        widthMm: 18,
        heightMm: 35.5,
        centerXMm: 200,
        centerYMm: 100,
        rotationDeg: 10,
      },
      {
        kind: 'lettering',
        id: 'name',
        label: 'Name “Mae” in Breezy Script',
        text: 'Mae',
        fontFamily: 'Pacifico',
        letterHeightMm: 20,
        hex: '#C0506A',
        centerXMm: 210,
        centerYMm: 110,
        rotationDeg: 0,
      },
    ]);
  });

  it('when the catalogue no longer has a motif or font, or a border no longer fits, then the placement is listed but not drawn', () => {
    const layout = layoutDesignDrawing(
      catalogue,
      bishopDress.sizes[2]!.id,
      documentOf(
        daisyLoop,
        {
          id: 'gone',
          kind: 'motif',
          zone: 'chest',
          centerXMm: 1,
          centerYMm: 1,
          rotationDeg: 0,
          motif: 'retired-owl',
          scalePct: 100,
          threads: ['WB-118'],
        },
        {
          id: 'font',
          kind: 'lettering',
          zone: 'chest',
          centerXMm: 1,
          centerYMm: 1,
          rotationDeg: 0,
          text: 'Bo',
          font: 'retired-face',
          letterHeightMm: 10,
          thread: 'WB-110',
        },
      ),
    )!;
    expect(layout.placements.map((placement) => [placement.kind, placement.label])).toEqual([
      ['unavailable', 'Border: Daisy and leaf chain (it no longer fits this size)'],
      ['unavailable', 'A motif that is no longer offered'],
      ['unavailable', 'Name “Bo” (its lettering is no longer offered)'],
    ]);
  });

  it('when the design places the customer’s upload, then the drawing shows her picture; without it, a dashed outline of its place', () => {
    const photo = {
      id: 'photo',
      kind: 'artwork' as const,
      zone: 'chest',
      centerXMm: 200,
      centerYMm: 120,
      rotationDeg: 15,
      artworkUploadId: 7,
      widthMm: 60,
    };
    const upload = { uploadId: 7, widthPx: 800, heightPx: 400, imageUrl: '/api/artwork/7/image' };
    const [drawn] = layoutDesignDrawing(catalogue, sixMonths.id, documentOf(photo), [upload])!.placements;
    expect(drawn).toMatchObject({ kind: 'artwork', label: 'Your uploaded picture', upload });
    // 60 mm wide at the picture's 2 : 1 is 30 mm tall, centred on the placement and turned about its centre.
    expect(artworkPictureBox(photo, upload)).toEqual({
      xMm: 170,
      yMm: 105,
      widthMm: 60,
      heightMm: 30,
      transform: 'rotate(15 200 120)',
    });
    const [outline] = layoutDesignDrawing(catalogue, sixMonths.id, documentOf(photo))!.placements;
    expect(outline).toMatchObject({ kind: 'artwork', upload: undefined });
  });

  it('when the garment no longer has the size, then there is no drawing', () => {
    expect(layoutDesignDrawing(catalogue, 999, documentOf())).toBeUndefined();
  });
});

describe('drawingOf', () => {
  it("when the design's garment is in the lists, then it comes with its drawing; otherwise neither", () => {
    const lists = { garments: [bishopDress], motifs: catalogue.motifs, fonts: catalogue.fonts, threads };
    expect(drawingOf(lists, { garmentId: bishopDress.id, sizeId: sixMonths.id, document: documentOf() })).toMatchObject(
      { garment: bishopDress, layout: { placements: [] } },
    );
    expect(drawingOf(lists, { garmentId: 42, sizeId: sixMonths.id, document: documentOf() })).toEqual({
      garment: undefined,
      layout: undefined,
    });
  });
});
