/**
 * The import rules of DEVELOPERS.md, checked over the source text: the apps reach into the server only for its pure
 * contracts and engine, never import each other, and one feature never imports another.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = resolve(import.meta.dirname, '../../..');

function sourceFiles(dir: string): string[] {
  return readdirSync(join(root, dir), { withFileTypes: true, recursive: true })
    .filter((entry) => entry.isFile() && /\.(ts|tsx)$/.test(entry.name))
    .map((entry) => relative(root, join(entry.parentPath, entry.name)));
}

const aliases: Record<string, string> = {
  '@server/': 'server/src/',
  '@ui/': 'ui/src/',
  '@store/': 'storefront/src/',
  '@admin/': 'admin/src/',
};

/** Every module a file imports, as a path from the project root (packages are left out). */
function importsOf(file: string): string[] {
  const text = readFileSync(join(root, file), 'utf8');
  const specifiers = [
    ...text.matchAll(/(?:import|export)\s[^'"]*?from\s+['"]([^'"]+)['"]|import\s+['"]([^'"]+)['"]/g),
  ].map((m) => m[1] ?? m[2]!);
  return specifiers.flatMap((spec) => {
    const alias = Object.keys(aliases).find((prefix) => spec.startsWith(prefix));
    if (alias) return [aliases[alias] + spec.slice(alias.length)];
    if (spec.startsWith('.')) return [relative(root, resolve(dirname(join(root, file)), spec))];
    return [];
  });
}

const appFiles = [...sourceFiles('storefront/src'), ...sourceFiles('admin/src'), ...sourceFiles('ui/src')];

describe('import boundaries', () => {
  it('when an app imports server code, then it is only the pure contracts or engine', () => {
    const offending = appFiles.flatMap((file) =>
      importsOf(file)
        .filter((target) => target.startsWith('server/') && !/^server\/src\/(contracts|engine)\//.test(target))
        .map((target) => `${file} → ${target}`),
    );
    expect(offending).toEqual([]);
  });

  it('when the storefront and the studio app import, then never each other, and the shared ui imports neither', () => {
    const offending = appFiles.flatMap((file) =>
      importsOf(file)
        .filter((target) => {
          if (file.startsWith('storefront/')) return target.startsWith('admin/');
          if (file.startsWith('admin/')) return target.startsWith('storefront/');
          return target.startsWith('admin/') || target.startsWith('storefront/');
        })
        .map((target) => `${file} → ${target}`),
    );
    expect(offending).toEqual([]);
  });

  it('when a feature imports, then never another feature', () => {
    const featureOf = (path: string) =>
      /^(storefront|admin)\/src\/features\/([^/]+)\//.exec(path)?.slice(1, 3).join('/');
    const offending = appFiles.flatMap((file) => {
      const own = featureOf(file);
      if (!own) return [];
      return importsOf(file)
        .filter((target) => featureOf(target) && featureOf(target) !== own)
        .map((target) => `${file} → ${target}`);
    });
    expect(offending).toEqual([]);
  });

  it('when server contracts are imported by the apps, then they import nothing but zod and each other', () => {
    const offending = sourceFiles('server/src/contracts').flatMap((file) =>
      importsOf(file)
        .filter((target) => !target.startsWith('server/src/contracts/'))
        .map((target) => `${file} → ${target}`),
    );
    expect(offending).toEqual([]);
  });
});
