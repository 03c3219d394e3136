/**
 * `npm test`: every test against real services on this machine. It starts the project's MariaDB, gives the tests a
 * fresh `hoopwright_test` database (the demo data is never touched), runs Vitest (unit and API tests), builds the apps
 * and runs the Playwright journeys in Debian's Chromium against the whole local stack. Exits non-zero on any failure.
 */
import { mkdirSync, readFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { ensureChromium } from './browser.ts';
import { projectRoot, recreateLocalDatabase, startLocalDatabase, stopLocalDatabase } from './db-lifecycle.ts';
import { buildApps, localStack, migrateAndSeed, run, startLocalFakes } from './stack.ts';

const reportDir = join(projectRoot, 'test-results');
mkdirSync(reportDir, { recursive: true });
const stack = localStack('test');

interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}

function readVitestTally(file: string): Tally {
  if (!existsSync(file)) return { passed: 0, failed: 1, skipped: 0 };
  const report = JSON.parse(readFileSync(file, 'utf8'));
  return {
    passed: report.numPassedTests,
    failed: report.numFailedTests,
    skipped: report.numPendingTests + report.numTodoTests,
  };
}

function readPlaywrightTally(file: string): Tally {
  if (!existsSync(file)) return { passed: 0, failed: 1, skipped: 0 };
  const stats = JSON.parse(readFileSync(file, 'utf8')).stats;
  return { passed: stats.expected + stats.flaky, failed: stats.unexpected, skipped: stats.skipped };
}

// The lint (ESLint with the layering rules, Prettier) and the type check come first: quick, and no database needed.
const checks = {
  lint: await run('eslint', ['.']),
  format: await run('prettier', ['--check', '.', '--log-level', 'warn']),
  types:
    (await run(process.execPath, ['node_modules/typescript-native/bin/tsc', '-p', 'tsconfig.json'])) ||
    (await run(process.execPath, ['node_modules/typescript-native/bin/tsc', '-p', 'tsconfig.apps.json'])),
};
const failedChecks = Object.entries(checks)
  .filter(([, code]) => code !== 0)
  .map(([name]) => name);

const { started } = await startLocalDatabase();
let exitCode: number;
try {
  ensureChromium();
  recreateLocalDatabase('hoopwright_test');
  await migrateAndSeed(stack.env, 'always');

  const vitestReport = join(reportDir, 'vitest.json');
  const vitestCode = await run(
    'vitest',
    ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestReport}`],
    stack.env,
  );

  await buildApps();
  await migrateAndSeed(stack.env, 'always');
  const fakes = await startLocalFakes(stack);
  const playwrightReport = join(reportDir, 'playwright.json');
  let playwrightCode: number;
  try {
    playwrightCode = await run('playwright', ['test'], {
      ...stack.env,
      PLAYWRIGHT_JSON_OUTPUT_NAME: playwrightReport,
      FAKE_SMTP_HTTP_URL: fakes.urls.smtpHttp,
    });
  } finally {
    await fakes.close();
  }

  const unit = readVitestTally(vitestReport);
  const browser = readPlaywrightTally(playwrightReport);
  const total = {
    passed: unit.passed + browser.passed,
    failed: unit.failed + browser.failed,
    skipped: unit.skipped + browser.skipped,
  };
  console.log(
    `\nVitest: ${unit.passed} passed, ${unit.failed} failed · Playwright: ${browser.passed} passed, ${browser.failed} failed`,
  );
  if (failedChecks.length) console.log(`Failed before the tests: ${failedChecks.join(', ')}`);
  console.log(`${total.passed} passed, ${total.failed + failedChecks.length} failed, ${total.skipped} skipped`);
  exitCode = vitestCode === 0 && playwrightCode === 0 && total.failed === 0 && failedChecks.length === 0 ? 0 : 1;
} catch (error) {
  console.error(error);
  exitCode = 1;
} finally {
  if (started) await stopLocalDatabase();
}
process.exit(exitCode);
