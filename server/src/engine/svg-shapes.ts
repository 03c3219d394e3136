/**
 * SVG basic shapes written as path data, following the equivalent paths in SVG 2 §10 ("Basic Shapes"), so one
 * path pipeline measures everything. Attribute values are user units.
 */

type Attributes = Readonly<Record<string, string>>;

/** Path data for a drawable element, or `undefined` when the element draws nothing (zero size, no points). */
export function shapeToPathData(tag: string, attributes: Attributes): string | undefined {
  switch (tag) {
    case 'path':
      return attributes.d?.trim() || undefined;
    case 'rect':
      return rectPath(attributes);
    case 'circle': {
      const r = length(attributes.r);
      return r > 0 ? ellipsePath(length(attributes.cx), length(attributes.cy), r, r) : undefined;
    }
    case 'ellipse': {
      const rx = length(attributes.rx);
      const ry = length(attributes.ry);
      return rx > 0 && ry > 0 ? ellipsePath(length(attributes.cx), length(attributes.cy), rx, ry) : undefined;
    }
    case 'line':
      return `M${length(attributes.x1)} ${length(attributes.y1)}L${length(attributes.x2)} ${length(attributes.y2)}`;
    case 'polyline':
    case 'polygon': {
      const points = pointList(attributes.points);
      if (points.length < 4) return undefined;
      return `M${points.join(' ')}${tag === 'polygon' ? 'Z' : ''}`;
    }
    default:
      return undefined;
  }
}

/** A number from an attribute; units are ignored (they are user units inside the drawing) and junk reads as 0. */
function length(value: string | undefined): number {
  const number = Number.parseFloat(value ?? '');
  return Number.isFinite(number) ? number : 0;
}

function rectPath(attributes: Attributes): string | undefined {
  const x = length(attributes.x);
  const y = length(attributes.y);
  const width = length(attributes.width);
  const height = length(attributes.height);
  if (!(width > 0 && height > 0)) return undefined;
  // SVG 2 §10.2: a missing rx or ry takes the other's value, and both are capped at half the side.
  const rxGiven = attributes.rx === undefined ? undefined : Math.max(0, length(attributes.rx));
  const ryGiven = attributes.ry === undefined ? undefined : Math.max(0, length(attributes.ry));
  const rx = Math.min(rxGiven ?? ryGiven ?? 0, width / 2);
  const ry = Math.min(ryGiven ?? rxGiven ?? 0, height / 2);
  if (rx === 0 || ry === 0) return `M${x} ${y}H${x + width}V${y + height}H${x}Z`;
  const arc = (dx: number, dy: number) => `A${rx} ${ry} 0 0 1 ${dx} ${dy}`;
  return (
    `M${x + rx} ${y}H${x + width - rx}${arc(x + width, y + ry)}V${y + height - ry}${arc(x + width - rx, y + height)}` +
    `H${x + rx}${arc(x, y + height - ry)}V${y + ry}${arc(x + rx, y)}Z`
  );
}

function ellipsePath(cx: number, cy: number, rx: number, ry: number): string {
  return `M${cx + rx} ${cy}A${rx} ${ry} 0 0 1 ${cx - rx} ${cy}A${rx} ${ry} 0 0 1 ${cx + rx} ${cy}Z`;
}

/** The numbers of a `points` attribute; an odd trailing number is dropped, as SVG renderers do. */
function pointList(value: string | undefined): number[] {
  const numbers = (value ?? '')
    .split(/[\s,]+/)
    .filter((token) => token !== '')
    .map(Number);
  const firstBad = numbers.findIndex((n) => !Number.isFinite(n));
  const usable = firstBad < 0 ? numbers : numbers.slice(0, firstBad);
  return usable.slice(0, usable.length - (usable.length % 2));
}
