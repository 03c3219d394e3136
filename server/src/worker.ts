/**
 * A job worker on its own (`node --import tsx server/src/worker.ts`): sends queued e-mails with retries and runs the
 * scheduled housekeeping. Run as many as you like beside the API servers (set WORKER_IN_PROCESS=false on those);
 * workers share the queue through MariaDB and never take the same job. SIGINT/SIGTERM let the job in hand finish.
 */
import { loadConfig } from './config.ts';
import { openDatabase } from './db/knex.ts';
import { createMailer } from './integrations/mailer.ts';
import { openProcessLog } from './integrations/log-writer.ts';
import { createJobWorker } from './app.ts';

const log = openProcessLog();
const config = loadConfig();
const db = openDatabase(config.database);
const mailer = createMailer(config);
const worker = createJobWorker({
  db,
  mailer,
  now: () => new Date(),
  log,
  visitorDataRetentionDays: config.visitorDataRetentionDays,
});
worker.start();
console.log(`Hoopwright worker ${worker.workerId} is running.`);

let isClosing = false;
async function shutdown(signal: string): Promise<void> {
  if (isClosing) return;
  isClosing = true;
  log(`${signal} received, finishing the job in hand.`);
  await worker.stop();
  mailer.close();
  await db.destroy();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
