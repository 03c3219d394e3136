import type { ItemPlacement } from './designer-state.ts';
import { artworkOf, fontOf, motifOf, type DesignSetting, type ExtentMm } from './design-setting.ts';

/** An item's size before it is turned, mm; a motif or font no longer in the catalogue has no size. */
export function uprightExtent(setting: DesignSetting, placement: ItemPlacement): ExtentMm {
  if (placement.kind === 'motif') {
    const motif = motifOf(setting, placement.motif);
    const scale = placement.scalePct / 100;
    return motif ? { widthMm: motif.widthMm * scale, heightMm: motif.heightMm * scale } : { widthMm: 0, heightMm: 0 };
  }
  if (placement.kind === 'artwork') {
    const artwork = artworkOf(setting, placement.artworkUploadId);
    // Until its upload is known the artwork is taken as square, the shape that stays inside whatever its height.
    const aspect = artwork ? artwork.heightPx / artwork.widthPx : 1;
    return { widthMm: placement.widthMm, heightMm: placement.widthMm * aspect };
  }
  const font = fontOf(setting, placement.font);
  return font
    ? setting.measureLettering({
        text: placement.text,
        fontFamily: font.fontFamily,
        letterHeightMm: placement.letterHeightMm,
      })
    : { widthMm: 0, heightMm: 0 };
}

/** The box an item covers on the garment, mm, turned by its rotation. */
export function itemExtent(setting: DesignSetting, placement: ItemPlacement): ExtentMm {
  const { widthMm, heightMm } = uprightExtent(setting, placement);
  const radians = (placement.rotationDeg * Math.PI) / 180;
  const cos = Math.abs(Math.cos(radians));
  const sin = Math.abs(Math.sin(radians));
  return { widthMm: widthMm * cos + heightMm * sin, heightMm: widthMm * sin + heightMm * cos };
}
