/** Reads the configuration, opens the database, listens, and shuts down cleanly on SIGINT/SIGTERM. */
import type { Server } from 'node:http';
import { loadConfig } from './config.ts';
import { openDatabase } from './db/knex.ts';
import { createSessionLayer } from './auth/session.ts';
import { createStripeClient } from './integrations/payment-gateway.ts';
import { createMailer } from './integrations/mailer.ts';
import { createApp } from './app.ts';
import { createVisitorDataRetention } from './modules/retention/visitor-data-retention.ts';

const log = (line: string) => console.error(`${new Date().toISOString()} ${line}`);

const config = loadConfig();
const db = openDatabase(config.database);
const sessions = await createSessionLayer(config);
const mailer = createMailer(config);
const app = createApp({ config, db, sessions, stripe: createStripeClient(config), mailer, now: () => new Date(), log });
// Until a job runner exists, the server sweeps visitors' unclaimed data itself: at start and then daily.
const retention = createVisitorDataRetention({
  db,
  now: () => new Date(),
  retentionDays: config.visitorDataRetentionDays,
  log,
});
void retention.start();

const server: Server = app.listen(config.port, config.host, (error?: Error) => {
  if (error) {
    log(`Could not listen on ${config.host}:${config.port}: ${error.message}`);
    process.exit(1);
  }
  console.log(`Hoopwright API listening on http://${config.host}:${config.port}`);
});

let isClosing = false;
async function shutdown(signal: string): Promise<void> {
  if (isClosing) return;
  isClosing = true;
  log(`${signal} received, closing.`);
  retention.stop();
  server.closeIdleConnections();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await sessions.close();
  mailer.close();
  await db.destroy();
  process.exit(0);
}

process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('unhandledRejection', (reason) => {
  log(`Unhandled rejection: ${(reason as Error)?.stack ?? reason}`);
  process.exit(1);
});
