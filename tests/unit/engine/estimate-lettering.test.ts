import { describe, expect, it } from 'vitest';
import {
  estimateStitches,
  MAX_LETTERING_CHARACTERS,
  type GlyphOutlineSource,
} from '../../../server/src/engine/index.ts';
import { loadFontkitOutlines, loadOpentypeFont, loadShippedFont, SHIPPED_FONTS } from './support/load-font.ts';

describe('estimateStitches: lettering', () => {
  it.each(SHIPPED_FONTS)(
    'when "Amelia" is set in %s at 20 mm, then it is satin lettering of a plausible size',
    (name) => {
      const estimate = estimateStitches({
        kind: 'lettering',
        text: 'Amelia',
        font: loadShippedFont(name),
        letterHeightMm: 20,
      });
      expect(estimate.ok).toBe(true);
      if (!estimate.ok) return;
      expect(estimate.byType.satin).toBeGreaterThan(0);
      expect(estimate.byType.run).toBe(0);
      expect(estimate.colorChanges).toBe(0);
      // Six letters sized by a 20 mm capital H: wider than tall, and about as tall as the H (script capitals vary).
      expect(estimate.widthMm).toBeGreaterThan(40);
      expect(estimate.widthMm).toBeLessThan(120);
      expect(estimate.heightMm).toBeGreaterThan(14);
      expect(estimate.heightMm).toBeLessThan(35);
      expect(estimate.stitches).toBe(estimate.byType.satin + estimate.byType.fill + estimate.byType.underlay);
    },
  );

  it('when the capital H is measured, then its stitched height is the letter height asked for', () => {
    const estimate = estimateStitches({
      kind: 'lettering',
      text: 'H',
      font: loadShippedFont('poppins'),
      letterHeightMm: 25,
    });
    expect(estimate.ok && estimate.heightMm).toBeCloseTo(25, 3);
  });

  it('when the letters double in height, then satin stitches roughly double (they follow column length)', () => {
    const font = loadShippedFont('fredoka');
    const small = estimateStitches({ kind: 'lettering', text: 'Noah', font, letterHeightMm: 15 });
    const large = estimateStitches({ kind: 'lettering', text: 'Noah', font, letterHeightMm: 30 });
    if (!small.ok || !large.ok) throw new Error('estimate failed');
    expect(large.byType.satin / small.byType.satin).toBeGreaterThan(1.8);
    expect(large.byType.satin / small.byType.satin).toBeLessThan(2.2);
  });

  it('when letters are very tall, then their wide strokes become fill', () => {
    const estimate = estimateStitches({
      kind: 'lettering',
      text: 'O',
      font: loadShippedFont('poppins'),
      letterHeightMm: 120,
    });
    expect(estimate.ok && estimate.byType.fill).toBeGreaterThan(0);
  });

  it('an opentype.js Font is accepted as it is, and agrees with a fontkit layout of the same font', () => {
    const font: GlyphOutlineSource = loadOpentypeFont('poppins');
    const viaOpentype = estimateStitches({ kind: 'lettering', text: 'Olivia', font, letterHeightMm: 18 });
    const viaFontkit = estimateStitches({
      kind: 'lettering',
      text: 'Olivia',
      font: loadFontkitOutlines('poppins'),
      letterHeightMm: 18,
    });
    if (!viaOpentype.ok || !viaFontkit.ok) throw new Error('estimate failed');
    expect(Math.abs(viaOpentype.stitches - viaFontkit.stitches) / viaFontkit.stitches).toBeLessThan(0.01);
  });

  it('when the font itself throws, then the estimate fails with a reason', () => {
    const brokenFont: GlyphOutlineSource = {
      getPaths() {
        throw new Error('unsupported lookup');
      },
    };
    const estimate = estimateStitches({ kind: 'lettering', text: 'Ava', font: brokenFont, letterHeightMm: 20 });
    expect(estimate).toEqual({ ok: false, reason: 'The font could not draw this text at 20 mm (unsupported lookup).' });
  });

  it.each([
    ['empty text', { text: '  ', letterHeightMm: 20 }, /no text/],
    ['a zero height', { text: 'Ava', letterHeightMm: 0 }, /letter height/],
    ['overlong text', { text: 'a'.repeat(MAX_LETTERING_CHARACTERS + 1), letterHeightMm: 20 }, /limited/],
    ['only spaces between nothing', { text: '\u00a0', letterHeightMm: 20 }, /outline|no text/],
  ])('when given %s, then it fails with a reason', (_, input, reason) => {
    const estimate = estimateStitches({ kind: 'lettering', font: loadShippedFont('pacifico'), ...input });
    expect(estimate.ok).toBe(false);
    expect(!estimate.ok && estimate.reason).toMatch(reason);
  });
});

describe('estimateStitches: lettering laid out once', () => {
  it('when the same text, font and height are estimated again, then the kept answer comes back without drawing the glyphs again', () => {
    const shipped = loadShippedFont('poppins');
    const drawn: string[] = [];
    const font: GlyphOutlineSource = {
      getPaths(text, x, y, fontSize) {
        drawn.push(text);
        return shipped.getPaths(text, x, y, fontSize);
      },
    };
    const name = { kind: 'lettering', text: 'Amelia', font, letterHeightMm: 20 } as const;
    const first = estimateStitches(name);
    const again = estimateStitches(name);
    expect(again).toBe(first);
    expect(Object.isFrozen(first)).toBe(true);
    // The capital H once for the font's letter height, then the text once.
    expect(drawn).toEqual(['H', 'Amelia']);

    const taller = estimateStitches({ ...name, letterHeightMm: 30 });
    expect(drawn).toEqual(['H', 'Amelia', 'Amelia']);
    expect(taller.ok && first.ok && taller.heightMm).toBeCloseTo(first.ok ? first.heightMm * 1.5 : 0, 6);
  });
});
