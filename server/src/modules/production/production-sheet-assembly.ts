/**
 * Puts a production sheet together from the figured design: pure, given the order, the catalogue slice, the
 * threads and the motif artwork the caller read.
 */
import { estimateRunMinutes } from '../../engine/index.ts';
import type { DesignDocument, DesignPlacement } from '../../contracts/designs.ts';
import type { PlacementTemplate, ProductionSheet, SheetPlacement } from '../../contracts/production-sheet.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { OrderToMake, ThreadRow } from './production-sheet-repo.ts';
import type { DesignFigures } from '../quotes/design-figures.ts';
import { smallestHoopHolding, type PlacementFigures } from '../quotes/placement-outcome.ts';
import { sheetBorderPlan } from './production-sheet-hoopings.ts';
import { adviseNeedle } from './production-sheet-needle.ts';
import { letteringOutline, motifOutline, type ArtworkOutline } from './production-sheet-outlines.ts';
import { borderTemplates, itemTemplate } from './production-sheet-templates.ts';
import { BACKING_NAMES, toppingName } from './production-sheet-wording.ts';
import type { QuoteCatalogue } from '../quotes/quote-catalogue-types.ts';

export interface SheetSources {
  order: OrderToMake;
  document: DesignDocument;
  catalogue: QuoteCatalogue;
  figures: DesignFigures;
  threads: ReadonlyMap<string, ThreadRow>;
  /** Motif SVG by slug. */
  artwork: ReadonlyMap<string, string>;
}

/** A thread code no longer in the palette still prints, in a neutral grey, so the sheet never hides a step. */
const UNKNOWN_THREAD_HEX = '#9a9a9a';

export function assembleSheet(sources: SheetSources): Result<ProductionSheet> {
  const { order, document, catalogue, figures } = sources;
  const placements: SheetPlacement[] = [];
  const templates: PlacementTemplate[] = [];
  for (const [index, figured] of figures.placements.entries()) {
    const placement = document.placements[index];
    const sheetPlacement = toSheetPlacement(sources, placement, figured);
    placements.push(sheetPlacement);
    const artwork = artworkOf(sources, placement, sheetPlacement);
    if (artwork && sheetPlacement.hoop) {
      templates.push(
        ...(sheetPlacement.border
          ? borderTemplates(sheetPlacement, sheetPlacement.border, sheetPlacement.hoop, artwork)
          : [itemTemplate(sheetPlacement, sheetPlacement.hoop, artwork)]),
      );
    }
  }

  const { totals } = figures;
  // The whole order: every garment's stitches, stops and hoopings, and the setup once, as the seeds price it.
  const orderRun = estimateRunMinutes({
    stitches: totals.stitches * order.quantity,
    colorChanges: totals.colourChanges * order.quantity,
    hoopings: totals.hoopings * order.quantity,
    trims: totals.trims * order.quantity,
    machine: catalogue.machine,
  });
  if (!orderRun.ok) return failure('conflict', `The machine time can't be estimated: ${orderRun.reason}`);

  return ok({
    order: {
      number: order.number,
      status: order.status,
      customerName: order.customerName,
      neededBy: order.neededBy,
      customerNote: order.customerNote,
      approvalNotes: order.approvalNotes,
      quantity: order.quantity,
      designName: order.designName,
    },
    garment: {
      name: catalogue.garment.name,
      sizeLabel: catalogue.size.label,
      colourName: order.colourName,
      colourHex: order.colourHex,
      fabricType: catalogue.garment.fabricType,
    },
    placements,
    totals,
    stabilizer: {
      ...figures.stabilizer,
      backingName: BACKING_NAMES[figures.stabilizer.backing],
      toppingName: toppingName(figures.stabilizer.topping),
    },
    needle: adviseNeedle(catalogue.garment.fabricType, catalogue.garment.isNapped),
    runMinutes: {
      totalMinutes: figures.runMinutes.totalMinutes,
      orderMinutes: orderRun.totalMinutes,
      items: figures.runMinutes.items,
    },
    cautions: figures.cautions,
    templates,
  });
}

function toSheetPlacement(
  sources: SheetSources,
  placement: DesignPlacement,
  figured: PlacementFigures,
): SheetPlacement {
  const { estimate } = figured;
  const codes =
    placement.kind === 'lettering' ? [placement.thread] : placement.kind === 'artwork' ? [] : placement.threads;
  const hoop =
    figured.border?.hoop ?? smallestHoopHolding(sources.catalogue.hoops, estimate.widthMm, estimate.heightMm) ?? null;
  let border: SheetPlacement['border'] = null;
  const motif = placement.kind === 'border' ? sources.catalogue.motifs.get(placement.motif) : undefined;
  if (figured.border && placement.kind === 'border' && motif) {
    const repeatHeightMm = motif.heightMm * (figured.border.repeatWidthMm / motif.widthMm);
    border = sheetBorderPlan(figured.border, repeatHeightMm, placement.hemOffsetMm);
  }
  return {
    id: figured.id,
    kind: figured.kind,
    label: figured.label,
    stitches: estimate.stitches,
    colourChanges: estimate.colorChanges,
    trims: estimate.trims,
    hoopings: figured.hoopings,
    widthMm: estimate.widthMm,
    heightMm: estimate.heightMm,
    hoop,
    threads: codes.map((code, i) => {
      const thread = sources.threads.get(code);
      return {
        order: i + 1,
        code,
        name: thread?.name ?? 'Not in the palette any more',
        hex: thread?.hex ?? UNKNOWN_THREAD_HEX,
      };
    }),
    border,
  };
}

/** The outline a template draws; customer artwork has none yet (the server does not store uploads for orders). */
function artworkOf(
  sources: SheetSources,
  placement: DesignPlacement,
  sheetPlacement: SheetPlacement,
): ArtworkOutline | undefined {
  if (placement.kind === 'border' || placement.kind === 'motif') {
    const motif = sources.catalogue.motifs.get(placement.motif);
    const svg = sources.artwork.get(placement.motif);
    if (!motif || !svg) return undefined;
    // A border's exact scale, not the rounded percentage, so the outline is as wide as the repeat.
    const scale = sheetPlacement.border
      ? sheetPlacement.border.repeatWidthMm / motif.widthMm
      : placement.kind === 'motif'
        ? placement.scalePct / 100
        : 1;
    return motifOutline(svg, motif, scale);
  }
  if (placement.kind === 'lettering') {
    const font = sources.catalogue.fonts.get(placement.font);
    const hex = sheetPlacement.threads[0]?.hex ?? UNKNOWN_THREAD_HEX;
    return font ? letteringOutline(font.outlines, placement.text, placement.letterHeightMm, hex) : undefined;
  }
  return undefined;
}
