import type { BorderPlacement } from '@server/contracts/designs.ts';
// Straight from its module: the engine's entry also registers colour spaces at load, which the designer does not need.
import { fitMotifBorder, type BorderFit } from '@server/engine/fit-border.ts';
import { hemCurve, layoutHemBorder, type BorderBand, type BorderRepeat } from '@server/engine/hem-border-layout.ts';
import { HEM_ZONE, motifOf, sizeOf, zoneOf, type DesignSetting } from './design-setting.ts';

export type { BorderBand, BorderRepeat };

export type BorderLayout =
  | { ok: true; fit: BorderFit; isClosed: boolean; runLengthMm: number; band: BorderBand; repeats: BorderRepeat[] }
  /** `bandHeightMm` is the motif at full size, so an unfitted border can still be kept inside the hem zone. */
  | { ok: false; reason: string; bandHeightMm: number };

/**
 * Lays a border out with the engine's fitBorder, the same fit the server prices: the front panel as an open run, or
 * the whole hem as a closed loop of which the front half shows. The run is centred on the hem zone, and its centre
 * line sits `hemOffsetMm` above the hem edge (the zone's bottom). On a hem drawn curved, each repeat follows the
 * curve: it sits `hemOffsetMm` above the edge beneath it, turned to the edge's slope there.
 */
export function layoutBorder(setting: DesignSetting, sizeId: number, border: BorderPlacement): BorderLayout {
  const size = sizeOf(setting, sizeId);
  const motif = motifOf(setting, border.motif);
  if (!motif) return { ok: false, reason: 'This border is no longer offered; choose another.', bandHeightMm: 0 };
  const zone = zoneOf(size, HEM_ZONE);
  const isClosed = border.run === 'circumference';
  const runLengthMm = isClosed ? size.hemCircumferenceMm : size.hemFrontMm;
  if (!zone || runLengthMm === null || size.hemFrontMm === null) {
    return { ok: false, reason: 'This garment has no hem to take a border.', bandHeightMm: motif.heightMm };
  }
  const fit = fitMotifBorder(motif, { runLengthMm, closed: isClosed, count: border.count });
  if (!fit.ok) return { ok: false, reason: fit.reason, bandHeightMm: motif.heightMm + hemCurve(zone).totalRiseMm };

  const { band, repeats } = layoutHemBorder({
    zone,
    fit,
    isClosed,
    runLengthMm,
    hemFrontMm: size.hemFrontMm,
    hemOffsetMm: border.hemOffsetMm,
    motifHeightMm: motif.heightMm,
  });
  return { ok: true, fit, isClosed, runLengthMm, band, repeats };
}

/** The border band's height for keeping it in the hem zone, mm, whether or not it fits. */
export const borderBandHeightMm = (layout: BorderLayout) => (layout.ok ? layout.band.heightMm : layout.bandHeightMm);

/** A border only to be laid out, to show how a motif would fit before the customer chooses it. */
export const trialBorder = (motif: string, run: BorderPlacement['run']): BorderPlacement => ({
  id: 'trial',
  kind: 'border',
  zone: 'hem',
  motif,
  run,
  hemOffsetMm: 0,
  threads: ['trial'],
});
