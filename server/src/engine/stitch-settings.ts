import { fail, type Failure } from './engine-result.ts';
import { isPositiveNumber, isRecord } from './input-checks.ts';

/**
 * How artwork and lettering turn into stitches. Every value is a shop setting; the defaults are the trade's
 * published rules of thumb, listed with their sources (see the team's trade-facts reference).
 */
export interface StitchSettings {
  /** Running stitch length, mm. */
  runStitchLengthMm: number;
  /** Distance between neighbouring fill rows, mm. */
  fillRowPitchMm: number;
  /** Length of each fill stitch along a row, mm. */
  fillStitchLengthMm: number;
  /** Satin spacing between same-side needle penetrations, mm. */
  satinSpacingMm: number;
  /** Filled shapes narrower than this, and strokes narrower than this, are satin columns; wider ones are fill, mm. */
  satinMaxWidthMm: number;
  /** Strokes at least this wide are satin columns; thinner strokes are running stitch, mm. */
  satinMinStrokeWidthMm: number;
  /** Underlay stitch length (centre runs under satin, edge runs and rows under fill), mm. */
  underlayStitchLengthMm: number;
  /** Spacing of the underlay rows laid under a fill, mm. */
  fillUnderlayRowSpacingMm: number;
  /** Largest distance between a curve and the straight pieces that replace it when measuring, mm. */
  flatteningToleranceMm: number;
}

export const DEFAULT_STITCH_SETTINGS: Readonly<StitchSettings> = Object.freeze({
  // Printwear, Feb 2016, p. 61: running stitches 1 mm minimum, about 5 mm maximum, best minimum 1.5–2.0 mm.
  // 2.5 mm is the default and sits inside that range.
  runStitchLengthMm: 2.5,
  // Printwear, Jul 2019, p. 24 (and L. Goodall, "Understanding Density"): fill density about 0.4 mm, measured from
  // row 1 across row 2 to row 3, i.e. over two rows, so one row pitch is 0.2 mm. With 4 mm stitches that is
  // 645.16 / (0.2 × 4) ≈ 806 stitches per square inch, inside the 710–1,030 of the seminar table
  // (chholderby.com "Estimating Stitches").
  fillRowPitchMm: 0.2,
  // Printwear, Feb 2016, p. 63: 4 mm is the standard fill stitch length (3–5 mm recommended).
  fillStitchLengthMm: 4,
  // Printwear, Jul 2019, p. 24; L. Goodall p. 16: satin spacing about 0.4 mm ("4 points"), measured between
  // same-side penetrations, so two stitches per spacing: 50 stitches per cm of column.
  satinSpacingMm: 0.4,
  // graphics-pro.com "Stitching Guidelines for Digitizing"; Printwear Feb 2016 p. 61: satin is safe to 8–10 mm,
  // 9 mm recommended maximum. 7 mm (the figure) keeps estimates clear of that limit: common practice, no source.
  satinMaxWidthMm: 7,
  // graphics-pro.com "Stitching Guidelines for Digitizing": the narrowest satin column is about 1 mm.
  satinMinStrokeWidthMm: 1,
  // tex-inc.com beginner digitizing series; "Compiled Embroidery Skill Articles" pp. 16, 52: underlay stitches 2–3 mm.
  underlayStitchLengthMm: 2.5,
  // Same sources: underlay spacing 2–4 mm; 3 mm is the middle of the range.
  fillUnderlayRowSpacingMm: 3,
  // Geometry, not trade practice: 0.005 mm keeps a flattened circle's length within 0.1 % of the true length
  // down to about 1.5 mm radius, far finer than a needle (0.75 mm, Printwear Feb 2016 p. 61).
  flatteningToleranceMm: 0.005,
});

/** Passes over a running-stitch line, chosen with the `data-stitch` attribute in SVG artwork. */
export const RUN_PASSES: Readonly<Record<string, number>> = Object.freeze({
  // embroidery-digitizing-site.com: a double (two-ply) run goes A→B→A.
  double: 2,
  // Printwear, May 2019, p. 23; embroidery-digitizing-site.com: a bean or triple run goes A→B→A→B, 3 passes.
  triple: 3,
  bean: 3,
});

/** Defaults overlaid with the caller's overrides, or a failure naming the first bad value. */
export function resolveStitchSettings(overrides: Partial<StitchSettings> | undefined): StitchSettings | Failure {
  if (overrides === undefined) return DEFAULT_STITCH_SETTINGS;
  if (!isRecord(overrides)) return fail('The stitch settings must be an object of millimetre values.');
  const settings = { ...DEFAULT_STITCH_SETTINGS, ...overrides };
  for (const key of Object.keys(DEFAULT_STITCH_SETTINGS) as (keyof StitchSettings)[]) {
    if (!isPositiveNumber(settings[key]))
      return fail(`The stitch setting "${key}" must be a positive number of millimetres.`);
  }
  return settings;
}
