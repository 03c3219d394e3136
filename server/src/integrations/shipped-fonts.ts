/**
 * The lettering fonts the server can stitch: the @fontsource packages installed with the app, less the interface
 * font, each named by its latin 400 .woff (the only format the outline reader takes); the loader adds the
 * package's other subset files beside it (latin-ext, cyrillic, vietnamese…). A catalogue font can only be one of
 * these, so every lettering font a customer picks is one the server can measure.
 */
import { existsSync, readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { loadLetteringFont, parseOpentypeFont, readFontFile, type LetteringFontFile } from './lettering-fonts.ts';

/** Poppins is the apps' interface font, not one to embroider with. */
const INTERFACE_FONT_PACKAGES = new Set(['@fontsource/poppins']);

export interface ShippedFont extends LetteringFontFile {
  /** The CSS family the apps show the lettering in. */
  fontFamily: string;
}

const requireFromHere = createRequire(import.meta.url);

function fontsourceFolder(): string | undefined {
  try {
    // Any installed package tells where node_modules/@fontsource is; Poppins always ships.
    return dirname(dirname(requireFromHere.resolve('@fontsource/poppins/package.json')));
  } catch {
    return undefined;
  }
}

/** One package as a shipped font, or undefined when it has no latin 400 .woff that opens. */
function readShippedFont(fontsourcePackage: string): ShippedFont | undefined {
  const name = fontsourcePackage.slice('@fontsource/'.length);
  const file = { fontsourcePackage, fileName: `${name}-latin-400-normal.woff` };
  try {
    const fontFamily = parseOpentypeFont(readFontFile(file)).getEnglishName('fontFamily');
    loadLetteringFont(file);
    return { ...file, fontFamily: fontFamily || name };
  } catch {
    return undefined;
  }
}

let shipped: ShippedFont[] | undefined;

/** Every lettering font installed with the app, by package name; read once per process, as installs do not change. */
export function listShippedFonts(): ShippedFont[] {
  shipped ??= readShippedFonts();
  return shipped;
}

function readShippedFonts(): ShippedFont[] {
  const folder = fontsourceFolder();
  if (!folder || !existsSync(folder)) return [];
  return readdirSync(folder)
    .map((name) => `@fontsource/${name}`)
    .filter(
      (fontsourcePackage) =>
        !INTERFACE_FONT_PACKAGES.has(fontsourcePackage) &&
        existsSync(join(folder, fontsourcePackage.slice(12), 'files')),
    )
    .sort()
    .flatMap((fontsourcePackage) => readShippedFont(fontsourcePackage) ?? []);
}

/** The shipped font in that package, or undefined when the app does not ship it (or cannot open it). */
export function findShippedFont(fontsourcePackage: string): ShippedFont | undefined {
  return INTERFACE_FONT_PACKAGES.has(fontsourcePackage)
    ? undefined
    : listShippedFonts().find((font) => font.fontsourcePackage === fontsourcePackage);
}
