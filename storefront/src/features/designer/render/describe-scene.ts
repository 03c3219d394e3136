import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import { layoutBorder, type BorderBand, type BorderRepeat } from '../model/border-layout.ts';
import { artworkOf, fontOf, motifOf, type DesignSetting } from '../model/design-setting.ts';
import type { DesignerState } from '../model/designer-state.ts';
import { fontSizeFor } from './lettering-fonts.ts';
import { recolourMotif } from './recolour-motif.ts';

/** Walnut ink, for lettering in a thread the palette no longer has. */
const UNKNOWN_THREAD_HEX = '#2e241e';

interface Positioned {
  id: string;
  /** Everything that shapes the drawing; when it changes the object is rebuilt, otherwise only moved. */
  key: string;
  centerXMm: number;
  centerYMm: number;
  rotationDeg: number;
}

/** What the canvas draws for one placement, in mm on the mockup. */
export type Drawable =
  | (Positioned & { kind: 'lettering'; text: string; fontFamily: string; fontSizeMm: number; fill: string })
  | (Positioned & { kind: 'motif'; svg: string; widthMm: number })
  /** The customer's own upload, drawn from its clean copy on the server. */
  | (Positioned & { kind: 'artwork'; src: string; widthMm: number })
  /** `centerXMm` of a border is unused: the repeats carry their own positions along the hem. */
  | (Positioned & { kind: 'border'; svg: string; repeats: BorderRepeat[]; band: BorderBand });

/**
 * The document turned into drawables, one per placement the canvas can show: lettering in its font and thread,
 * motifs in their threads, a border's repeats as the engine lays them out (a border that does not fit is not
 * drawn; the panel says why), and the customer's artwork once its upload is known.
 */
export function describeScene(
  state: Pick<DesignerState, 'document' | 'sizeId'>,
  setting: DesignSetting,
  threads: readonly ThreadColourSummary[],
): Drawable[] {
  const hexOf = (code: string) => threads.find((thread) => thread.code === code)?.hex;
  return state.document.placements.flatMap((placement): Drawable[] => {
    if (placement.kind === 'lettering') {
      const font = fontOf(setting, placement.font);
      if (!font) return [];
      const fontSizeMm = fontSizeFor(font.fontFamily, placement.letterHeightMm);
      const fill = hexOf(placement.thread) ?? UNKNOWN_THREAD_HEX;
      const { id, text, centerXMm, centerYMm, rotationDeg } = placement;
      return [
        {
          kind: 'lettering',
          id,
          key: JSON.stringify([text, font.fontFamily, fontSizeMm, fill]),
          text,
          fontFamily: font.fontFamily,
          fontSizeMm,
          fill,
          centerXMm,
          centerYMm,
          rotationDeg,
        },
      ];
    }
    if (placement.kind === 'motif') {
      const motif = motifOf(setting, placement.motif);
      if (!motif) return [];
      const svg = recolourMotif(motif.svg, placement.threads.map(hexOf));
      const widthMm = (motif.widthMm * placement.scalePct) / 100;
      const { id, centerXMm, centerYMm, rotationDeg } = placement;
      return [
        { kind: 'motif', id, key: JSON.stringify([svg, widthMm]), svg, widthMm, centerXMm, centerYMm, rotationDeg },
      ];
    }
    if (placement.kind === 'border') {
      const motif = motifOf(setting, placement.motif);
      const layout = layoutBorder(setting, state.sizeId, placement);
      if (!motif || !layout.ok) return [];
      const svg = recolourMotif(motif.svg, placement.threads.map(hexOf));
      const shape = layout.repeats.map((repeat) => [repeat.centerXMm, repeat.widthMm, repeat.heightMm]);
      const { band } = layout;
      const key = JSON.stringify([svg, shape, band.leftMm, band.widthMm]);
      return [
        {
          kind: 'border',
          id: placement.id,
          key,
          svg,
          repeats: layout.repeats,
          band,
          centerXMm: band.leftMm + band.widthMm / 2,
          centerYMm: band.centerYMm,
          rotationDeg: 0,
        },
      ];
    }
    if (placement.kind === 'artwork') {
      const artwork = artworkOf(setting, placement.artworkUploadId);
      if (!artwork) return [];
      const { id, centerXMm, centerYMm, rotationDeg, widthMm } = placement;
      return [
        {
          kind: 'artwork',
          id,
          key: JSON.stringify([artwork.imageUrl, widthMm]),
          src: artwork.imageUrl,
          widthMm,
          centerXMm,
          centerYMm,
          rotationDeg,
        },
      ];
    }
    return [];
  });
}
