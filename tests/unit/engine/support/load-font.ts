import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import * as fontkit from 'fontkit';
import opentype from 'opentype.js';
import type { GlyphOutlineSource, OutlineCommand } from '../../../../server/src/engine/index.ts';

/** The lettering fonts the product ships, by @fontsource package name (Poppins is also the interface font). */
export const SHIPPED_FONTS = ['pacifico', 'fredoka', 'playfair-display', 'great-vibes', 'poppins'] as const;
export type ShippedFont = (typeof SHIPPED_FONTS)[number];

/**
 * opentype.js 2.0.0 always applies the `ccmp` feature and throws on Great Vibes' chained-context lookup
 * ("lookupType: 6 - substFormat: 2 is not yet supported") for any text longer than one letter, so that font is
 * laid out with fontkit, which shapes it fully.
 */
const NEEDS_FONTKIT: ReadonlySet<ShippedFont> = new Set(['great-vibes']);

const require = createRequire(import.meta.url);

function readWoff(name: ShippedFont): Buffer {
  return readFileSync(require.resolve(`@fontsource/${name}/files/${name}-latin-400-normal.woff`));
}

/** A shipped font's latin 400 WOFF parsed by opentype.js (which reads WOFF, not WOFF2; default import only). */
export function loadOpentypeFont(name: ShippedFont): opentype.Font {
  const bytes = readWoff(name);
  return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
}

/** A shipped font laid out by fontkit, adapted to the engine's outline interface (y down, units of fontSize). */
export function loadFontkitOutlines(name: ShippedFont): GlyphOutlineSource {
  const font = fontkit.create(readWoff(name));
  if (!('layout' in font)) throw new Error(`${name} is a font collection`);
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

/** The outline source the tests use for a shipped font: opentype.js where it can lay the font out. */
export function loadShippedFont(name: ShippedFont): GlyphOutlineSource {
  return NEEDS_FONTKIT.has(name) ? loadFontkitOutlines(name) : loadOpentypeFont(name);
}
