import { fail, type EngineResult } from './engine-result.ts';
import { resolveMmPerUnit, type SvgSize } from './svg-artwork-figures.ts';
import type { StitchTally } from './shape-stitches.ts';
import { readSvgDrawing } from './svg-document.ts';
import { parseSvgLengthMm } from './units.ts';

/** A catalogue motif's stitches at 100 % by type, as the motifs table holds them (no separate underlay). */
export interface MotifStitchMix {
  run: number;
  satin: number;
  fill: number;
}

/**
 * The artwork's canvas at 100 %, mm, with the scale from SVG user units: the viewBox (or, without one, the
 * width and height) in the file's own absolute units, or stretched to `size`. The canvas, not the stitched extent,
 * is a motif's size, because border repeats are laid end to end by it.
 */
export function svgCanvasSizeMm(
  svgText: string,
  size?: SvgSize,
): EngineResult<{ widthMm: number; heightMm: number; mmPerUnit: number }> {
  const drawing = readSvgDrawing(svgText);
  if ('reason' in drawing) return drawing;
  const mmPerUnit = resolveMmPerUnit(drawing, size);
  if (typeof mmPerUnit !== 'number') return mmPerUnit;
  if (drawing.viewBox)
    return { ok: true, widthMm: drawing.viewBox[2] * mmPerUnit, heightMm: drawing.viewBox[3] * mmPerUnit, mmPerUnit };
  const widthMm = parseSvgLengthMm(drawing.width);
  const heightMm = parseSvgLengthMm(drawing.height);
  if (widthMm === undefined || heightMm === undefined)
    return fail('The artwork does not say how big it is: give its width in millimetres.');
  const stretch = size && 'widthMm' in size ? size.widthMm / widthMm : 1;
  return { ok: true, widthMm: widthMm * stretch, heightMm: heightMm * stretch, mmPerUnit: mmPerUnit * stretch };
}

/**
 * An estimate's tally in the motif table's three columns. Underlay is sewn beneath satin columns and fills and
 * scales with them when the motif is resized, so it is shared between satin and fill in proportion to their
 * top stitches (running stitch takes none); the total is unchanged.
 */
export function foldUnderlay(tally: StitchTally): MotifStitchMix {
  const covered = tally.satin + tally.fill;
  if (tally.underlay === 0 || covered === 0)
    return { run: tally.run + tally.underlay, satin: tally.satin, fill: tally.fill };
  const toSatin = Math.round((tally.underlay * tally.satin) / covered);
  return { run: tally.run, satin: tally.satin + toSatin, fill: tally.fill + tally.underlay - toSatin };
}

/**
 * A measured total split in the proportions of an estimated mix, in whole stitches that add up exactly
 * (largest remainder). Fails when the estimate has no stitches to take proportions from.
 */
export function apportionStitches(total: number, shares: MotifStitchMix): EngineResult<{ mix: MotifStitchMix }> {
  const keys = ['run', 'satin', 'fill'] as const;
  const sum = shares.run + shares.satin + shares.fill;
  if (!Number.isInteger(total) || total < 0) return fail('The stitch count must be a whole number of stitches.');
  if (sum <= 0)
    return fail('The estimate found nothing to stitch, so the mix of running, satin and fill must be entered.');
  const exact = keys.map((key) => (total * shares[key]) / sum);
  const mix = { run: Math.floor(exact[0]!), satin: Math.floor(exact[1]!), fill: Math.floor(exact[2]!) };
  let left = total - mix.run - mix.satin - mix.fill;
  const byRemainder = keys
    .map((key, i) => ({ key, remainder: exact[i]! - Math.floor(exact[i]!) }))
    .sort((x, y) => y.remainder - x.remainder);
  for (const { key } of byRemainder) {
    if (left === 0) break;
    mix[key] += 1;
    left -= 1;
  }
  return { ok: true, mix };
}

/** The distinct colours of the artwork in stitching order (fill before stroke of each shape), `#rrggbb`. */
export function svgColoursInOrder(svgText: string): EngineResult<{ colours: string[] }> {
  const drawing = readSvgDrawing(svgText);
  if ('reason' in drawing) return drawing;
  const colours: string[] = [];
  for (const drawable of drawing.drawables) {
    for (const colour of [drawable.fill, drawable.stroke]) {
      const hex = colour?.toLowerCase();
      if (hex && /^#[0-9a-f]{6}$/.test(hex) && !colours.includes(hex)) colours.push(hex);
    }
  }
  return { ok: true, colours };
}
