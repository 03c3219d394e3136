/**
 * The 1:1 template pages: each template drawn at true size (1 mm = 72/25.4 pt), split into overlapping tiles
 * when it is larger than the printable area, with a 50 mm check square on every page.
 */
import svgpath from 'svgpath';
import type { PaperSize, PlacementTemplate } from '../../contracts/production-sheet.ts';
import {
  ACCENT,
  FONT,
  FONT_BOLD,
  GUIDE,
  INK,
  MARGIN_MM,
  PAPER_MM,
  SOFT_INK,
  formatLengthPlain,
  pt,
  PT_PER_MM,
  type Pdf,
} from './production-sheet-pdf-kit.ts';

/** The check square's side: long enough to show a scaling error of 1 % (0.5 mm) on an ordinary ruler. */
export const CHECK_SQUARE_MM = 50;
/** Tiles share this much of the template, so they can be laid over each other and taped. */
export const TILE_OVERLAP_MM = 10;
const HEADER_MM = 17;
const FOOTER_MM = CHECK_SQUARE_MM + 6;
const CROSSHAIR_ARM_MM = 12;
const LEGEND_ITEM = 'Red dashes: sewing field · red cross: hoop centre · black: stitched outline.';
const LEGEND_BORDER = `${LEGEND_ITEM.slice(0, -1)} · green dots: guide line (border centre) · red triangles: repeat joins.`;

/** One printed piece of a template: a window onto it, mm, and its place in the grid. */
export interface TemplateTile {
  xMm: number;
  yMm: number;
  widthMm: number;
  heightMm: number;
  row: number;
  column: number;
  rows: number;
  columns: number;
}

/** The printable window for templates on this paper, mm. */
export function templateArea(paper: PaperSize): { widthMm: number; heightMm: number } {
  const page = PAPER_MM[paper];
  return { widthMm: page.widthMm - 2 * MARGIN_MM, heightMm: page.heightMm - 2 * MARGIN_MM - HEADER_MM - FOOTER_MM };
}

/** Splits a template into tiles no larger than the area, overlapping by TILE_OVERLAP_MM; one tile when it fits. */
export function tileTemplate(
  template: Pick<PlacementTemplate, 'widthMm' | 'heightMm'>,
  area: { widthMm: number; heightMm: number },
): TemplateTile[] {
  const cut = (lengthMm: number, windowMm: number) => {
    const count = lengthMm <= windowMm ? 1 : Math.ceil((lengthMm - TILE_OVERLAP_MM) / (windowMm - TILE_OVERLAP_MM));
    return Array.from({ length: count }, (_, i) => {
      const startMm = i * (windowMm - TILE_OVERLAP_MM);
      return { startMm, lengthMm: Math.min(windowMm, lengthMm - startMm) };
    });
  };
  const columns = cut(template.widthMm, area.widthMm);
  const rows = cut(template.heightMm, area.heightMm);
  return rows.flatMap((r, row) =>
    columns.map((c, column) => ({
      xMm: c.startMm,
      yMm: r.startMm,
      widthMm: c.lengthMm,
      heightMm: r.lengthMm,
      row,
      column,
      rows: rows.length,
      columns: columns.length,
    })),
  );
}

const ORDINALS = ['first', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh', 'eighth', 'ninth', 'tenth'];

/** Where a piece sits along one side: its two ends by name, the one between them "middle", else counted. */
function sidePlace(index: number, count: number, ends: [string, string], from: string): string | null {
  if (count === 1) return null;
  if (index === 0) return ends[0];
  if (index === count - 1) return ends[1];
  if (count === 3) return 'middle';
  return `${ORDINALS[index] ?? `number ${index + 1}`} from the ${from}`;
}

/**
 * "Part 2 of 4, top right": a count and a place in words, never a grid code such as "A1" that reads like a paper
 * size. Parts are counted along each row, top row first.
 */
export function tileName(tile: Pick<TemplateTile, 'row' | 'column' | 'rows' | 'columns'>): string {
  const place = [
    sidePlace(tile.row, tile.rows, ['top', 'bottom'], 'top'),
    sidePlace(tile.column, tile.columns, ['left', 'right'], 'left'),
  ].filter((word) => word !== null);
  const part = `Part ${tile.row * tile.columns + tile.column + 1} of ${tile.rows * tile.columns}`;
  const where = place.join(' ') === 'middle middle' ? 'centre' : place.join(' ');
  return where ? `${part}, ${where}` : part;
}

/** Adds the pages of every template, tile by tile. */
export function addTemplatePages(
  doc: Pdf,
  paper: PaperSize,
  orderNumber: string,
  templates: readonly PlacementTemplate[],
): void {
  const area = templateArea(paper);
  for (const template of templates) {
    for (const tile of tileTemplate(template, area)) {
      doc.addPage();
      drawHeader(doc, orderNumber, template, tile);
      drawTile(doc, template, tile, { x: pt(MARGIN_MM), y: pt(MARGIN_MM + HEADER_MM) });
      drawCheckSquare(doc, paper);
    }
  }
}

function drawHeader(doc: Pdf, orderNumber: string, template: PlacementTemplate, tile: TemplateTile): void {
  const x = pt(MARGIN_MM);
  const width = doc.page.width - 2 * x;
  doc
    .fillColor(INK)
    .font(FONT_BOLD)
    .fontSize(11)
    .text(`${orderNumber} · Template · ${template.title}`, x, pt(MARGIN_MM), {
      width,
      lineBreak: false,
      ellipsis: true,
    });
  const isTiled = tile.rows * tile.columns > 1;
  const tiling = isTiled
    ? `${tileName(tile)} (${tile.rows} down × ${tile.columns} across): overlap the parts by ${TILE_OVERLAP_MM} mm so the crosses meet, then tape.`
    : 'Printed at true size on one page.';
  const legend = template.guideLineYMm === null ? LEGEND_ITEM : LEGEND_BORDER;
  doc.fillColor(SOFT_INK).font(FONT).fontSize(7.5);
  // One line each: a line too long for the page is cut short rather than running into the next.
  [template.subtitle, tiling, legend].forEach((line, i) => {
    doc.text(line, x, pt(MARGIN_MM + 5.5 + i * 3.4), { width, height: pt(3.4), ellipsis: true });
  });
}

/** Draws the part of the template under the tile's window, with the window's top-left at `origin` (pt). */
function drawTile(doc: Pdf, template: PlacementTemplate, tile: TemplateTile, origin: { x: number; y: number }): void {
  const X = (mm: number) => origin.x + pt(mm - tile.xMm);
  const Y = (mm: number) => origin.y + pt(mm - tile.yMm);
  doc.save();
  doc.rect(origin.x, origin.y, pt(tile.widthMm), pt(tile.heightMm)).clip();

  const { field, centre } = template;
  doc
    .lineWidth(0.75)
    .dash(6, { space: 3 })
    .rect(X(field.xMm), Y(field.yMm), pt(field.widthMm), pt(field.heightMm))
    .stroke(ACCENT)
    .undash();
  doc
    .fillColor(ACCENT)
    .font(FONT)
    .fontSize(7)
    .text('sewing field', X(field.xMm) + 3, Y(field.yMm) + 3, { lineBreak: false });

  if (template.pictureDataUrl) {
    // A photo or scan has no outline: the picture itself, at 1:1 in its box (pdfkit reads the PNG data URL).
    const { artwork } = template;
    doc.image(template.pictureDataUrl, X(artwork.xMm), Y(artwork.yMm), {
      width: pt(artwork.widthMm),
      height: pt(artwork.heightMm),
    });
  }
  for (const outline of template.outlines) {
    doc
      .path(
        svgpath(outline.d).translate(-tile.xMm, -tile.yMm).scale(PT_PER_MM).translate(origin.x, origin.y).toString(),
      )
      .lineWidth(0.5)
      .stroke(INK);
  }

  if (template.guideLineYMm !== null) {
    doc
      .lineWidth(0.5)
      .dash(2, { space: 2 })
      .moveTo(X(field.xMm), Y(template.guideLineYMm))
      .lineTo(X(field.xMm + field.widthMm), Y(template.guideLineYMm))
      .stroke(GUIDE)
      .undash();
  }
  if (template.hemLineYMm !== null) {
    doc
      .lineWidth(1)
      .moveTo(X(field.xMm), Y(template.hemLineYMm))
      .lineTo(X(field.xMm + field.widthMm), Y(template.hemLineYMm))
      .stroke(INK);
    doc
      .fillColor(INK)
      .fontSize(7)
      .text('hem edge', X(field.xMm) + 3, Y(template.hemLineYMm) + 2, { lineBreak: false });
  }
  const { artwork } = template;
  for (const xMm of template.joinMarksXMm) {
    // A filled triangle above and below the motif where a repeat meets the next: line the next hooping up here.
    for (const [tipMm, sign] of [
      [artwork.yMm - 1, -1],
      [artwork.yMm + artwork.heightMm + 1, 1],
    ] as const) {
      doc
        .polygon([X(xMm), Y(tipMm)], [X(xMm) - 3, Y(tipMm) + sign * 6], [X(xMm) + 3, Y(tipMm) + sign * 6])
        .fill(ACCENT);
    }
  }

  doc
    .lineWidth(0.75)
    .moveTo(X(centre.xMm - CROSSHAIR_ARM_MM), Y(centre.yMm))
    .lineTo(X(centre.xMm + CROSSHAIR_ARM_MM), Y(centre.yMm))
    .stroke(ACCENT);
  doc
    .moveTo(X(centre.xMm), Y(centre.yMm - CROSSHAIR_ARM_MM))
    .lineTo(X(centre.xMm), Y(centre.yMm + CROSSHAIR_ARM_MM))
    .stroke(ACCENT);
  doc.circle(X(centre.xMm), Y(centre.yMm), pt(2)).stroke(ACCENT);

  drawOverlapMarks(doc, tile, X, Y);
  doc.restore();
}

/** Dashed edges of the shared strips and registration crosses inside them, at the same template spot on both tiles. */
function drawOverlapMarks(doc: Pdf, tile: TemplateTile, X: (mm: number) => number, Y: (mm: number) => number): void {
  const right = tile.xMm + tile.widthMm;
  const bottom = tile.yMm + tile.heightMm;
  const cross = (xMm: number, yMm: number) => {
    doc
      .lineWidth(0.5)
      .moveTo(X(xMm) - 6, Y(yMm))
      .lineTo(X(xMm) + 6, Y(yMm))
      .moveTo(X(xMm), Y(yMm) - 6)
      .lineTo(X(xMm), Y(yMm) + 6)
      .stroke(INK);
  };
  const stripsX = [
    tile.column > 0 ? tile.xMm : null,
    tile.column < tile.columns - 1 ? right - TILE_OVERLAP_MM : null,
  ].filter((x) => x !== null);
  for (const stripX of stripsX) {
    doc
      .lineWidth(0.5)
      .dash(3, { space: 3 })
      .moveTo(X(stripX + TILE_OVERLAP_MM / 2), Y(tile.yMm))
      .lineTo(X(stripX + TILE_OVERLAP_MM / 2), Y(bottom))
      .stroke(SOFT_INK)
      .undash();
    for (const share of [0.25, 0.75]) cross(stripX + TILE_OVERLAP_MM / 2, tile.yMm + tile.heightMm * share);
  }
  const stripsY = [tile.row > 0 ? tile.yMm : null, tile.row < tile.rows - 1 ? bottom - TILE_OVERLAP_MM : null].filter(
    (y) => y !== null,
  );
  for (const stripY of stripsY) {
    doc
      .lineWidth(0.5)
      .dash(3, { space: 3 })
      .moveTo(X(tile.xMm), Y(stripY + TILE_OVERLAP_MM / 2))
      .lineTo(X(right), Y(stripY + TILE_OVERLAP_MM / 2))
      .stroke(SOFT_INK)
      .undash();
    for (const share of [0.25, 0.75]) cross(tile.xMm + tile.widthMm * share, stripY + TILE_OVERLAP_MM / 2);
  }
}

function drawCheckSquare(doc: Pdf, paper: PaperSize): void {
  const page = PAPER_MM[paper];
  const xMm = MARGIN_MM;
  const yMm = page.heightMm - MARGIN_MM - CHECK_SQUARE_MM;
  doc.lineWidth(0.5).rect(pt(xMm), pt(yMm), pt(CHECK_SQUARE_MM), pt(CHECK_SQUARE_MM)).stroke(INK);
  const textX = pt(xMm + CHECK_SQUARE_MM + 5);
  const width = doc.page.width - textX - pt(MARGIN_MM);
  doc
    .fillColor(INK)
    .font(FONT_BOLD)
    .fontSize(9)
    .text(`Check square: ${formatLengthPlain(CHECK_SQUARE_MM, 0)} each side`, textX, pt(yMm), { width });
  doc
    .font(FONT)
    .fontSize(8)
    .fillColor(SOFT_INK)
    .text(
      'Measure it with a ruler before cutting. If it is not exactly 50 mm, print again at 100 % (actual size) with any "fit to page" setting turned off.',
      textX,
      pt(yMm + 6),
      { width },
    );
}
