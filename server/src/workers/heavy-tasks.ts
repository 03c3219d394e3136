/**
 * The jobs the heavy-work pool runs in its threads (see `integrations/heavy-work.ts`), one export per task name.
 * Each takes plain data and answers a `Result`; Buffers arrive and leave as Uint8Arrays.
 */
import { failure, ok, type Result } from '../contracts/result.ts';
import type { PaperSize, ProductionSheet } from '../contracts/production-sheet.ts';
import {
  DEFAULT_STITCH_SETTINGS,
  estimateStitches,
  measureSvgArtwork,
  type EngineResult,
  type StitchEstimate,
  type SvgArtworkFigures,
  type SvgSize,
} from '../engine/index.ts';
import { inspectUpload as inspect, type InspectedUpload, type UploadKind } from '../integrations/inspect-upload.ts';
import { createLetteringFontLoader } from '../integrations/lettering-fonts.ts';
import { asBuffer } from '../integrations/heavy-work.ts';
import { renderProof as drawProof } from '../modules/orders/proof-render.ts';
import type { ProofScene } from '../modules/orders/proof-scene-repo.ts';
import { renderProductionSheetPdf } from '../modules/production/production-sheet-pdf.ts';

const fonts = createLetteringFontLoader();

/** Run once when the pool starts: by then this module and everything it imports are loaded. */
export function warmUp(): boolean {
  return true;
}

export function inspectUpload(input: { bytes: Uint8Array; allowed: UploadKind[] }): Promise<Result<InspectedUpload>> {
  return inspect(asBuffer(input.bytes), input.allowed);
}

/** A customer's upload checked and, for an SVG, measured once for every later quote. */
export async function inspectArtwork(input: {
  bytes: Uint8Array;
}): Promise<Result<{ upload: InspectedUpload; figures: SvgArtworkFigures | null }>> {
  const inspected = await inspect(asBuffer(input.bytes), ['svg', 'png', 'jpeg']);
  if (!inspected.ok) return inspected;
  if (inspected.value.kind !== 'svg') return ok({ upload: inspected.value, figures: null });
  const measured = measureSvgArtwork(inspected.value.svg, DEFAULT_STITCH_SETTINGS);
  if (!measured.ok) return failure('invalid', `Your artwork can't be measured for stitching: ${measured.reason}`);
  return ok({ upload: inspected.value, figures: measured.figures });
}

export async function estimateSvg(input: {
  svg: string;
  size: SvgSize | undefined;
}): Promise<Result<EngineResult<StitchEstimate>>> {
  return ok(estimateStitches({ kind: 'svg', svgText: input.svg, size: input.size }));
}

export async function renderProof(
  scene: ProofScene,
): Promise<Result<{ png: Uint8Array; widthPx: number; heightPx: number }>> {
  return ok(await drawProof(scene, fonts));
}

export async function productionSheetPdf(input: {
  sheet: ProductionSheet;
  paper: PaperSize;
}): Promise<Result<Uint8Array>> {
  return ok(await renderProductionSheetPdf(input.sheet, input.paper));
}
