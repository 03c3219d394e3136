/**
 * What the production sheet's PDF pages share: the paper, the unit conversion, the fonts and the ink colours.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import { MM_PER_INCH } from '../../engine/index.ts';
import type { PaperSize } from '../../contracts/production-sheet.ts';

/** PDF user space is 1/72 in (ISO 32000-1 §8.3.2.3), and 1 in = 25.4 mm (NIST SP 811), so 1 mm = 72/25.4 pt. */
export const PT_PER_MM = 72 / MM_PER_INCH;
export const pt = (mm: number) => mm * PT_PER_MM;

/** pdfkit's names for the two papers: Letter 612 × 792 pt, A4 595.28 × 841.89 pt (210 × 297 mm, ISO 216). */
const PDFKIT_SIZE: Readonly<Record<PaperSize, string>> = { letter: 'LETTER', a4: 'A4' };
export const PAPER_MM: Readonly<Record<PaperSize, { widthMm: number; heightMm: number }>> = {
  letter: { widthMm: 8.5 * MM_PER_INCH, heightMm: 11 * MM_PER_INCH },
  a4: { widthMm: 210, heightMm: 297 },
};

/** Kept clear at every edge: most office printers cannot print the outer 5 mm or so. */
export const MARGIN_MM = 10;

export const INK = '#2e241e';
export const SOFT_INK = '#7a6656';
export const ACCENT = '#b4513a';
export const GUIDE = '#4a6345';
export const PAPER_TINT = '#f8f1e4';

export const FONT = 'Poppins';
export const FONT_BOLD = 'Poppins-SemiBold';

const requireFromHere = createRequire(import.meta.url);
const fontFile = (weight: number) =>
  readFileSync(requireFromHere.resolve(`@fontsource/poppins/files/poppins-latin-${weight}-normal.woff`));
let fonts: { regular: Buffer; semiBold: Buffer } | undefined;

export type Pdf = InstanceType<typeof PDFDocument>;

/** A new document on this paper with the interface font embedded (a subset, as pdfkit does). */
export function createSheetDocument(paper: PaperSize, title: string): Pdf {
  fonts ??= { regular: fontFile(400), semiBold: fontFile(600) };
  const doc = new PDFDocument({
    size: PDFKIT_SIZE[paper],
    margin: 0,
    autoFirstPage: false,
    info: { Title: title, Creator: 'Hoopwright' },
  });
  doc.registerFont(FONT, fonts.regular);
  doc.registerFont(FONT_BOLD, fonts.semiBold);
  return doc;
}

/** Ends the document and gives its bytes. */
export function finishDocument(doc: Pdf): Promise<Buffer> {
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  return new Promise((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

export { formatLengthPlain } from './format-length-plain.ts';
