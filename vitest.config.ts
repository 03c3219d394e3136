import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/unit/**/*.test.ts', 'tests/api/**/*.test.ts'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    // API test files share one test database; each file resets it, so files run one at a time.
    fileParallelism: false,
    setupFiles: ['tests/support/register-tsx.ts'],
    testTimeout: 20_000,
    hookTimeout: 60_000,
  },
});
