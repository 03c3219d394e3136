import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

export default defineConfig({
  // The apps' aliases, so unit tests can import the designer's pure model as the apps do.
  resolve: { alias: { '@server': here('./server/src'), '@ui': here('./ui/src') } },
  test: {
    include: ['tests/unit/**/*.test.{ts,tsx}', 'tests/api/**/*.test.ts'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    // API test files share one test database; each file resets it, so files run one at a time.
    fileParallelism: false,
    setupFiles: ['tests/support/register-tsx.ts'],
    testTimeout: 20_000,
    hookTimeout: 60_000,
  },
});
