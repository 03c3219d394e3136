/**
 * `npm run test:some -- <files…>`: the named test files only, against the same real services as `npm test`, for
 * working on one part without waiting for the whole suite. Vitest files (`tests/unit`, `tests/api`) run first; any
 * Playwright specs (`tests/e2e/*.spec.ts`) run after the apps are built (`HW_SKIP_BUILD=1` reuses the last build).
 * Without files it runs nothing and says how to call it. `npm test` stays the one command that decides.
 */
import { ensureChromium } from './browser.ts';
import { recreateLocalDatabase, startLocalDatabase, stopLocalDatabase } from './db-lifecycle.ts';
import { buildApps, localStack, migrateAndSeed, run, startLocalFakes } from './stack.ts';

const files = process.argv.slice(2);
if (files.length === 0) {
  console.log(
    'Name the test files to run, e.g. npm run test:some -- tests/api/quotes.test.ts tests/e2e/designer.spec.ts',
  );
  process.exit(2);
}
const specs = files.filter((file) => file.includes('tests/e2e/'));
const vitestFiles = files.filter((file) => !file.includes('tests/e2e/'));
const stack = localStack('test');

const { started } = await startLocalDatabase();
let exitCode = 0;
try {
  recreateLocalDatabase('hoopwright_test');
  await migrateAndSeed(stack.env, 'always');
  if (vitestFiles.length) exitCode ||= await run('vitest', ['run', ...vitestFiles], stack.env);
  if (specs.length) {
    ensureChromium();
    if (process.env.HW_SKIP_BUILD !== '1') await buildApps();
    await migrateAndSeed(stack.env, 'always');
    const fakes = await startLocalFakes(stack);
    try {
      exitCode ||= await run('playwright', ['test', ...specs], {
        ...stack.env,
        FAKE_SMTP_HTTP_URL: fakes.urls.smtpHttp,
      });
    } finally {
      await fakes.close();
    }
  }
} catch (error) {
  console.error(error);
  exitCode = 1;
} finally {
  if (started) await stopLocalDatabase();
}
process.exit(exitCode);
