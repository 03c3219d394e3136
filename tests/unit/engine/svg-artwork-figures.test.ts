import { describe, expect, it } from 'vitest';
import {
  DEFAULT_STITCH_SETTINGS,
  estimateStitches,
  MAX_SVG_PATH_SEGMENTS,
  measureSvgArtwork,
} from '../../../server/src/engine/index.ts';

const svg = (body: string, root = 'width="100mm" height="100mm" viewBox="0 0 100 100"') =>
  `<svg xmlns="http://www.w3.org/2000/svg" ${root}>${body}</svg>`;

describe('estimateStitches: results that cannot be counted', () => {
  it('when a path is M0 0H1e200V1e200H0Z, then it refuses with a reason instead of Infinity stitches', () => {
    const result = estimateStitches({ kind: 'svg', svgText: svg('<path d="M0 0H1e200V1e200H0Z" fill="#000"/>') });
    expect(result).toEqual({ ok: false, reason: expect.stringMatching(/too large to measure/) });
  });

  it('when measured figures would pass Number.MAX_SAFE_INTEGER stitches at the size asked, then it refuses with a reason', () => {
    const measured = measureSvgArtwork(svg('<rect width="100" height="100" fill="#000"/>'), DEFAULT_STITCH_SETTINGS);
    if (!measured.ok) throw new Error(measured.reason);
    const result = estimateStitches({ kind: 'svg-figures', figures: measured.figures, size: { mmPerUnit: 1e8 } });
    expect(result).toEqual({ ok: false, reason: expect.stringMatching(/more stitches than can be counted/) });
  });
});

describe('measureSvgArtwork', () => {
  it('when artwork is measured once and counted at a width, then it gives what estimating the text gives', () => {
    const text = svg(
      '<circle cx="30" cy="30" r="20" fill="#f4a6c0"/><path d="M10 80 C30 60 70 100 90 80" stroke="#2e241e" stroke-width="1.5" fill="none"/><rect x="60" y="10" width="30" height="4" fill="#204080"/>',
    );
    const measured = measureSvgArtwork(text, DEFAULT_STITCH_SETTINGS);
    if (!measured.ok) throw new Error(measured.reason);
    // The figures are stored as JSON with an upload; they must come back the same.
    const figures = JSON.parse(JSON.stringify(measured.figures));
    for (const widthMm of [20, 60, 150]) {
      const fromFigures = estimateStitches({ kind: 'svg-figures', figures, size: { widthMm } });
      const fromText = estimateStitches({ kind: 'svg', svgText: text, size: { widthMm } });
      expect(fromFigures).toEqual(fromText);
      expect(fromFigures.ok && fromFigures.stitches).toBeGreaterThan(0);
    }
  });

  it('when the paths have more segments than the cap, then it refuses, saying how many and the cap', () => {
    const steps = Array.from({ length: MAX_SVG_PATH_SEGMENTS }, (_, i) => `L${i % 100} ${(i * 3) % 100}`).join('');
    const result = measureSvgArtwork(
      svg(`<path d="M0 0${steps}" stroke="#000" fill="none"/>`),
      DEFAULT_STITCH_SETTINGS,
    );
    expect(result).toEqual({
      ok: false,
      reason:
        "The artwork's paths have 20,001 segments; 20,000 at most can be measured, so simplify the paths (fewer nodes) and upload it again.",
    });
  });

  it('when the stored figures are not figures, then it refuses with a reason', () => {
    const result = estimateStitches({ kind: 'svg-figures', figures: { version: 7 } as never, size: { widthMm: 50 } });
    expect(result).toEqual({ ok: false, reason: 'The artwork has no stored measurements; upload it again.' });
  });
});
