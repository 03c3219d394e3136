import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

// The apps' aliases, so unit tests can import the designer's pure model as the apps do.
const alias = { '@server': here('./server/src'), '@ui': here('./ui/src') };

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        // Pure code: files run side by side.
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.{ts,tsx}'],
          testTimeout: 20_000,
          pool: 'threads',
          isolate: false,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          // API test files share one test database; each file resets it, so files run one at a time.
          fileParallelism: false,
          setupFiles: ['tests/support/register-tsx.ts'],
          testTimeout: 20_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
