import { useMemo } from 'react';
import type { GarmentSummary, LetteringFontSummary, MotifSummary } from '@server/contracts/catalog.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import { measureLettering } from '../render/measure-lettering.ts';

/** The garment and catalogue the commands work against, with lettering measured as the canvas draws it. */
export function useDesignSetting(garment: GarmentSummary, motifs: readonly MotifSummary[], fonts: readonly LetteringFontSummary[]): DesignSetting {
  return useMemo(() => ({ garment, motifs, fonts, measureLettering }), [garment, motifs, fonts]);
}
