/**
 * Draws a proof: the customer's design on the garment in its fabric colour, to scale, as a PNG. The garment and
 * the embroidery are each written as SVG in the mockup's millimetres and rasterized by resvg (jimp reads no SVG);
 * jimp then lays them on a linen backdrop, the thread (with a soft shadow, as stitches sit on cloth) over the garment. Borders
 * are laid out by the engine's fitMotifBorder, the same fit the quote priced and the designer drew.
 */
import { Resvg } from '@resvg/resvg-js';
import { Jimp, JimpMime } from 'jimp';
import { JSDOM } from 'jsdom';
import { artworkImageMarkup, artworkPictureBox } from '../../engine/artwork-picture.ts';
import { fitMotifBorder } from '../../engine/fit-border.ts';
import { layoutHemBorder } from '../../engine/hem-border-layout.ts';
import { recolourThreadGroups } from '../../engine/recolour-threads.ts';
import {
  extentOf,
  flattenOutline,
  unionExtent,
  type Extent,
  type OutlineCommand,
} from '../../engine/outline-geometry.ts';
import type { BorderPlacement, DesignPlacement } from '../../contracts/designs.ts';
import type { LetteringFontLoader } from '../../integrations/lettering-fonts.ts';
import type { ProofScene, SceneMotif } from './proof-scene-repo.ts';

/** The garment's width in the picture, px: sharp on a phone and a laptop, small enough to mail. */
const PROOF_WIDTH_PX = 1000;
/** Space round the garment, px. */
const MARGIN_PX = 40;
const LINEN = 0xf4efe6ff;
/** Walnut ink, for lettering in a thread the palette no longer has. */
const UNKNOWN_THREAD_HEX = '#2e241e';
const SVG_NS = 'http://www.w3.org/2000/svg';

const { DOMParser, XMLSerializer } = new JSDOM('').window;
const round = (value: number) => Math.round(value * 1000) / 1000;

function parseSvg(svg: string): Element {
  const root = new DOMParser().parseFromString(svg, 'image/svg+xml').documentElement;
  if (root.nodeName !== 'svg') throw new Error('A catalogue drawing is not an SVG document');
  return root;
}

/** A drawing placed in a box of the mockup, mm, in its threads: its own viewBox is kept, so it scales into the box. */
function placedDrawing(
  svg: string,
  box: { x: number; y: number; width: number; height: number; color?: string },
  threadHexes: readonly (string | undefined)[] = [],
): string {
  const root = parseSvg(svg);
  recolourThreadGroups(root, threadHexes);
  for (const [name, value] of Object.entries(box))
    root.setAttribute(name, typeof value === 'number' ? String(round(value)) : value);
  return new XMLSerializer().serializeToString(root);
}

const rotated = (markup: string, deg: number, cx: number, cy: number) =>
  deg === 0 ? markup : `<g transform="rotate(${round(deg)} ${round(cx)} ${round(cy)})">${markup}</g>`;

function motifHeightFor(motif: SceneMotif, widthMm: number): number {
  return (motif.heightMm * widthMm) / motif.widthMm;
}

/** A border's repeats along the hem's front, clipped to the front panel: repeats past its ends are round the back. */
function borderMarkup(
  scene: ProofScene,
  border: BorderPlacement,
  hexes: (string | undefined)[],
  clipId: string,
): string {
  const motif = scene.motifs.get(border.motif);
  const zone = scene.zones.find((candidate) => candidate.code === 'hem');
  const isClosed = border.run === 'circumference';
  const runLengthMm = isClosed ? scene.hemCircumferenceMm : scene.hemFrontMm;
  if (!motif || !zone || runLengthMm === null || scene.hemFrontMm === null) return '';
  const fit = fitMotifBorder(motif, { runLengthMm, closed: isClosed, count: border.count });
  if (!fit.ok) return '';
  const { band, repeats } = layoutHemBorder({
    zone,
    fit,
    isClosed,
    runLengthMm,
    hemFrontMm: scene.hemFrontMm,
    hemOffsetMm: border.hemOffsetMm,
    motifHeightMm: motif.heightMm,
  });
  // Each repeat turned to the hem's slope beneath it, as the designer and the saved-design pictures draw it.
  const drawings = repeats.map((r) =>
    rotated(
      placedDrawing(
        motif.svg,
        { x: r.centerXMm - r.widthMm / 2, y: r.centerYMm - r.heightMm / 2, width: r.widthMm, height: r.heightMm },
        hexes,
      ),
      r.rotationDeg,
      r.centerXMm,
      r.centerYMm,
    ),
  );
  const clip = `<clipPath id="${clipId}"><rect x="${round(band.leftMm)}" y="${round(band.centerYMm - band.heightMm)}" width="${round(band.widthMm)}" height="${round(band.heightMm * 2)}"/></clipPath>`;
  return `<defs>${clip}</defs><g clip-path="url(#${clipId})">${drawings.join('')}</g>`;
}

const pathData = (commands: readonly OutlineCommand[]) =>
  commands
    .map((c) =>
      c.type === 'Z'
        ? 'Z'
        : c.type === 'C'
          ? `C${c.x1} ${c.y1} ${c.x2} ${c.y2} ${c.x} ${c.y}`
          : c.type === 'Q'
            ? `Q${c.x1} ${c.y1} ${c.x} ${c.y}`
            : `${c.type}${c.x} ${c.y}`,
    )
    .join('');

/** Lettering as filled glyph outlines, sized by its capital H and centred where the customer put it. */
function letteringMarkup(
  placement: Extract<DesignPlacement, { kind: 'lettering' }>,
  scene: ProofScene,
  fonts: LetteringFontLoader,
): string {
  const file = scene.fonts.get(placement.font);
  if (!file) return '';
  const font = fonts(file);
  const reference = extentOf(flattenOutline(font.getPaths('H', 0, 0, 1)[0]?.commands ?? [], 1e-4));
  if (!reference || reference.maxY <= reference.minY) return '';
  const fontSize = placement.letterHeightMm / (reference.maxY - reference.minY);
  const glyphs = font.getPaths(placement.text, 0, 0, fontSize);
  let extent: Extent | undefined;
  for (const glyph of glyphs) extent = unionExtent(extent, extentOf(flattenOutline(glyph.commands, 0.05)));
  if (!extent) return '';
  const dx = placement.centerXMm - (extent.minX + extent.maxX) / 2;
  const dy = placement.centerYMm - (extent.minY + extent.maxY) / 2;
  const fill = scene.threadHexes.get(placement.thread) ?? UNKNOWN_THREAD_HEX;
  const d = glyphs.map((glyph) => pathData(glyph.commands)).join('');
  return rotated(
    `<path transform="translate(${round(dx)} ${round(dy)})" fill="${fill}" d="${d}"/>`,
    placement.rotationDeg,
    placement.centerXMm,
    placement.centerYMm,
  );
}

function placementMarkup(
  placement: DesignPlacement,
  index: number,
  scene: ProofScene,
  fonts: LetteringFontLoader,
): string {
  const hexes = (codes: string[]) => codes.map((code) => scene.threadHexes.get(code));
  switch (placement.kind) {
    case 'border':
      return borderMarkup(scene, placement, hexes(placement.threads), `band-${index}`);
    case 'lettering':
      return letteringMarkup(placement, scene, fonts);
    case 'motif': {
      const motif = scene.motifs.get(placement.motif);
      if (!motif) return '';
      const widthMm = (motif.widthMm * placement.scalePct) / 100;
      const heightMm = motifHeightFor(motif, widthMm);
      const box = {
        x: placement.centerXMm - widthMm / 2,
        y: placement.centerYMm - heightMm / 2,
        width: widthMm,
        height: heightMm,
      };
      return rotated(
        placedDrawing(motif.svg, box, hexes(placement.threads)),
        placement.rotationDeg,
        placement.centerXMm,
        placement.centerYMm,
      );
    }
    case 'artwork': {
      // A drawing or a photo alike, by the one rule every picture of a design draws an upload with.
      const artwork = scene.artwork.get(placement.artworkUploadId);
      return artwork ? artworkImageMarkup(artworkPictureBox(placement, artwork), artwork.href) : '';
    }
  }
}

function rasterize(svg: string): Buffer {
  return new Resvg(svg, { fitTo: { mode: 'width', value: PROOF_WIDTH_PX }, font: { loadSystemFonts: false } })
    .render()
    .asPng();
}

/**
 * Thread has a little depth on cloth: a soft shadow a fraction of a millimetre long (in the mockup's mm) suggests
 * it. resvg draws it as an SVG filter, far faster than blurring the layer pixel by pixel.
 */
const THREAD_SHADOW =
  '<filter id="thread-shadow" x="-5%" y="-5%" width="110%" height="110%"><feDropShadow dx="0.15" dy="0.25" stdDeviation="0.3" flood-color="#2e241e" flood-opacity="0.35"/></filter>';

/** The proof picture of a scene, PNG, with its size in pixels. */
export async function renderProof(
  scene: ProofScene,
  fonts: LetteringFontLoader,
): Promise<{ png: Buffer; widthPx: number; heightPx: number }> {
  const { mockupWidthMm: widthMm, mockupHeightMm: heightMm } = scene;
  const frame = `xmlns="${SVG_NS}" viewBox="0 0 ${round(widthMm)} ${round(heightMm)}" width="${round(widthMm)}mm" height="${round(heightMm)}mm"`;
  // Each garment drawing paints its fabric with currentColor, so its root's colour dyes it.
  const garment = placedDrawing(scene.mockupSvg, {
    x: 0,
    y: 0,
    width: widthMm,
    height: heightMm,
    color: scene.fabricHex,
  });
  const embroidery = scene.document.placements
    .map((placement, index) => placementMarkup(placement, index, scene, fonts))
    .join('');

  const [garmentLayer, threadLayer] = await Promise.all([
    Jimp.read(rasterize(`<svg ${frame}>${garment}</svg>`)),
    Jimp.read(
      rasterize(`<svg ${frame}><defs>${THREAD_SHADOW}</defs><g filter="url(#thread-shadow)">${embroidery}</g></svg>`),
    ),
  ]);
  const picture = new Jimp({
    width: garmentLayer.width + 2 * MARGIN_PX,
    height: garmentLayer.height + 2 * MARGIN_PX,
    color: LINEN,
  });
  picture.composite(garmentLayer, MARGIN_PX, MARGIN_PX).composite(threadLayer, MARGIN_PX, MARGIN_PX);
  return { png: await picture.getBuffer(JimpMime.png), widthPx: picture.width, heightPx: picture.height };
}
