import type { GarmentSummary, LetteringFontSummary, MotifSummary } from '@server/contracts/catalogue.ts';
import type { DesignDocument } from '@server/contracts/designs.ts';
import { changeSize } from '../commands/change-size.ts';
import { createDesignerState } from '../model/designer-state.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import { loadLetteringFonts } from './lettering-fonts.ts';
import { measureLettering } from './measure-lettering.ts';

interface ResizeRequest {
  garment: GarmentSummary;
  motifs: readonly MotifSummary[];
  fonts: readonly LetteringFontSummary[];
  /** The studio's hoops and the customer's uploads, when the design may hold artwork or large motifs. */
  hoops?: DesignSetting['hoops'];
  artworks?: DesignSetting['artworks'];
  sizeId: number;
  colourId: number;
  document: DesignDocument;
  toSizeId: number;
}

/**
 * The design carried to another size of its garment, exactly as the designer's size picker does it (items keep
 * their place in their zone, borders are refitted), for pages that change the size outside the designer. The
 * lettering fonts are loaded first, since lettering is measured to keep it inside its zone.
 */
export async function resizeDocument(request: ResizeRequest): Promise<DesignDocument> {
  await loadLetteringFonts([...new Set(request.fonts.map((font) => font.fontFamily))]);
  const setting: DesignSetting = {
    garment: request.garment,
    motifs: request.motifs,
    fonts: request.fonts,
    measureLettering,
    hoops: request.hoops ?? [],
    artworks: request.artworks ?? [],
  };
  return changeSize.perform(
    createDesignerState(request.sizeId, request.colourId, request.document),
    { sizeId: request.toSizeId },
    setting,
  ).document;
}
