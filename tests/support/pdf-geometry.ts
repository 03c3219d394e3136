/**
 * Reads a PDF back with pdfjs-dist (a general-purpose PDF library, independent of the pdfkit that wrote it): page
 * sizes and the bounding boxes of the paths drawn on each page, in PDF units.
 */
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';

export interface PathBox {
  widthPt: number;
  heightPt: number;
}

export interface PdfPage {
  /** [x0, y0, x1, y1] of the media box, PDF units. */
  view: number[];
  /** Every constructed path's bounding box (pdfjs reports it beside the path data). */
  paths: PathBox[];
}

export async function readPdfPages(bytes: Buffer): Promise<PdfPage[]> {
  const pdf = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false }).promise;
  const pages: PdfPage[] = [];
  for (let number = 1; number <= pdf.numPages; number += 1) {
    const page = await pdf.getPage(number);
    const operators = await page.getOperatorList();
    const paths: PathBox[] = [];
    operators.fnArray.forEach((fn, i) => {
      if (fn !== OPS.constructPath) return;
      // pdfjs 5: [paint operator, [path data], [minX, minY, maxX, maxY]].
      const minMax = operators.argsArray[i][2] as ArrayLike<number>;
      paths.push({ widthPt: minMax[2] - minMax[0], heightPt: minMax[3] - minMax[1] });
    });
    pages.push({ view: [...page.view], paths });
  }
  await pdf.destroy();
  return pages;
}
