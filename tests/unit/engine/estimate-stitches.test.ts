import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_STITCH_SETTINGS,
  estimateBorderStitches,
  estimateStitches,
  MM_PER_INCH,
  type StitchEstimate,
} from '../../../server/src/engine/index.ts';

function svg(body: string, root = 'width="100mm" height="100mm" viewBox="0 0 100 100"'): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" ${root}>${body}</svg>`;
}

function estimateSvg(svgText: string): StitchEstimate {
  const estimate = estimateStitches({ kind: 'svg', svgText });
  if (!estimate.ok) throw new Error(estimate.reason);
  return estimate;
}

describe('estimateStitches: catalogue motifs', () => {
  const motif = {
    stitchCount: 10_000,
    mix: { run: 20, satin: 30, fill: 50 },
    colorChanges: 3,
    widthMm: 80,
    heightMm: 60,
  };

  it('when a motif is stitched at 100 %, then the measured count and mix come back unchanged', () => {
    expect(estimateStitches({ kind: 'catalogue', motif, scale: 1 })).toMatchObject({
      ok: true,
      stitches: 10_000,
      colorChanges: 3,
      byType: { run: 2000, satin: 3000, fill: 5000, underlay: 0 },
      widthMm: 80,
      heightMm: 60,
    });
  });

  it('when a motif is halved, then running and satin stitches halve and fill stitches quarter (length vs area rule)', () => {
    const half = estimateStitches({ kind: 'catalogue', motif, scale: 0.5 });
    expect(half).toMatchObject({
      ok: true,
      byType: { run: 1000, satin: 1500, fill: 1250 },
      stitches: 3750,
      widthMm: 40,
      heightMm: 30,
    });
  });

  it.each([
    ['a zero scale', { kind: 'catalogue', motif, scale: 0 }],
    ['an all-zero mix', { kind: 'catalogue', motif: { ...motif, mix: { run: 0, satin: 0, fill: 0 } }, scale: 1 }],
    ['a fractional stitch count', { kind: 'catalogue', motif: { ...motif, stitchCount: 10.5 }, scale: 1 }],
    ['an unknown kind', { kind: 'photo' }],
  ])('when given %s, then it fails with a reason', (_, source) => {
    expect(estimateStitches(source as never).ok).toBe(false);
  });
});

describe('estimateStitches: SVG artwork', () => {
  it('a filled 1 in × 1 in square gives 710–1,030 top stitches per in² (seminar table, chholderby.com "Estimating Stitches")', () => {
    const estimate = estimateSvg(
      svg('<rect width="1" height="1" fill="#204080"/>', 'width="1in" height="1in" viewBox="0 0 1 1"'),
    );
    // 645.16 mm² / (0.2 mm rows × 4 mm stitches) = 806.45 → 807, before underlay.
    expect(estimate.byType.fill).toBe(807);
    expect(estimate.byType.fill).toBeGreaterThanOrEqual(710);
    expect(estimate.byType.fill).toBeLessThanOrEqual(1030);
    expect(estimate.byType.underlay).toBeGreaterThan(0);
    expect(estimate.stitches).toBe(estimate.byType.fill + estimate.byType.underlay);
    expect(estimate.widthMm).toBeCloseTo(MM_PER_INCH, 9);
  });

  it.each([2, 2.5, 3])(
    'a 10 mm satin column %s mm wide is within 10 %% of 44–50 stitches per cm (seminar table, chholderby.com "Estimating Stitches")',
    (widthMm) => {
      const asShape = estimateSvg(svg(`<rect x="10" y="10" width="10" height="${widthMm}" fill="#d04040"/>`));
      const asStroke = estimateSvg(
        svg(`<line x1="10" y1="10" x2="20" y2="10" stroke="#d04040" stroke-width="${widthMm}"/>`),
      );
      for (const estimate of [asShape, asStroke]) {
        const columnLengthCm = 1;
        const perCm = estimate.byType.satin / columnLengthCm;
        expect(perCm).toBeGreaterThanOrEqual(44 * 0.9);
        expect(perCm).toBeLessThanOrEqual(50 * 1.1);
        expect(estimate.byType.fill).toBe(0);
      }
    },
  );

  it('when a thin stroke is drawn, then it is running stitch at 2.5 mm; data-stitch="triple" triples it', () => {
    const single = estimateSvg(svg('<path d="M0 50 H100" stroke="#000" stroke-width="0.3" fill="none"/>'));
    expect(single.byType).toEqual({ run: 40, satin: 0, fill: 0, underlay: 0 });
    const triple = estimateSvg(
      svg('<g data-stitch="triple"><path d="M0 50 H100" stroke="#000" stroke-width="0.3" fill="none"/></g>'),
    );
    expect(triple.byType.run).toBe(120);
    const bean = estimateSvg(
      svg('<polyline points="0,0 60,80" data-stitch="bean" stroke="#000" fill="none" stroke-width="0.3"/>'),
    );
    expect(bean.byType.run).toBe(120);
  });

  it('when a group transform scales the artwork, then lengths and stroke widths scale with it', () => {
    const scaled = estimateSvg(
      svg(
        '<g transform="translate(5 5) scale(2)"><path d="M0 0 H25" stroke="#000" stroke-width="0.6" fill="none"/></g>',
      ),
    );
    // 50 mm long, 1.2 mm wide after the scale: a satin column, 50 / 0.4 × 2 = 250.
    expect(scaled.byType.satin).toBe(250);
    const rotated = estimateSvg(
      svg('<g transform="rotate(30 50 50)"><path d="M0 50 H100" stroke="#000" stroke-width="0.3" fill="none"/></g>'),
    );
    expect(rotated.byType.run).toBe(40);
  });

  it('when style="" and attributes disagree, then the style declaration wins', () => {
    const estimate = estimateSvg(
      svg('<rect width="50" height="50" fill="red" style="fill: none; stroke: #123456; stroke-width: 0.2"/>'),
    );
    expect(estimate.byType.fill).toBe(0);
    expect(estimate.byType.run).toBe(Math.ceil(200 / DEFAULT_STITCH_SETTINGS.runStitchLengthMm));
  });

  it('when shapes share a colour in a row, then they form one colour block with trims between them', () => {
    const estimate = estimateSvg(
      svg(
        '<circle cx="20" cy="20" r="10" fill="#ff0000"/><circle cx="50" cy="20" r="10" fill="red"/><ellipse cx="80" cy="20" rx="10" ry="5" fill="#0000ff"/>',
      ),
    );
    expect(estimate.colorChanges).toBe(1);
    expect(estimate.trims).toBe(1);
  });

  it('when shapes are hidden or in <defs>, then they are not stitched; text and images are noted, not guessed', () => {
    const estimate = estimateSvg(
      svg(
        '<defs><rect width="90" height="90"/></defs><rect width="90" height="90" display="none"/><text x="5" y="5">Hi</text><image href="x.png"/><rect width="10" height="1"/>',
      ),
    );
    expect(estimate.stitches).toBe(estimateSvg(svg('<rect width="10" height="1"/>')).stitches);
    expect(estimate.notes).toEqual([
      expect.stringMatching(/^1 × text was skipped/),
      expect.stringMatching(/^1 × a picture/),
    ]);
  });

  it('when a size is given, then it overrides the file: widthMm stretches the viewBox, mmPerUnit scales user units', () => {
    const file = svg('<path d="M0 5 H10" stroke="#000" stroke-width="0.01" fill="none"/>', 'viewBox="0 0 10 10"');
    expect(estimateStitches({ kind: 'svg', svgText: file, size: { widthMm: 100 } })).toMatchObject({
      ok: true,
      byType: { run: 40 },
    });
    expect(estimateStitches({ kind: 'svg', svgText: file, size: { mmPerUnit: 5 } })).toMatchObject({
      ok: true,
      byType: { run: 20 },
    });
  });

  describe('resizing keeps each line’s stitch type (issue 11)', () => {
    const sunshine = readFileSync(new URL('../../../seeds/uploads/sunshine-drawing.svg', import.meta.url), 'utf8');
    const stitchesAt = (svgText: string, widthMm: number) => {
      const estimate = estimateStitches({ kind: 'svg', svgText, size: { widthMm } });
      if (!estimate.ok) throw new Error(estimate.reason);
      return estimate;
    };

    it('when a 0.5 mm line in a 110 mm drawing is stitched at 219.9 and 220 mm, then it is running stitch both times: 80 stitches', () => {
      // 200 mm of line at 2.5 mm a stitch (Printwear, Feb 2016, p. 61 range; the shop's default length) = 80.
      // Before: 220 mm doubled the 0.5 mm stroke to 1 mm, so it became a satin column of 1,080 stitches.
      const line = svg(
        '<path d="M5 5H105" stroke="#000" stroke-width="0.5" fill="none"/>',
        'width="110mm" height="10mm" viewBox="0 0 110 10"',
      );
      expect(stitchesAt(line, 219.9).byType).toEqual({ run: 80, satin: 0, fill: 0, underlay: 0 });
      expect(stitchesAt(line, 220).byType).toEqual({ run: 80, satin: 0, fill: 0, underlay: 0 });
      expect(stitchesAt(line, 110).byType.run).toBe(40);
    });

    it('when the seeded sunshine drawing is resized from 10 to 160 mm, then its stitches never fall and never step by more than the area grows', () => {
      // Stitches follow length (running, satin) or area (fill) when a design is resized at its density
      // (lindeegembroidery.com/scaling), so between two sizes the count can grow at most by the area ratio;
      // the slack covers each part's rounding up to a whole stitch. Before, 22 → 24 mm went 204 → 417 (× 2.04,
      // against an area ratio of 1.19) as the rays crossed 1 mm and turned to satin.
      const sizes = Array.from({ length: 151 }, (_, i) => 10 + i);
      const counts = sizes.map((widthMm) => stitchesAt(sunshine, widthMm).stitches);
      for (let i = 1; i < sizes.length; i += 1) {
        expect(counts[i]).toBeGreaterThanOrEqual(counts[i - 1]);
        expect(counts[i]).toBeLessThanOrEqual(counts[i - 1] * (sizes[i] / sizes[i - 1]) ** 2 + 12);
      }
      // The rays (26 px = 6.9 mm as drawn at 600 px = 158.75 mm) are satin at every size, never running stitch.
      expect(stitchesAt(sunshine, 20).byType.run).toBe(0);
      // 359, 464 and 579 when measured at each size; measured once and scaled (as uploads are), curves flatten a
      // hair differently, so allow a stitch either way.
      const [at20, at24, at28] = [20, 24, 28].map((widthMm) => stitchesAt(sunshine, widthMm).stitches);
      expect(Math.abs(at20! - 359)).toBeLessThanOrEqual(1);
      expect(Math.abs(at24! - 464)).toBeLessThanOrEqual(1);
      expect(Math.abs(at28! - 579)).toBeLessThanOrEqual(1);
    });

    it('when artwork is stitched at its own size, then the count is what it was before the rule (the type as drawn is the type as sewn)', () => {
      // The drawing's own size: 600 px at 96 px per inch (CSS Values 4) = 158.75 mm.
      const asDrawn = estimateStitches({ kind: 'svg', svgText: sunshine });
      expect(asDrawn.ok && asDrawn.stitches).toBe(stitchesAt(sunshine, 158.75).stitches);
    });
  });

  it('when the file has a viewBox but no size, then it asks for one', () => {
    const result = estimateStitches({
      kind: 'svg',
      svgText: svg('<rect width="5" height="5"/>', 'viewBox="0 0 10 10"'),
    });
    expect(result).toEqual({
      ok: false,
      reason: 'The artwork does not say how big it is: give its width in millimetres.',
    });
  });

  it('when a shape with a hole is filled under evenodd, then the hole is not stitched', () => {
    const ring = (rule: string) =>
      estimateSvg(svg(`<path fill-rule="${rule}" d="M0 0H60V60H0Z M20 20H40V40H20Z"/>`)).byType.fill;
    expect(ring('evenodd')).toBe(Math.ceil((3600 - 400) / 0.8));
    expect(ring('nonzero')).toBe(Math.ceil(3600 / 0.8));
  });

  it.each([
    ['not XML', 'garbage <<<'],
    ['XML without <svg>', '<note>hello</note>'],
    ['an empty file', '   '],
  ])('when the file is %s, then it fails with a reason', (_, svgText) => {
    const result = estimateStitches({ kind: 'svg', svgText });
    expect(result.ok).toBe(false);
  });

  it('when path data has an error, then it is measured up to the error and a note says so', () => {
    const estimate = estimateSvg(svg('<path d="M0 50 H100 L x" stroke="#000" stroke-width="0.3" fill="none"/>'));
    expect(estimate.byType.run).toBe(40);
    expect(estimate.notes).toEqual([expect.stringMatching(/measured only up to the error/)]);
  });
});

describe('estimateBorderStitches', () => {
  const repeat: StitchEstimate = {
    stitches: 1000,
    colorChanges: 2,
    trims: 1,
    byType: { run: 100, satin: 600, fill: 300, underlay: 0 },
    widthMm: 60,
    heightMm: 40,
    notes: [],
  };

  it('when 6 repeats of a 3-colour motif are sewn in 3 hoopings, then colours restart each hooping', () => {
    const border = estimateBorderStitches({ repeat, fit: { count: 6, pitchMm: 62, repeatWidthMm: 60 }, hoopings: 3 });
    // 3 hoopings × 2 changes inside + 2 changes back to the first colour; 3 colours × (6 − 3) jumps + 6 × 1 trims.
    expect(border).toMatchObject({
      ok: true,
      stitches: 6000,
      colorChanges: 8,
      trims: 15,
      widthMm: 5 * 62 + 60,
      heightMm: 40,
    });
  });

  it('when the motif has one colour, then no colour changes are added between hoopings', () => {
    const border = estimateBorderStitches({
      repeat: { ...repeat, colorChanges: 0 },
      fit: { count: 4, pitchMm: 60, repeatWidthMm: 60 },
      hoopings: 4,
    });
    expect(border).toMatchObject({ ok: true, colorChanges: 0 });
  });

  it('when there are more hoopings than repeats, then it fails', () => {
    expect(estimateBorderStitches({ repeat, fit: { count: 2, pitchMm: 60, repeatWidthMm: 60 }, hoopings: 3 }).ok).toBe(
      false,
    );
  });
});
