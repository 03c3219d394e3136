import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Every TypeScript source file under a folder, for tests that sweep an app's code. */
export function sourcesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sourcesUnder(path) : /\.tsx?$/.test(name) ? [path] : [];
  });
}
