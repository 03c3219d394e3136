import type { BorderPlacement } from '@server/contracts/designs.ts';
// Straight from its module: the engine's entry also registers colour spaces at load, which the designer does not need.
import { fitMotifBorder, type BorderFit } from '@server/engine/fit-border.ts';
import type { PlacementZoneSummary } from '@server/contracts/catalog.ts';
import { HEM_ZONE, motifOf, sizeOf, zoneOf, type DesignSetting } from './design-setting.ts';

/** One repeat as it shows on the front of the mockup, mm; on a curved hem it sits on the curve, turned along it. */
export interface BorderRepeat {
  centerXMm: number;
  centerYMm: number;
  widthMm: number;
  heightMm: number;
  /** Clockwise, degrees: the hem's slope under the repeat, 0 on a straight hem. */
  rotationDeg: number;
}

/**
 * The strip of the hem the border runs along, mm on the mockup: repeats past its ends are round the back.
 * `centerYMm` is the centre line at the middle of the front; `heightMm` covers the repeats and the hem's curve.
 */
export interface BorderBand {
  leftMm: number;
  widthMm: number;
  centerYMm: number;
  heightMm: number;
}

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

  const frontMm = size.hemFrontMm;
  const middleXMm = zone.xMm + zone.widthMm / 2;
  const heightMm = motif.heightMm * fit.scale;
  const centerYMm = zone.yMm + zone.heightMm - border.hemOffsetMm;
  const curve = hemCurve(zone);
  // The loop is unrolled from the back seam, so the front panel is its middle stretch.
  const frontStartMm = isClosed ? (runLengthMm - frontMm) / 2 : 0;
  const repeats = fit.centersMm
    .map((runMm) => {
      const centerXMm = middleXMm - frontMm / 2 + (runMm - frontStartMm);
      return { centerXMm, centerYMm: centerYMm - curve.riseMm(centerXMm), widthMm: fit.repeatWidthMm, heightMm, rotationDeg: curve.slopeDeg(centerXMm) };
    })
    .filter((repeat) => Math.abs(repeat.centerXMm - middleXMm) < (frontMm + repeat.widthMm) / 2);
  const band = { leftMm: middleXMm - frontMm / 2, widthMm: frontMm, centerYMm, heightMm: heightMm + curve.totalRiseMm };
  return { ok: true, fit, isClosed, runLengthMm, band, repeats };
}

/**
 * The hem edge of a hem zone as a parabola across it: `riseMm(x)` above the middle, which is the zone's bottom, and
 * the slope there (clockwise degrees, as the canvas turns things; the ends rise, so the right half turns
 * anticlockwise). Repeats are spaced along the straight run, not the curve: for the bishop dress's 10 mm rise over
 * 380 mm the two differ by under 1 mm (about 0.2 %).
 */
function hemCurve(zone: PlacementZoneSummary) {
  const riseAtEndsMm = zone.hemCurveMm ?? 0;
  const middleXMm = zone.xMm + zone.widthMm / 2;
  const halfWidthMm = zone.widthMm / 2;
  const across = (xMm: number) => (xMm - middleXMm) / halfWidthMm;
  return {
    totalRiseMm: riseAtEndsMm,
    riseMm: (xMm: number) => riseAtEndsMm * across(xMm) ** 2,
    // The edge's y on screen is bottom − rise·u², so its slope dy/dx is −2·rise·u / halfWidth.
    slopeDeg: (xMm: number) => (riseAtEndsMm === 0 ? 0 : (Math.atan((-2 * riseAtEndsMm * across(xMm)) / halfWidthMm) * 180) / Math.PI),
  };
}

/** The border band's height for keeping it in the hem zone, mm, whether or not it fits. */
export const borderBandHeightMm = (layout: BorderLayout) => (layout.ok ? layout.band.heightMm : layout.bandHeightMm);

/** A border only to be laid out, to show how a motif would fit before the customer chooses it. */
export const trialBorder = (motif: string, run: BorderPlacement['run']): BorderPlacement => ({ id: 'trial', kind: 'border', zone: 'hem', motif, run, hemOffsetMm: 0, threads: ['trial'] });
