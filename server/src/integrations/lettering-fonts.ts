/**
 * Reads the lettering fonts the app ships through @fontsource packages and turns them into the engine's glyph
 * outline source. The engine never touches files, so this is the one place that does.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import * as fontkit from 'fontkit';
import opentype from 'opentype.js';
import type { GlyphOutlineSource, OutlineCommand } from '../engine/index.ts';

/** Where a font's file is: an @fontsource package and a .woff in its `files/` folder (lettering_fonts columns). */
export interface LetteringFontFile {
  fontsourcePackage: string;
  fileName: string;
}

/** Gives the outlines of a shipped font; throws when the file is missing, which is a broken install, not bad input. */
export type LetteringFontLoader = (file: LetteringFontFile) => GlyphOutlineSource;

const requireFromHere = createRequire(import.meta.url);

/** The names come from the database; keeping them to this shape means a row can never point outside the package. */
const PACKAGE_NAME = /^@fontsource\/[a-z0-9-]+$/;
const WOFF_FILE_NAME = /^[a-z0-9-]+\.woff$/;

/** A typesetter's test word with common letter pairs, enough to reach the lookups a layout engine applies. */
const LAYOUT_PROBE_TEXT = 'Hamburgefonstiv';

/** The bytes of a shipped font file. Only WOFF: opentype.js 2.0 throws on WOFF2 without a decompressor. */
export function readFontFile(file: LetteringFontFile): Buffer {
  if (!PACKAGE_NAME.test(file.fontsourcePackage) || !WOFF_FILE_NAME.test(file.fileName)) {
    throw new Error(`Not a shipped @fontsource .woff file: ${file.fontsourcePackage}/${file.fileName}`);
  }
  return readFileSync(requireFromHere.resolve(`${file.fontsourcePackage}/files/${file.fileName}`));
}

/** A font parsed by opentype.js, whose `Font` is a glyph outline source as it is (default import only in Node). */
export function parseOpentypeFont(bytes: Buffer): opentype.Font {
  return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
}

/** A font laid out by fontkit, adapted to the engine's outline interface (y down, in units of fontSize). */
export function fontkitOutlines(bytes: Buffer): GlyphOutlineSource {
  const font = fontkit.create(bytes);
  if (!('layout' in font)) throw new Error('The font file is a collection, not one font');
  return {
    getPaths(text, x, y, fontSize) {
      const scale = fontSize / font.unitsPerEm;
      const run = font.layout(text);
      let penX = x;
      return run.glyphs.map((glyph, i) => {
        const position = run.positions[i];
        const originX = penX + position.xOffset * scale;
        const originY = y - position.yOffset * scale;
        penX += position.xAdvance * scale;
        // Font units have y up; the engine, like SVG and opentype.js paths, has y down.
        const at = (args: number[], k: number) => ({ x: originX + args[k] * scale, y: originY - args[k + 1] * scale });
        const commands = glyph.path.commands.map(({ command, args }): OutlineCommand => {
          if (command === 'moveTo') return { type: 'M', ...at(args, 0) };
          if (command === 'lineTo') return { type: 'L', ...at(args, 0) };
          if (command === 'quadraticCurveTo') {
            const control = at(args, 0);
            return { type: 'Q', x1: control.x, y1: control.y, ...at(args, 2) };
          }
          if (command === 'bezierCurveTo') {
            const [first, second] = [at(args, 0), at(args, 2)];
            return { type: 'C', x1: first.x, y1: first.y, x2: second.x, y2: second.y, ...at(args, 4) };
          }
          return { type: 'Z' };
        });
        return { commands };
      });
    },
  };
}

/**
 * A shipped font as outlines: opentype.js where it can lay the font out, else fontkit. opentype.js 2.0 throws on
 * substitution lookups it does not implement (Great Vibes: "lookupType: 6 - substFormat: 2 is not yet
 * supported", for any text longer than one letter), so a font that fails the probe word is shaped by fontkit.
 */
export function loadLetteringFont(file: LetteringFontFile): GlyphOutlineSource {
  const bytes = readFontFile(file);
  const font = parseOpentypeFont(bytes);
  try {
    font.getPaths(LAYOUT_PROBE_TEXT, 0, 0, 1);
    return font;
  } catch {
    return fontkitOutlines(bytes);
  }
}

/** A loader that parses each font file once per process: parsing a font takes far longer than estimating with it. */
export function createLetteringFontLoader(): LetteringFontLoader {
  const loaded = new Map<string, GlyphOutlineSource>();
  return (file) => {
    const key = `${file.fontsourcePackage}/${file.fileName}`;
    let font = loaded.get(key);
    if (!font) {
      font = loadLetteringFont(file);
      loaded.set(key, font);
    }
    return font;
  };
}
