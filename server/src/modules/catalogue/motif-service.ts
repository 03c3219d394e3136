/**
 * The studio's motifs: artwork uploaded as SVG (sniffed and sanitized like any upload), measured by the engine,
 * and stored with the figures quotes use. Those figures are the studio's measured count when it gives one (from
 * its digitizing), else the engine's estimate; the estimate is kept beside them either way.
 */
import type { Db } from '../../db/knex.ts';
import { findThreadCodes, listActiveThreads } from './thread-repo.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { CatalogueRowRef } from '../../contracts/admin-catalogue-common.ts';
import type {
  CreateMotifRequest,
  MotifEstimate,
  MotifPreviewResponse,
  UpdateMotifRequest,
} from '../../contracts/admin-catalogue-motifs.ts';
import {
  apportionStitches,
  foldUnderlay,
  nearestThreads,
  svgCanvasSizeMm,
  svgColoursInOrder,
  type EngineResult,
  type MotifStitchMix,
  type StitchEstimate,
  type SvgSize,
} from '../../engine/index.ts';
import type { HeavyWork } from '../../integrations/heavy-work.ts';
import { cleanSvgOffThread } from '../../integrations/inspect-upload-job.ts';
import { createCatalogueRow, editCatalogueRow, setCatalogueRowActive, type RowWording } from './catalogue-rows.ts';

const wording: RowWording = {
  noun: 'motif',
  uniqueField: 'slug',
  duplicateMessage: 'Another motif already uses this short name',
};

type MotifEstimateAt = { estimate: MotifEstimate; mix: MotifStitchMix } | { reason: string };

/**
 * The engine's estimate at a size (worked out in the heavy-work pool), in the motif table's columns; a reason in
 * words when it cannot be made, or the pool's failure when it took too long.
 */
async function estimateAt(work: HeavyWork, svg: string, size: SvgSize | undefined): Promise<Result<MotifEstimateAt>> {
  const estimated = await work.run<EngineResult<StitchEstimate>>('estimateSvg', { svg, size });
  if (!estimated.ok) return estimated;
  return ok(motifEstimateOf(estimated.value));
}

function motifEstimateOf(estimate: EngineResult<StitchEstimate>): MotifEstimateAt {
  if (!estimate.ok) return { reason: estimate.reason };
  const { underlay, ...top } = estimate.byType;
  return {
    estimate: {
      stitchCount: estimate.stitches,
      mix: top,
      underlay,
      colourChanges: estimate.colorChanges,
      notes: estimate.notes,
    },
    mix: foldUnderlay(estimate.byType),
  };
}

export function createCatalogueMotifService(deps: { db: Db; heavyWork: HeavyWork }) {
  const { db, heavyWork } = deps;
  const cleanSvg = (bytes: Buffer) => cleanSvgOffThread(heavyWork, bytes);

  /**
   * What an uploaded SVG would become, without saving: the sanitized drawing, its size at 100 % (from its own
   * units, or stretched to `widthMm`), the engine's estimate and its colours matched to the nearest threads.
   */
  async function preview(bytes: Buffer, widthMm: number | undefined): Promise<Result<MotifPreviewResponse>> {
    const svg = await cleanSvg(bytes);
    if (!svg.ok) return svg;
    const canvas = svgCanvasSizeMm(svg.value, widthMm === undefined ? undefined : { widthMm });
    const measured = canvas.ok
      ? await estimateAt(heavyWork, svg.value, { mmPerUnit: canvas.mmPerUnit })
      : ok<MotifEstimateAt>({ reason: canvas.reason });
    if (!measured.ok) return measured;
    const estimated = measured.value;
    const palette = await listActiveThreads(db);
    const colours = svgColoursInOrder(svg.value);
    return ok({
      svg: svg.value,
      widthMm: canvas.ok ? canvas.widthMm : null,
      heightMm: canvas.ok ? canvas.heightMm : null,
      estimate: 'estimate' in estimated ? estimated.estimate : null,
      ...('reason' in estimated ? { estimateMessage: estimated.reason } : {}),
      colours: (colours.ok ? colours.colours : []).map((hex) => {
        const nearest = palette.length ? nearestThreads(hex, palette, 1) : undefined;
        return { hex, threadCode: nearest?.ok ? (nearest.matches[0]?.thread.code ?? null) : null };
      }),
    });
  }

  /** The columns to store: the clean artwork, the estimate at the given width, and the figures quotes use. */
  async function toRow(request: UpdateMotifRequest): Promise<Result<Record<string, unknown>>> {
    const svg = await cleanSvg(Buffer.from(request.svg, 'utf8'));
    if (!svg.ok) return failure(svg.error.kind, svg.error.message, { svg: svg.error.message });

    const known = new Set(await findThreadCodes(db, request.threadCodes));
    const unknownAt = request.threadCodes.findIndex((code) => !known.has(code));
    if (unknownAt >= 0) {
      const message = `There is no thread ${request.threadCodes[unknownAt]} on the shelf`;
      return failure('invalid', `${message}.`, { [`threadCodes.${unknownAt}`]: message });
    }

    const measured = await estimateAt(heavyWork, svg.value, { widthMm: request.widthMm });
    if (!measured.ok) return failure(measured.error.kind, measured.error.message, { svg: measured.error.message });
    const estimated = measured.value;
    const estimatedMix = 'mix' in estimated && estimated.estimate.stitchCount > 0 ? estimated.mix : undefined;
    let used: MotifStitchMix;
    if (request.measured) {
      const split = request.measured.mix
        ? undefined
        : apportionStitches(request.measured.stitchCount, estimatedMix ?? { run: 0, satin: 0, fill: 0 });
      if (split && !split.ok) return failure('invalid', `${split.reason}`, { 'measured.mix': split.reason });
      used = request.measured.mix ?? (split as { mix: MotifStitchMix }).mix;
    } else if (estimatedMix) {
      used = estimatedMix;
    } else {
      const reason = 'reason' in estimated ? estimated.reason : 'The estimate found nothing to stitch in this artwork.';
      const message = `${reason.replace(/\.$/, '')}; enter the stitch count measured from the digitized file`;
      return failure('invalid', `${message}.`, { 'measured.stitchCount': message });
    }
    return ok({
      name: request.name,
      kind: request.kind,
      svg: svg.value,
      width_mm: request.widthMm,
      height_mm: request.heightMm,
      gap_mm: request.gapMm,
      min_scale_pct: request.minScalePct,
      max_scale_pct: request.maxScalePct,
      colour_count: request.threadCodes.length,
      default_thread_codes: JSON.stringify(request.threadCodes),
      trims: JSON.stringify([...new Set(request.trims)]),
      stitch_count: used.run + used.satin + used.fill,
      run_stitches: used.run,
      satin_stitches: used.satin,
      fill_stitches: used.fill,
      stitch_count_source: request.measured ? 'measured' : 'estimate',
      estimated_run_stitches: estimatedMix?.run ?? null,
      estimated_satin_stitches: estimatedMix?.satin ?? null,
      estimated_fill_stitches: estimatedMix?.fill ?? null,
      ...(request.sortOrder === undefined ? {} : { sort_order: request.sortOrder }),
    });
  }

  async function create(request: CreateMotifRequest, createdByUserId: number): Promise<Result<CatalogueRowRef>> {
    const row = await toRow(request);
    if (!row.ok) return row;
    return createCatalogueRow(
      db,
      'motifs',
      { slug: request.slug, ...row.value, is_active: true, created_by_user_id: createdByUserId },
      wording,
    );
  }

  async function update(id: number, request: UpdateMotifRequest): Promise<Result<CatalogueRowRef>> {
    const row = await toRow(request);
    if (!row.ok) return row;
    return editCatalogueRow(db, 'motifs', { id }, row.value, wording);
  }

  const setActive = (id: number, isActive: boolean) => setCatalogueRowActive(db, 'motifs', id, isActive, wording);

  return { preview, create, update, setActive };
}

export { wording as motifWording };
export type CatalogueMotifService = ReturnType<typeof createCatalogueMotifService>;
