import type { StitchSettings } from './stitch-settings.ts';

/** Stitches by kind. Underlay is counted on its own so top stitching can be compared with published figures. */
export interface StitchTally {
  run: number;
  satin: number;
  fill: number;
  underlay: number;
}

export const EMPTY_TALLY: Readonly<StitchTally> = Object.freeze({ run: 0, satin: 0, fill: 0, underlay: 0 });

/** Rounds a stitch count up; the slack keeps rounding noise from transforms (100.0000000001 mm) from adding one. */
function wholeStitches(exact: number): number {
  return Math.ceil(exact - 1e-9);
}

export function addTallies(a: StitchTally, b: StitchTally): StitchTally {
  return { run: a.run + b.run, satin: a.satin + b.satin, fill: a.fill + b.fill, underlay: a.underlay + b.underlay };
}

export function tallyTotal(tally: StitchTally): number {
  return tally.run + tally.satin + tally.fill + tally.underlay;
}

/**
 * The rectangle with the same area and perimeter as the shape: its long side stands for the satin column's
 * length and its short side for the column's width. For a long thin shape this tends to the usual
 * width ≈ 2·area/perimeter and length ≈ perimeter/2, but it stays right for short columns too (a 10 × 2.5 mm bar
 * gives 10 and 2.5, where perimeter/2 would say 12.5). Shapes rounder than a square have no such rectangle; they
 * count as a square of the same area.
 */
function equivalentColumn(areaMm2: number, perimeterMm: number): { lengthMm: number; widthMm: number } {
  const quarter = perimeterMm / 4;
  const discriminant = quarter * quarter - areaMm2;
  if (discriminant <= 0) return { lengthMm: Math.sqrt(areaMm2), widthMm: Math.sqrt(areaMm2) };
  const lengthMm = quarter + Math.sqrt(discriminant);
  return { lengthMm, widthMm: areaMm2 / lengthMm };
}

/** How a filled shape is sewn: a satin column or a fill. */
export type FilledShapeKind = 'satin' | 'fill';
/** How a stroked line is sewn: running stitch, a satin column or a fill. */
export type StrokeKind = 'run' | FilledShapeKind;

/** Satin when the shape's equivalent column is narrower than the satin limit, else a fill. Sizes in mm. */
export function filledShapeKind(areaMm2: number, perimeterMm: number, settings: StitchSettings): FilledShapeKind {
  return equivalentColumn(areaMm2, perimeterMm).widthMm < settings.satinMaxWidthMm ? 'satin' : 'fill';
}

/** Running stitch under the satin minimum, satin under the satin limit, else a fill. Width in mm. */
export function strokeKind(widthMm: number, settings: StitchSettings): StrokeKind {
  if (widthMm < settings.satinMinStrokeWidthMm) return 'run';
  return widthMm < settings.satinMaxWidthMm ? 'satin' : 'fill';
}

/**
 * A filled shape: satin when its equivalent column is narrower than the satin limit, else a fill; `kind` fixes
 * the type instead (artwork decides it at its drawn size, so a resize does not switch it).
 * Satin: column length ÷ spacing × 2 penetrations (Printwear Jul 2019 p. 24), over a centre-run underlay.
 * Fill: area ÷ (row pitch × stitch length), over rows of underlay plus an edge run (underlay types:
 * tex-inc.com beginner digitizing series; which ones to use is common practice, no source).
 */
export function stitchFilledShape(
  areaMm2: number,
  perimeterMm: number,
  settings: StitchSettings,
  kind: FilledShapeKind = filledShapeKind(areaMm2, perimeterMm, settings),
): StitchTally {
  if (!(areaMm2 > 0) || !(perimeterMm > 0)) return EMPTY_TALLY;
  if (kind === 'satin') return satinColumn(equivalentColumn(areaMm2, perimeterMm).lengthMm, settings);
  return {
    ...EMPTY_TALLY,
    fill: wholeStitches(areaMm2 / (settings.fillRowPitchMm * settings.fillStitchLengthMm)),
    underlay:
      wholeStitches(areaMm2 / (settings.fillUnderlayRowSpacingMm * settings.underlayStitchLengthMm)) +
      wholeStitches(perimeterMm / settings.underlayStitchLengthMm),
  };
}

/**
 * A stroked line: running stitch (times `passes` for double or triple runs) when thinner than the satin minimum,
 * a satin column of the line's length when narrower than the satin limit, else a fill of length × width; `kind`
 * fixes the type instead, as for `stitchFilledShape`.
 */
export function stitchStroke(
  lengthMm: number,
  widthMm: number,
  passes: number,
  settings: StitchSettings,
  kind: StrokeKind = strokeKind(widthMm, settings),
): StitchTally {
  if (!(lengthMm > 0)) return EMPTY_TALLY;
  if (kind === 'run') return { ...EMPTY_TALLY, run: wholeStitches(lengthMm / settings.runStitchLengthMm) * passes };
  if (kind === 'satin') return satinColumn(lengthMm, settings);
  return stitchFilledShape(lengthMm * widthMm, 2 * (lengthMm + widthMm), settings, 'fill');
}

function satinColumn(lengthMm: number, settings: StitchSettings): StitchTally {
  return {
    ...EMPTY_TALLY,
    satin: wholeStitches((lengthMm / settings.satinSpacingMm) * 2),
    underlay: wholeStitches(lengthMm / settings.underlayStitchLengthMm),
  };
}
