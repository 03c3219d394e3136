/**
 * `npm start`: the demo shop on this machine. MariaDB (installed and started if needed), migrations, demo data on
 * first run, the local sign-in/payment/mail stand-ins, both apps built, and the API serving everything on one origin.
 * Ctrl-C stops it all, including the database this command started; so does a failed start or a crash, whatever
 * had started by then.
 */
import type { ChildProcess } from 'node:child_process';
import type { LocalStack } from './stack.ts';
import { demoPeople } from '../seeds/data/people.ts';
import { startLocalDatabase, stopLocalDatabase } from './db-lifecycle.ts';
import { join } from 'node:path';
import {
  buildApps,
  demoStandInFolder,
  localStack,
  migrateAndSeed,
  startLocalFakes,
  startServerProcess,
  stopProcess,
} from './stack.ts';

let stack: LocalStack;
try {
  stack = localStack('demo');
} catch (error) {
  console.error(`The demo shop could not start: ${(error as Error).message}`);
  process.exit(1);
}
const usesOwnDatabase = !process.env.DATABASE_URL;
let startedDatabase = false;
let server: ChildProcess | undefined;
let fakes: Awaited<ReturnType<typeof startLocalFakes>> | undefined;
let stopping: Promise<never> | undefined;

/** Stops everything once; further signals (npm and tsx pass Ctrl-C on as well) wait for the same shutdown. */
function stopAll(exitCode: number): Promise<never> {
  stopping ??= (async () => {
    console.log('\nStopping the demo shop…');
    await stopProcess(server);
    await fakes?.close();
    if (startedDatabase) await stopLocalDatabase();
    console.log('Stopped.');
    process.exit(exitCode);
  })();
  return stopping;
}

process.on('SIGINT', () => void stopAll(0));
process.on('SIGTERM', () => void stopAll(0));
process.on('SIGHUP', () => void stopAll(0));
for (const event of ['uncaughtException', 'unhandledRejection'] as const) {
  process.on(event, (error) => {
    console.error(`\nThe demo shop stopped on an error: ${error instanceof Error ? error.message : String(error)}`);
    void stopAll(1);
  });
}

try {
  if (usesOwnDatabase) {
    console.log('Starting MariaDB…');
    startedDatabase = (await startLocalDatabase()).started;
  }
  const { migrated, seeded } = await migrateAndSeed(stack.env, 'when-empty');
  console.log(`Database ready (${migrated} new migrations${seeded ? ', demo data loaded' : ''}).`);
  fakes = await startLocalFakes(stack, { stripeStateFile: join(demoStandInFolder, 'stripe.json') });
  console.log('Building the storefront and studio apps…');
  await buildApps();
  server = await startServerProcess(stack, { onSpawn: (child) => (server = child) });
  server.on('exit', (code) => {
    if (!stopping) {
      console.error(`The API server stopped unexpectedly (exit ${code}).`);
      void stopAll(1);
    }
  });

  const people = demoPeople.map((p) => `    ${p.role.padEnd(8)} ${p.name} <${p.email}>`).join('\n');
  console.log(`
  Hoopwright demo shop is running.

    Storefront (customers):  ${stack.appOrigin}/
    Studio app (the shop):   ${stack.appOrigin}/admin/

  Sign in with any of these demo people on the local sign-in page (or type a new e-mail to become a new customer):
${people}

  Test payments: card 4242 4242 4242 4242 is accepted, 4000 0000 0000 0002 is declined (any future expiry, any CVC).
  Captured e-mails: ${fakes.urls.smtpHttp}/messages

  Press Ctrl-C to stop.
`);
} catch (error) {
  console.error(`\nThe demo shop could not start: ${(error as Error).message}`);
  await stopAll(1);
}
