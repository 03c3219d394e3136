import type { BorderFit } from './fit-border.ts';

/** The hem zone of a garment size, mm on its mockup. */
export interface HemZone {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
  /** How far the hem edge rises at the zone's ends above its middle, mm (a curved hem such as a bishop dress's). */
  hemCurveMm?: number;
}

/** The strip of the hem the border runs along, mm on the mockup: repeats past its ends are round the back. */
export interface BorderBand {
  leftMm: number;
  widthMm: number;
  centerYMm: number;
  heightMm: number;
}

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
 * Where a fitted border's repeats show on the front of the mockup, mm: the run is centred on the hem zone and its
 * centre line sits `hemOffsetMm` above the hem edge (the zone's bottom). A closed loop is unrolled from the back
 * seam, so the front panel is its middle stretch, and only the repeats that reach the front are returned. On a hem
 * drawn curved, each repeat follows the curve: it sits `hemOffsetMm` above the edge beneath it, turned to the edge's
 * slope there. The designer draws these repeats and the studio's proof renders them, so both show the one layout.
 */
export function layoutHemBorder(input: {
  zone: HemZone;
  fit: BorderFit;
  isClosed: boolean;
  runLengthMm: number;
  hemFrontMm: number;
  hemOffsetMm: number;
  motifHeightMm: number;
}): { band: BorderBand; repeats: BorderRepeat[] } {
  const { zone, fit, isClosed, runLengthMm, hemFrontMm: frontMm } = input;
  const middleXMm = zone.xMm + zone.widthMm / 2;
  const heightMm = input.motifHeightMm * fit.scale;
  const centerYMm = zone.yMm + zone.heightMm - input.hemOffsetMm;
  const curve = hemCurve(zone);
  const frontStartMm = isClosed ? (runLengthMm - frontMm) / 2 : 0;
  const repeats = fit.centersMm
    .map((runMm) => {
      const centerXMm = middleXMm - frontMm / 2 + (runMm - frontStartMm);
      return {
        centerXMm,
        centerYMm: centerYMm - curve.riseMm(centerXMm),
        widthMm: fit.repeatWidthMm,
        heightMm,
        rotationDeg: curve.slopeDeg(centerXMm),
      };
    })
    .filter((repeat) => Math.abs(repeat.centerXMm - middleXMm) < (frontMm + repeat.widthMm) / 2);
  return {
    band: { leftMm: middleXMm - frontMm / 2, widthMm: frontMm, centerYMm, heightMm: heightMm + curve.totalRiseMm },
    repeats,
  };
}

/**
 * The hem edge of a hem zone as a parabola across it: `riseMm(x)` above the middle, which is the zone's bottom, and
 * the slope there (clockwise degrees, as the canvas turns things; the ends rise, so the right half turns
 * anticlockwise). Repeats are spaced along the straight run, not the curve: for the bishop dress's 10 mm rise over
 * 380 mm the two differ by under 1 mm (about 0.2 %).
 */
export function hemCurve(zone: HemZone) {
  const riseAtEndsMm = zone.hemCurveMm ?? 0;
  const middleXMm = zone.xMm + zone.widthMm / 2;
  const halfWidthMm = zone.widthMm / 2;
  const across = (xMm: number) => (xMm - middleXMm) / halfWidthMm;
  return {
    totalRiseMm: riseAtEndsMm,
    riseMm: (xMm: number) => riseAtEndsMm * across(xMm) ** 2,
    // The edge's y on screen is bottom − rise·u², so its slope dy/dx is −2·rise·u / halfWidth.
    slopeDeg: (xMm: number) =>
      riseAtEndsMm === 0 ? 0 : (Math.atan((-2 * riseAtEndsMm * across(xMm)) / halfWidthMm) * 180) / Math.PI,
  };
}
