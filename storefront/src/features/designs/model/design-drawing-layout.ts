import type {
  GarmentSummary,
  LetteringFontSummary,
  MotifSummary,
  ThreadColourSummary,
} from '@server/contracts/catalogue.ts';
import type { BorderPlacement, DesignDocument, DesignPlacement } from '@server/contracts/designs.ts';
import type { DesignUploadPicture } from '@server/contracts/artwork.ts';
// Straight from their modules: the engine's entry also registers colour spaces at load, which a drawing does not need.
import { fitMotifBorder } from '@server/engine/fit-border.ts';
import { layoutHemBorder, type BorderBand, type BorderRepeat } from '@server/engine/hem-border-layout.ts';

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
      /** The front panel's strip of the hem: repeats are clipped to it, as those past its ends are round the back. */
      band: BorderBand;
      /** Centred where the engine lays them, turned along a curved hem. */
      repeats: BorderRepeat[];
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
  /** The customer's upload; without its picture (no longer theirs to show) a dashed outline of its place. */
  | ({ kind: 'artwork'; id: string; label: string; widthMm: number; upload: DesignUploadPicture | undefined } & Turned)
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

/**
 * Lays a border's repeats on the front of the mockup with the engine's fit (the one the server prices) and the
 * engine's hem layout (the one the designer and the proof draw), curve included: the hem loop is unrolled from the
 * back seam, so the front panel is its middle stretch, and repeats past the panel's ends are round the back.
 */
function drawBorder(
  size: GarmentSummary['sizes'][number],
  border: BorderPlacement,
  motif: MotifSummary,
  hexes: (string | undefined)[],
): DrawnPlacement {
  const zone = size.zones.find((candidate) => candidate.code === HEM_ZONE);
  const isClosed = border.run === 'circumference';
  const runLengthMm = isClosed ? size.hemCircumferenceMm : size.hemFrontMm;
  const hemFrontMm = size.hemFrontMm;
  const fit =
    zone && runLengthMm !== null && hemFrontMm !== null
      ? fitMotifBorder(motif, { runLengthMm, closed: isClosed, count: border.count })
      : undefined;
  if (!zone || !fit?.ok || runLengthMm === null || hemFrontMm === null) {
    return { kind: 'unavailable', id: border.id, label: `Border: ${motif.name} (it no longer fits this size)` };
  }
  const { band, repeats } = layoutHemBorder({
    zone,
    fit,
    isClosed,
    runLengthMm,
    hemFrontMm,
    hemOffsetMm: border.hemOffsetMm,
    motifHeightMm: motif.heightMm,
  });
  const where = isClosed ? 'all the way round' : 'along the front';
  return {
    kind: 'border',
    id: border.id,
    label: `Border: ${motif.name}, ${fit.count} repeats ${where}`,
    svg: motif.svg,
    threadHexes: hexes,
    band,
    repeats,
  };
}

function drawPlacement(
  catalogue: DrawingCatalogue,
  size: GarmentSummary['sizes'][number],
  placement: DesignPlacement,
  uploads: readonly DesignUploadPicture[],
): DrawnPlacement {
  const hexOf = (code: string) => catalogue.threads.find((thread) => thread.code === code)?.hex;
  if (placement.kind === 'artwork') {
    const upload = uploads.find((candidate) => candidate.uploadId === placement.artworkUploadId);
    return {
      kind: 'artwork',
      id: placement.id,
      label: upload ? 'Your uploaded picture' : 'An uploaded picture (drawn as a dashed outline)',
      upload,
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
 * chosen size and every placement where the document puts it (the customer's uploads from `uploads`), in the
 * mockup's millimetres. Undefined when the
 * garment no longer has the design's size.
 */
export function layoutDesignDrawing(
  catalogue: DrawingCatalogue,
  sizeId: number,
  document: DesignDocument,
  uploads: readonly DesignUploadPicture[] = [],
): DesignDrawingLayout | undefined {
  const size = catalogue.garment.sizes.find((candidate) => candidate.id === sizeId);
  if (!size) return undefined;
  return {
    widthMm: catalogue.garment.mockupWidthMm * size.mockupScale,
    heightMm: catalogue.garment.mockupHeightMm * size.mockupScale,
    placements: document.placements.map((placement) => drawPlacement(catalogue, size, placement, uploads)),
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
  design: { garmentId: number; sizeId: number; document: DesignDocument; uploads?: readonly DesignUploadPicture[] },
) {
  const garment = lists.garments.find((candidate) => candidate.id === design.garmentId);
  const layout = garment
    ? layoutDesignDrawing({ ...lists, garment }, design.sizeId, design.document, design.uploads)
    : undefined;
  return { garment, layout };
}
