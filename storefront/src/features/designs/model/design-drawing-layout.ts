import type {
  GarmentSummary,
  LetteringFontSummary,
  MotifSummary,
  ThreadColourSummary,
} from '@server/contracts/catalogue.ts';
import type { BorderPlacement, DesignDocument, DesignPlacement } from '@server/contracts/designs.ts';
// Straight from its module: the engine's entry also registers colour spaces at load, which a drawing does not need.
import { fitMotifBorder } from '@server/engine/fit-border.ts';

/** A box on the mockup at the design's size, mm from its top left corner. */
export interface BoxMm {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
}

interface Turned {
  centerXMm: number;
  centerYMm: number;
  rotationDeg: number;
}

/** One placement as the read-only drawing shows it; `label` says in words what it is, for the list beside it. */
export type DrawnPlacement =
  | {
      kind: 'border';
      id: string;
      label: string;
      svg: string;
      threadHexes: (string | undefined)[];
      visible: BoxMm;
      repeats: BoxMm[];
    }
  | ({
      kind: 'motif';
      id: string;
      label: string;
      svg: string;
      threadHexes: (string | undefined)[];
      widthMm: number;
      heightMm: number;
    } & Turned)
  | ({
      kind: 'lettering';
      id: string;
      label: string;
      text: string;
      fontFamily: string;
      letterHeightMm: number;
      hex: string | undefined;
    } & Turned)
  | ({ kind: 'artwork'; id: string; label: string; widthMm: number } & Turned)
  /** A placement the catalogue no longer has the motif or font for: listed, not drawn. */
  | { kind: 'unavailable'; id: string; label: string };

export interface DesignDrawingLayout {
  /** The mockup at the design's size, mm: the drawing's viewBox. */
  widthMm: number;
  heightMm: number;
  placements: DrawnPlacement[];
}

export interface DrawingCatalogue {
  garment: GarmentSummary;
  motifs: MotifSummary[];
  fonts: LetteringFontSummary[];
  threads: ThreadColourSummary[];
}

const HEM_ZONE = 'hem';
/** A repeat that only meets the front panel's edge (up to rounding) is round the back, not on the front. */
const TOUCH_MM = 0.01;

/**
 * Lays a border's repeats on the front of the mockup with the engine's fit (the one the server prices): the hem
 * loop is unrolled from the back seam, so the front panel is its middle stretch, and repeats past the panel's ends
 * are round the back. The centre line sits `hemOffsetMm` above the hem zone's bottom edge.
 */
function drawBorder(
  size: GarmentSummary['sizes'][number],
  border: BorderPlacement,
  motif: MotifSummary,
  hexes: (string | undefined)[],
): DrawnPlacement {
  const hem = size.zones.find((zone) => zone.code === HEM_ZONE);
  const isLoop = border.run === 'circumference';
  const runMm = isLoop ? size.hemCircumferenceMm : size.hemFrontMm;
  const frontMm = size.hemFrontMm;
  const fit =
    hem && runMm !== null && frontMm !== null
      ? fitMotifBorder(motif, { runLengthMm: runMm, closed: isLoop, count: border.count })
      : undefined;
  if (!hem || !fit?.ok || runMm === null || frontMm === null) {
    return { kind: 'unavailable', id: border.id, label: `Border: ${motif.name} (it no longer fits this size)` };
  }
  const panelLeftMm = hem.xMm + (hem.widthMm - frontMm) / 2;
  const lineYMm = hem.yMm + hem.heightMm - border.hemOffsetMm;
  const heightMm = motif.heightMm * fit.scale;
  const skippedMm = isLoop ? (runMm - frontMm) / 2 : 0;
  const repeats = fit.centersMm
    .map((alongMm) => ({
      xMm: panelLeftMm + alongMm - skippedMm - fit.repeatWidthMm / 2,
      yMm: lineYMm - heightMm / 2,
      widthMm: fit.repeatWidthMm,
      heightMm,
    }))
    .filter(
      (repeat) =>
        Math.min(repeat.xMm + repeat.widthMm, panelLeftMm + frontMm) - Math.max(repeat.xMm, panelLeftMm) > TOUCH_MM,
    );
  const where = isLoop ? 'all the way round' : 'along the front';
  return {
    kind: 'border',
    id: border.id,
    label: `Border: ${motif.name}, ${fit.count} repeats ${where}`,
    svg: motif.svg,
    threadHexes: hexes,
    visible: { xMm: panelLeftMm, yMm: lineYMm - heightMm, widthMm: frontMm, heightMm: heightMm * 2 },
    repeats,
  };
}

function drawPlacement(
  catalogue: DrawingCatalogue,
  size: GarmentSummary['sizes'][number],
  placement: DesignPlacement,
): DrawnPlacement {
  const hexOf = (code: string) => catalogue.threads.find((thread) => thread.code === code)?.hex;
  if (placement.kind === 'artwork') {
    return {
      kind: 'artwork',
      id: placement.id,
      label: 'An uploaded picture (drawn as a dashed outline)',
      widthMm: placement.widthMm,
      centerXMm: placement.centerXMm,
      centerYMm: placement.centerYMm,
      rotationDeg: placement.rotationDeg,
    };
  }
  if (placement.kind === 'lettering') {
    const font = catalogue.fonts.find((candidate) => candidate.slug === placement.font);
    if (!font)
      return {
        kind: 'unavailable',
        id: placement.id,
        label: `Name “${placement.text}” (its lettering is no longer offered)`,
      };
    const { centerXMm, centerYMm, rotationDeg, text, letterHeightMm } = placement;
    return {
      kind: 'lettering',
      id: placement.id,
      label: `Name “${text}” in ${font.name}`,
      text,
      fontFamily: font.fontFamily,
      letterHeightMm,
      hex: hexOf(placement.thread),
      centerXMm,
      centerYMm,
      rotationDeg,
    };
  }
  const motif = catalogue.motifs.find((candidate) => candidate.slug === placement.motif);
  if (!motif) return { kind: 'unavailable', id: placement.id, label: 'A motif that is no longer offered' };
  const hexes = placement.threads.map(hexOf);
  if (placement.kind === 'border') return drawBorder(size, placement, motif, hexes);
  const scale = placement.scalePct / 100;
  const { centerXMm, centerYMm, rotationDeg } = placement;
  return {
    kind: 'motif',
    id: placement.id,
    label: `Motif: ${motif.name}`,
    svg: motif.svg,
    threadHexes: hexes,
    widthMm: motif.widthMm * scale,
    heightMm: motif.heightMm * scale,
    centerXMm,
    centerYMm,
    rotationDeg,
  };
}

/**
 * A saved or shared design laid out for a still drawing, without the designer's canvas: the garment's mockup at the
 * chosen size and every placement where the document puts it, in the mockup's millimetres. Undefined when the
 * garment no longer has the design's size.
 */
export function layoutDesignDrawing(
  catalogue: DrawingCatalogue,
  sizeId: number,
  document: DesignDocument,
): DesignDrawingLayout | undefined {
  const size = catalogue.garment.sizes.find((candidate) => candidate.id === sizeId);
  if (!size) return undefined;
  return {
    widthMm: catalogue.garment.mockupWidthMm * size.mockupScale,
    heightMm: catalogue.garment.mockupHeightMm * size.mockupScale,
    placements: document.placements.map((placement) => drawPlacement(catalogue, size, placement)),
  };
}

/** The whole public catalogue, as the pages fetch it. */
export interface CatalogueLists {
  garments: GarmentSummary[];
  motifs: MotifSummary[];
  fonts: LetteringFontSummary[];
  threads: ThreadColourSummary[];
}

/** A design's garment and its drawing from the catalogue lists; either is undefined when the catalogue lost it. */
export function drawingOf(
  lists: CatalogueLists,
  design: { garmentId: number; sizeId: number; document: DesignDocument },
) {
  const garment = lists.garments.find((candidate) => candidate.id === design.garmentId);
  const layout = garment ? layoutDesignDrawing({ ...lists, garment }, design.sizeId, design.document) : undefined;
  return { garment, layout };
}
