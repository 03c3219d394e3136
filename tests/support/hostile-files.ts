/**
 * Files an attacker or a careless client sends, built byte by byte in the tests so nothing hostile is shipped:
 * pictures whose header declares more pixels than the file holds, SVGs with oversized sizes, huge paths and
 * external references.
 */
import { crc32 } from 'node:zlib';

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typed = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typed));
  return Buffer.concat([length, typed, crc]);
}

/**
 * A PNG of a few dozen bytes whose IHDR declares `width` × `height` px (8-bit RGBA) and whose image data is one
 * empty deflate block: a decoder that trusts the header allocates width × height × 4 bytes before it finds out.
 * Layout per the PNG specification (W3C, 2nd edition, §5.2–5.6, §11.2.2).
 */
export function pngDeclaring(width: number, height: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 6, 0, 0, 0], 8);
  return Buffer.concat([
    Buffer.from('89504e470d0a1a0a', 'hex'),
    pngChunk('IHDR', header),
    pngChunk('IDAT', Buffer.from('78da030000000001', 'hex')),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A JPEG with only a baseline frame header (SOF0) declaring `width` × `height`: ITU-T T.81 §B.2.2. */
export function jpegDeclaring(width: number, height: number): Buffer {
  const frame = Buffer.from([0xff, 0xc0, 0x00, 0x11, 0x08, 0, 0, 0, 0, 0x03, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1]);
  frame.writeUInt16BE(height, 5);
  frame.writeUInt16BE(width, 7);
  const app0 = Buffer.from('ffe000104a46494600010100000100010000', 'hex');
  return Buffer.concat([Buffer.from([0xff, 0xd8]), app0, frame, Buffer.from([0xff, 0xd9])]);
}

export const svgDocument = (body: string, root = 'width="100" height="100" viewBox="0 0 100 100"') =>
  `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" ${root}>${body}</svg>`;

/** One path of `segments` line segments zig-zagging across a 100-unit canvas. */
export function svgWithPathSegments(segments: number): string {
  const steps = Array.from({ length: segments }, (_, i) => `L${(i * 7) % 100} ${(i * 13) % 100}`).join('');
  return svgDocument(`<path d="M0 0${steps}" stroke="#2e241e" stroke-width="0.5" fill="none"/>`);
}

/** The host every hostile reference points at; nothing listens there, and a clean copy must not name it. */
export const OUTSIDE_HOST = 'outside.invalid';

/**
 * Each way an SVG can make its viewer fetch something from elsewhere, with a same-document reference beside it
 * that must survive (a gradient fill by `#id`), so a test can tell stripping from wiping.
 */
export const externalReferenceCases: ReadonlyArray<{ name: string; body: string }> = [
  {
    name: 'a <style> sheet with @import url(…)',
    body: `<style>@import url(http://${OUTSIDE_HOST}/sheet.css); .petal { fill: #f4a6c0 }</style>`,
  },
  {
    name: 'a <style> sheet with a bare @import "…"',
    body: `<style>@import "http://${OUTSIDE_HOST}/sheet.css";</style>`,
  },
  {
    name: 'a <style> rule with fill: url(http://…)',
    body: `<style>.petal { fill: url(http://${OUTSIDE_HOST}/paint.svg#p) }</style>`,
  },
  {
    name: 'a fill="url(http://…)" attribute',
    body: `<rect width="10" height="10" fill="url(http://${OUTSIDE_HOST}/p.svg#p)"/>`,
  },
  {
    name: 'a protocol-relative mask="url(//…)"',
    body: `<rect width="10" height="10" mask="url(//${OUTSIDE_HOST}/m.svg#m)"/>`,
  },
  {
    name: 'a style="…url(…)" attribute',
    body: `<rect width="10" height="10" style="fill: url('https://${OUTSIDE_HOST}/p.svg#p'); stroke: #000"/>`,
  },
  {
    name: 'a style="…" using image-set(…)',
    body: `<rect width="10" height="10" style="fill: #000; background: image-set('https://${OUTSIDE_HOST}/x.png' 1x)"/>`,
  },
  { name: 'an <a href="http://…"> link', body: `<a href="http://${OUTSIDE_HOST}/"><circle cx="5" cy="5" r="4"/></a>` },
  {
    name: 'an <a xlink:href="http://…"> link',
    body: `<a xlink:href="http://${OUTSIDE_HOST}/"><circle cx="5" cy="5" r="4"/></a>`,
  },
  { name: 'a <use xlink:href="http://…">', body: `<use xlink:href="http://${OUTSIDE_HOST}/shapes.svg#star"/>` },
  { name: 'a <use href="http://…">', body: `<use href="https://${OUTSIDE_HOST}/shapes.svg#star"/>` },
  {
    name: 'a gradient inheriting from another file',
    body: `<defs><linearGradient id="far" href="https://${OUTSIDE_HOST}/g.svg#g"/></defs>`,
  },
  {
    name: 'a filter with <feImage href="http://…">',
    body: `<defs><filter id="f"><feImage href="http://${OUTSIDE_HOST}/i.png"/></filter></defs>`,
  },
  { name: 'an <image href="http://…">', body: `<image href="http://${OUTSIDE_HOST}/x.png" width="10" height="10"/>` },
  {
    name: 'a <style> url(…) hidden behind a CSS escape',
    body: `<style>.petal { fill: u\\72l(http://${OUTSIDE_HOST}/p.svg#p) }</style>`,
  },
];

/** A same-document gradient and reuse that every clean copy keeps. */
export const sameDocumentReferences =
  '<defs><linearGradient id="sun"><stop offset="0" stop-color="#fc0"/></linearGradient><circle id="dot" r="2"/></defs><rect width="50" height="50" fill="url(#sun)"/><use href="#dot"/>';
