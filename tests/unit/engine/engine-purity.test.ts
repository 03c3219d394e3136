import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

/**
 * The engine is bundled into the browser apps and must give the same answer twice, so its source may not reach
 * for Node modules, the clock, randomness, the environment or browser globals (style guide, "Pure engine").
 */
const engineDir = new URL('../../../server/src/engine/', import.meta.url);
const sources = readdirSync(engineDir)
  .filter((file) => file.endsWith('.ts'))
  .map((file) => ({ file, text: readFileSync(new URL(file, engineDir), 'utf8') }));

const FORBIDDEN: [string, RegExp][] = [
  ['a node: import', /from ['"]node:/],
  ['a Node built-in import', /from ['"](fs|path|os|crypto|child_process|http|https|url)['"]/],
  ['the clock', /\bDate\b|performance\.now/],
  ['randomness', /Math\.random|crypto\.getRandomValues/],
  ['the environment', /process\.|import\.meta\.env/],
  ['browser globals', /(?<![\w./-])(window|document|localStorage|globalThis)\./],
  ['a database or server library', /from ['"](knex|mysql2|express)/],
  ['a TODO', /TODO|FIXME/],
];

describe('engine purity', () => {
  it('has one public entry, index.ts', () => {
    const index = sources.find(({ file }) => file === 'index.ts');
    expect(index).toBeDefined();
  });

  it.each(FORBIDDEN)('no engine file uses %s', (_, pattern) => {
    expect(sources.filter(({ text }) => pattern.test(text)).map(({ file }) => file)).toEqual([]);
  });

  it('every engine file stays under 300 lines', () => {
    expect(sources.filter(({ text }) => text.split('\n').length > 300).map(({ file }) => file)).toEqual([]);
  });
});
