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
import type { ArtworkPicture } from '../artwork/artwork-service.ts';
import { artworkTemplateOutline, artworkThreads } from './production-sheet-artwork.ts';
import { landmarksOf, placementPositionOf } from './production-sheet-position.ts';
import { planSewingOrder } from './production-sheet-sewing-order.ts';
import { formatLengthPlain } from './format-length-plain.ts';

export interface SheetSources {
  order: OrderToMake;
  document: DesignDocument;
  catalogue: QuoteCatalogue;
  figures: DesignFigures;
  threads: ReadonlyMap<string, ThreadRow>;
  /** Motif SVG by slug. */
  artwork: ReadonlyMap<string, string>;
  /** The customer's uploads the design names, by id. */
  pictures: ReadonlyMap<number, ArtworkPicture>;
  /** The active palette, which the customer's own colours are matched to. */
  palette: readonly ThreadRow[];
  /** The studio's stitch-file names by placement id, where entered. */
  stitchFileNames: ReadonlyMap<string, string>;
}

/** A thread code no longer in the palette still prints, in a neutral grey, so the sheet never hides a step. */
const UNKNOWN_THREAD_HEX = '#9a9a9a';

export function assembleSheet(sources: SheetSources): Result<ProductionSheet> {
  const { order, document, catalogue, figures } = sources;
  const drafts = figures.placements.map((figured, index) =>
    toSheetPlacement(sources, document.placements[index]!, figured),
  );
  const hemZone = catalogue.size.zones.find((zone) => zone.code === 'hem');
  const { sewingOrder, byId } = planSewingOrder(
    drafts.map((placement, index) => ({ placement, where: whereOf(document.placements[index]!) })),
    hemZone && catalogue.size.hemFrontMm !== null
      ? { zone: hemZone, hemFrontMm: catalogue.size.hemFrontMm }
      : undefined,
  );
  const placements: SheetPlacement[] = drafts.map((draft) => ({
    ...draft,
    sewOrder: byId.get(draft.id)?.sewOrder ?? 0,
    hoopingWarning: byId.get(draft.id)?.hoopingWarning ?? null,
  }));
  const templates: PlacementTemplate[] = [];
  for (const [index, sheetPlacement] of placements.entries()) {
    const placement = document.placements[index]!;
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
    sewingOrder,
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
  const picture = placement.kind === 'artwork' ? sources.pictures.get(placement.artworkUploadId) : undefined;
  const where = whereOf(placement);
  const landmarks = landmarksOf(
    sources.order.landmarks,
    sources.catalogue.size.zones.find((zone) => zone.code === 'hem'),
  );
  const fileName = sources.stitchFileNames.get(figured.id);
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
    threads: picture
      ? artworkThreads(picture, sources.palette)
      : codes.map((code, i) => {
          const thread = sources.threads.get(code);
          return {
            order: i + 1,
            code,
            name: thread?.name ?? 'Not in the palette any more',
            hex: thread?.hex ?? UNKNOWN_THREAD_HEX,
          };
        }),
    border,
    position: where ? placementPositionOf(where, sources.order.mockupWidthMm, landmarks) : null,
    lettering: placement.kind === 'lettering' ? letteringOf(sources, placement) : null,
    sewOrder: 0,
    hoopingWarning: null,
    ...(fileName === undefined ? {} : { stitchFileName: fileName }),
  };
}

/** A single item's centre and turn on the garment; null for a border, which runs along the hem. */
function whereOf(placement: DesignPlacement) {
  return placement.kind === 'border'
    ? null
    : { centerXMm: placement.centerXMm, centerYMm: placement.centerYMm, rotationDeg: placement.rotationDeg };
}

function letteringOf(
  sources: SheetSources,
  placement: Extract<DesignPlacement, { kind: 'lettering' }>,
): NonNullable<SheetPlacement['lettering']> {
  const fontName = sources.catalogue.fonts.get(placement.font)?.name ?? placement.font;
  return {
    text: placement.text,
    fontName,
    letterHeightMm: placement.letterHeightMm,
    words: `“${placement.text}” in ${fontName}, capital letters ${formatLengthPlain(placement.letterHeightMm)} tall when stitched.`,
  };
}

/** The outline a template draws: a motif's, the lettering's, or the customer's upload at its placed width. */
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
  const picture = sources.pictures.get(placement.artworkUploadId);
  return picture ? artworkTemplateOutline(picture, placement.widthMm) : undefined;
}
