/**
 * Reads the configuration, opens the database, listens (with a job worker in the same process unless
 * WORKER_IN_PROCESS=false), and shuts down cleanly on SIGINT/SIGTERM: requests and the job in hand finish first.
 */
import type { Server } from 'node:http';
import { loadConfig } from './config.ts';
import { openDatabase } from './db/knex.ts';
import { createSessionLayer } from './auth/session.ts';
import { createStripeClient } from './integrations/payment-gateway.ts';
import { createMailer } from './integrations/mailer.ts';
import { createHeavyWork } from './integrations/heavy-work.ts';
import { openProcessLog } from './integrations/log-writer.ts';
import { createApp, createJobWorker } from './app.ts';

const log = openProcessLog();

const config = loadConfig();
const db = openDatabase(config.database);
const sessions = await createSessionLayer(config);
const mailer = createMailer(config);
let isClosing = false;
const heavyWork = createHeavyWork(config.heavyWork);
const app = createApp({
  config,
  db,
  sessions,
  stripe: createStripeClient(config),
  mailer,
  heavyWork,
  now: () => new Date(),
  log,
  isDraining: () => isClosing,
});

const worker = config.isWorkerInProcess
  ? createJobWorker({
      db,
      mailer,
      now: () => new Date(),
      log,
      visitorDataRetentionDays: config.visitorDataRetentionDays,
    })
  : undefined;
worker?.start();

const server: Server = app.listen(config.port, config.host, (error?: Error) => {
  if (error) {
    log(`Could not listen on ${config.host}:${config.port}: ${error.message}`);
    process.exit(1);
  }
  console.log(`Hoopwright API listening on http://${config.host}:${config.port}`);
});

/** Stops taking connections, lets the requests in flight finish, then closes the database. */
async function shutdown(signal: string): Promise<void> {
  if (isClosing) return;
  isClosing = true;
  log(`${signal} received, closing.`);
  server.closeIdleConnections();
  await Promise.all([new Promise<void>((resolve) => server.close(() => resolve())), worker?.stop()]);
  await sessions.close();
  mailer.close();
  await heavyWork.close();
  await db.destroy();
  process.exit(0);
}

process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('unhandledRejection', (reason) => {
  log(`Unhandled rejection: ${(reason as Error)?.stack ?? reason}`);
  process.exit(1);
});
