import { useMemo } from 'react';
import type { GarmentSummary, LetteringFontSummary, MotifSummary } from '@server/contracts/catalogue.ts';
import { useArtworks } from '../api/get-artworks.ts';
import { useHoops } from '../api/get-hoops.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import { measureLettering } from '../render/measure-lettering.ts';

/**
 * The garment and catalogue the commands work against, with lettering measured as the canvas draws it, the hoops
 * and the customer's own uploads. Hoops and uploads arrive on their own; until then nothing is limited by them.
 */
export function useDesignSetting(
  garment: GarmentSummary,
  motifs: readonly MotifSummary[],
  fonts: readonly LetteringFontSummary[],
): DesignSetting {
  const hoops = useHoops().data;
  const artworks = useArtworks().data;
  return useMemo(
    () => ({ garment, motifs, fonts, measureLettering, hoops: hoops ?? [], artworks: artworks ?? [] }),
    [garment, motifs, fonts, hoops, artworks],
  );
}
