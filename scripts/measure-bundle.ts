/**
 * Size budget of the storefront's catalogue page: builds the storefront, then reads Vite's manifest
 * (dist/storefront/.vite/manifest.json) for the entry chunk and every chunk it imports statically (what the browser
 * must fetch before the catalogue can draw), and prints their JavaScript gzipped against the budget. The canvas
 * library must not be among them: it belongs to the lazily loaded designer. Which chunk holds it is read from the
 * build itself (each chunk's module list), not guessed from file names. It prints; it is not a test.
 * Run with `npm run bench:bundle`; `--no-build` measures the existing dist/storefront from `npm run build`.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { build, type Plugin } from 'vite';

/** 170 kB, in Vite's own kilobytes (1000 bytes), so the figure reads like the build's report. */
const BUDGET_GZIP_BYTES = 170 * 1000;
const root = fileURLToPath(new URL('..', import.meta.url));
const outDir = join(root, 'dist/storefront');
const manifestPath = join(outDir, '.vite/manifest.json');
/** The canvas library's package folder: a module from here marks the chunk that carries it. */
const CANVAS_LIBRARY = /[\\/]node_modules[\\/]fabric[\\/]/;

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

/** A bundled module and its size in the chunk before minifying, bytes. */
interface BundledModule {
  id: string;
  renderedBytes: number;
}

/** Records, for each emitted chunk file, the modules bundled into it. */
function recordChunkModules(into: Map<string, BundledModule[]>): Plugin {
  return {
    name: 'hoopwright:record-chunk-modules',
    generateBundle(_options, bundle) {
      for (const output of Object.values(bundle)) {
        if (output.type !== 'chunk') continue;
        into.set(
          output.fileName,
          Object.entries(output.modules).map(([id, module]) => ({ id, renderedBytes: module.renderedLength })),
        );
      }
    },
  };
}

/** The package (or project folder) a module comes from, to tell where the bytes go. */
const originOf = (id: string) =>
  /node_modules[\\/]((?:@[^\\/]+[\\/])?[^\\/]+)/.exec(id)?.[1] ??
  id.replace(root, '').split(/[\\/]/).slice(0, 3).join('/');

/** The largest contributors to the given chunks, by package or project folder, before minifying. */
function largestOrigins(modules: BundledModule[], count: number): string[] {
  const byOrigin = new Map<string, number>();
  for (const module of modules)
    byOrigin.set(originOf(module.id), (byOrigin.get(originOf(module.id)) ?? 0) + module.renderedBytes);
  return [...byOrigin]
    .sort((a, b) => b[1] - a[1])
    .slice(0, count)
    .map(([origin, bytes]) => `${origin} ${kb(bytes)}`);
}

/** The entry and every chunk reachable from it through static imports, by manifest key. */
function initialChunks(manifest: Record<string, ManifestChunk>): string[] {
  const entry = Object.keys(manifest).find((key) => manifest[key]!.isEntry);
  if (!entry) throw new Error(`No entry chunk in ${manifestPath}`);
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const imported of manifest[key]?.imports ?? []) visit(imported);
  };
  visit(entry);
  return [...seen];
}

const kb = (bytes: number) => `${(bytes / 1000).toFixed(1)} kB`;

async function main(): Promise<void> {
  const chunkModules = new Map<string, BundledModule[]>();
  const isBuilt = process.argv.includes('--no-build');
  if (!isBuilt) {
    await build({
      configFile: join(root, 'storefront/vite.config.ts'),
      logLevel: 'warn',
      plugins: [recordChunkModules(chunkModules)],
    });
  }
  if (!existsSync(manifestPath))
    throw new Error(`${manifestPath} is missing: run \`npm run build\` first, or drop --no-build.`);
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as Record<string, ManifestChunk>;

  const initial = initialChunks(manifest)
    .map((key) => manifest[key]!.file)
    .filter((file) => file.endsWith('.js'));
  let totalGzip = 0;
  console.log('Catalogue page, initial JavaScript (entry and its static imports):');
  for (const file of initial) {
    const bytes = readFileSync(join(outDir, file));
    const gzip = gzipSync(bytes).length;
    totalGzip += gzip;
    console.log(`  ${file}  ${kb(bytes.length)} raw, ${kb(gzip)} gzipped`);
  }
  console.log(
    `Total: ${kb(totalGzip)} gzipped; budget ${kb(BUDGET_GZIP_BYTES)}: ${totalGzip <= BUDGET_GZIP_BYTES ? 'within' : 'OVER'} budget.`,
  );

  if (isBuilt) {
    console.log(
      "Canvas library check skipped with --no-build: the chunks' module lists are only known while building.",
    );
    return;
  }
  const initialModules = initial.flatMap((file) => chunkModules.get(file) ?? []);
  console.log(`Largest parts of it, before minifying: ${largestOrigins(initialModules, 6).join(', ')}.`);
  const canvasChunks = [...chunkModules]
    .filter(([, modules]) => modules.some((module) => CANVAS_LIBRARY.test(module.id)))
    .map(([file]) => file);
  if (canvasChunks.length === 0)
    throw new Error('No chunk holds the canvas library: has the designer stopped using it, or the build changed?');
  const leaked = canvasChunks.filter((file) => initial.includes(file));
  console.log(
    `Canvas library (fabric) is in ${canvasChunks.join(', ')}: ${leaked.length === 0 ? 'not loaded by the catalogue page.' : 'LOADED BY THE CATALOGUE PAGE.'}`,
  );
}

await main();
