import { Circle, Ellipse, Line, Path, Polygon, Polyline, Rect, classRegistry } from 'fabric/es';

/**
 * 'fabric/es' is marked free of side effects, so a shape class the code never names is tree-shaken away together
 * with the registration that lets loadSVGFromString parse its SVG element: a motif of paths and ellipses then
 * loads as an empty group. Registering them here keeps every shape a catalogue drawing may use.
 */
export function registerSvgShapes(): void {
  for (const shape of [Path, Circle, Ellipse, Rect, Line, Polygon, Polyline]) classRegistry.setSVGClass(shape);
}
