/**
 * Reads a PDF's text back with pdfjs-dist (independent of the pdfkit that wrote it): every page's text items
 * joined by spaces, white space folded, so a test can look for a sentence whatever the line breaks.
 */
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

export async function readPdfText(bytes: Buffer): Promise<string> {
  const pdf = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false }).promise;
  const pages: string[] = [];
  for (let number = 1; number <= pdf.numPages; number += 1) {
    const content = await (await pdf.getPage(number)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' '));
  }
  await pdf.destroy();
  return pages.join(' ').replace(/\s+/g, ' ');
}
