/**
 * `npm run db:backup [FILE]` and `npm run db:restore FILE [--into NAME] [--replace]`.
 *
 * A backup is one consistent dump of the shop's database (`mariadb-dump --single-transaction`: a snapshot taken
 * without locking the shop), gzip-compressed. Everything the shop keeps lives in that database, uploads, proofs and
 * sessions included, so the one file is the whole shop. A restore loads a dump into an empty database (or, with
 * `--replace`, one whose tables it drops first) and prints each table's row count.
 *
 * The database is the one the server would use: DATABASE_URL or DB_HOST/DB_PORT/DB_USER/DB_PASSWORD/DB_NAME, else
 * the project's own local MariaDB and its demo database (started for the run if it is not running).
 */
import { spawn } from 'node:child_process';
import { createReadStream, createWriteStream, mkdirSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createGunzip, createGzip } from 'node:zlib';
import { loadDatabaseConfig, type DatabaseConfig } from '../server/src/config.ts';
import { openDatabase } from '../server/src/db/knex.ts';
import {
  ensureLocalDatabase,
  localDatabaseSettings,
  projectRoot,
  startLocalDatabase,
  stopLocalDatabase,
} from './db-lifecycle.ts';
import { localStack } from './stack.ts';

const [command, ...rest] = process.argv.slice(2);
const usage = 'Usage: npm run db:backup [FILE]  |  npm run db:restore FILE [--into NAME] [--replace]';

const target = loadDatabaseConfig({ ...localStack('demo').env, ...process.env });
const isLocal = ['127.0.0.1', 'localhost'].includes(target.host) && target.port === localDatabaseSettings().port;

/** Runs a MariaDB client program with the connection's settings; the password goes by environment, not argv. */
function client(program: 'mariadb-dump' | 'mariadb', db: DatabaseConfig, args: string[]) {
  return spawn(program, [`--host=${db.host}`, `--port=${db.port}`, `--user=${db.user}`, ...args], {
    env: { ...process.env, MYSQL_PWD: db.password },
    stdio: ['pipe', 'pipe', 'inherit'],
  });
}

function finished(child: ReturnType<typeof client>, what: string): Promise<void> {
  return new Promise((resolveExit, reject) => {
    child.once('error', reject);
    child.once('exit', (code) => (code === 0 ? resolveExit() : reject(new Error(`${what} failed (exit ${code}).`))));
  });
}

async function backup(file: string): Promise<void> {
  mkdirSync(dirname(file), { recursive: true });
  const dump = client('mariadb-dump', target, [
    '--single-transaction',
    '--quick',
    '--routines',
    '--triggers',
    '--hex-blob',
    '--default-character-set=utf8mb4',
    target.database,
  ]);
  dump.stdin.end();
  await Promise.all([
    pipeline(dump.stdout, createGzip(), createWriteStream(file)),
    finished(dump, `mariadb-dump of ${target.database}`),
  ]);
  const kb = Math.round(statSync(file).size / 1024);
  console.log(`Backed up ${target.database} on ${target.host}:${target.port} to ${file} (${kb} KB).`);
}

async function restore(file: string, into: string, replace: boolean): Promise<void> {
  if (isLocal) ensureLocalDatabase(into);
  const db = openDatabase({ ...target, database: into });
  try {
    const tables = (await db.raw('SHOW FULL TABLES WHERE Table_type = ?', ['BASE TABLE']))[0] as Record<
      string,
      string
    >[];
    const names = tables.map((row) => Object.values(row)[0]!);
    if (names.length && !replace) {
      throw new Error(
        `The database ${into} already has ${names.length} tables. Restore into an empty database (--into NAME), ` +
          'or add --replace to drop its tables first.',
      );
    }
    if (names.length) {
      await db.raw('SET FOREIGN_KEY_CHECKS = 0');
      for (const name of names) await db.schema.dropTable(name);
      await db.raw('SET FOREIGN_KEY_CHECKS = 1');
    }
  } finally {
    await db.destroy();
  }
  const load = client('mariadb', { ...target, database: into }, ['--default-character-set=utf8mb4', into]);
  await Promise.all([pipeline(createReadStream(file), createGunzip(), load.stdin), finished(load, 'Loading the dump')]);
  load.stdout.resume();

  const loaded = openDatabase({ ...target, database: into });
  try {
    const counts = await tableRowCounts(loaded);
    console.log(`Restored ${file} into ${into}:`);
    for (const [name, count] of Object.entries(counts)) console.log(`  ${name.padEnd(32)} ${count} rows`);
  } finally {
    await loaded.destroy();
  }
}

/** Each base table's exact row count (information_schema's figures are estimates for InnoDB). */
async function tableRowCounts(db: ReturnType<typeof openDatabase>): Promise<Record<string, number>> {
  const tables = (await db.raw('SHOW FULL TABLES WHERE Table_type = ?', ['BASE TABLE']))[0] as Record<string, string>[];
  const counts: Record<string, number> = {};
  for (const row of tables) {
    const name = Object.values(row)[0]!;
    const [{ n }] = await db(name).count({ n: '*' });
    counts[name] = Number(n);
  }
  return counts;
}

const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\..*/, '').replace('T', '-');
let exitCode = 0;
let startedDatabase = false;
try {
  if (isLocal) startedDatabase = (await startLocalDatabase()).started;
  if (command === 'backup') {
    const file = rest[0]
      ? resolve(rest[0])
      : join(projectRoot, '.data', 'backups', `${target.database}-${stamp}.sql.gz`);
    await backup(file);
  } else if (command === 'restore' && rest[0] && !rest[0].startsWith('--')) {
    const intoAt = rest.indexOf('--into');
    const into = intoAt >= 0 ? rest[intoAt + 1] : target.database;
    if (!into || into.startsWith('--')) throw new Error('Name the database after --into.');
    await restore(resolve(rest[0]), into, rest.includes('--replace'));
  } else {
    console.error(usage);
    exitCode = 2;
  }
} catch (error) {
  console.error((error as Error).message);
  exitCode = 1;
} finally {
  if (startedDatabase) await stopLocalDatabase();
}
process.exit(exitCode);
