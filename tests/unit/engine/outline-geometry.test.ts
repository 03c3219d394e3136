import { svgPathProperties } from 'svg-path-properties';
import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '../../../server/src/engine/index.ts';
import { filledArea, polylineLength, signedArea, type Polyline } from '../../../server/src/engine/outline-geometry.ts';
import { DEFAULT_STITCH_SETTINGS } from '../../../server/src/engine/stitch-settings.ts';
import { measureSvgOutline } from '../../../server/src/engine/svg-path-outline.ts';
import { parseSvgLengthMm } from '../../../server/src/engine/units.ts';

/** Path data in mm, flattened by the same pipeline the SVG estimator uses. */
function outlineOf(pathData: string): Polyline[] {
  return measureSvgOutline(pathData, '', 1, DEFAULT_STITCH_SETTINGS.flatteningToleranceMm)?.polylines ?? [];
}

describe('units', () => {
  it('1 in = 25.4 mm exactly (International Yard and Pound Agreement, 1959; NIST SP 811 App. B)', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(parseSvgLengthMm('1in')).toBe(25.4);
    // W3C CSS Values and Units Level 3, absolute lengths: 1in = 72pt = 6pc = 96px = 2.54cm.
    expect(parseSvgLengthMm('72pt')).toBeCloseTo(25.4, 12);
    expect(parseSvgLengthMm('6pc')).toBeCloseTo(25.4, 12);
    expect(parseSvgLengthMm('96px')).toBeCloseTo(25.4, 12);
    expect(parseSvgLengthMm('2.54cm')).toBeCloseTo(25.4, 12);
    expect(parseSvgLengthMm('96')).toBeCloseTo(25.4, 12);
  });

  it.each(['50%', '2em', '-3mm', '0', 'wide', '5constructor', undefined])(
    'when a length is %s, then it has no absolute size',
    (value) => {
      expect(parseSvgLengthMm(value)).toBeUndefined();
    },
  );
});

describe('outline geometry', () => {
  it('polygon area matches the Rosetta Code "Shoelace formula for polygonal area" worked example (30)', () => {
    // Rosetta Code task: points (3,4), (5,11), (12,8), (9,5), (5,6) enclose an area of 30.
    expect(Math.abs(signedArea([3, 4, 5, 11, 12, 8, 9, 5, 5, 6]))).toBe(30);
    expect(filledArea(outlineOf('M3 4 L5 11 L12 8 L9 5 L5 6 Z'), 'nonzero')).toBeCloseTo(30, 12);
  });

  it.each([
    ['lines', 'M10 10 H80 V60 L20 70 Z'],
    ['cubics with smooth continuations', 'M5 40 C5 10 45 10 45 40 S85 70 85 40 s20 -30 30 0'],
    ['quadratics', 'M0 0 Q30 40 60 0 T120 0 q15 25 30 0'],
    ['arcs', 'M10 50 A40 25 0 0 1 90 50 a20 20 0 1 0 40 0 A15 30 30 0 1 150 40'],
    ['a circle of 3 mm radius', 'M13 10 A3 3 0 0 1 7 10 A3 3 0 0 1 13 10 Z'],
    [
      'a mix with relative commands',
      'm20 20 l40 5 c10 0 20 10 20 20 q0 20 -20 20 a10 10 0 0 1 -20 0 z m70 0 h30 v30 h-30 z',
    ],
  ])('path length of %s is within 0.1 %% of svg-path-properties', (_, pathData) => {
    // svg-path-properties 1.3.0 is the independent reference implementation (it integrates curve lengths).
    const expected = new svgPathProperties(pathData).getTotalLength();
    const measured = outlineOf(pathData).reduce((sum, polyline) => sum + polylineLength(polyline), 0);
    expect(Math.abs(measured - expected) / expected).toBeLessThan(0.001);
  });

  it('when a ring is drawn with a reversed hole or under evenodd, then only the ring is filled', () => {
    const outer = 'M0 0 H40 V40 H0 Z';
    expect(filledArea(outlineOf(`${outer} M10 10 V30 H30 V10 Z`), 'nonzero')).toBeCloseTo(1600 - 400, 9);
    expect(filledArea(outlineOf(`${outer} M10 10 H30 V30 H10 Z`), 'nonzero')).toBeCloseTo(1600, 9);
    expect(filledArea(outlineOf(`${outer} M10 10 H30 V30 H10 Z`), 'evenodd')).toBeCloseTo(1600 - 400, 9);
    // An island inside the hole is painted again under both rules.
    expect(filledArea(outlineOf(`${outer} M10 10 V30 H30 V10 Z M15 15 H25 V25 H15 Z`), 'nonzero')).toBeCloseTo(
      1600 - 400 + 100,
      9,
    );
    expect(filledArea(outlineOf(`${outer} M10 10 H30 V30 H10 Z M15 15 H25 V25 H15 Z`), 'evenodd')).toBeCloseTo(
      1600 - 400 + 100,
      9,
    );
  });

  it('when two separate shapes wind in opposite directions, then both are filled', () => {
    expect(filledArea(outlineOf('M0 0 H10 V10 H0 Z M20 0 V10 H30 V0 Z'), 'nonzero')).toBeCloseTo(200, 9);
  });
});
