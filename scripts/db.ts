/** `npm run db:start | db:stop | db:reset` — the local MariaDB's lifecycle. */
import { rmSync } from 'node:fs';
import { openDatabase } from '../server/src/db/knex.ts';
import { demoStandInFolder } from './stack.ts';
import { loadDatabaseConfig } from '../server/src/config.ts';
import { localDatabaseSettings, startLocalDatabase, stopLocalDatabase, wipeLocalDatabase } from './db-lifecycle.ts';

const command = process.argv[2];
const settings = localDatabaseSettings();

if (command === 'start') {
  const { started } = await startLocalDatabase(settings);
  console.log(
    started
      ? `MariaDB started on 127.0.0.1:${settings.port}.`
      : `MariaDB is already running on 127.0.0.1:${settings.port}.`,
  );
} else if (command === 'stop') {
  const { stopped } = await stopLocalDatabase(settings);
  console.log(stopped ? 'MariaDB stopped.' : 'MariaDB was not running.');
} else if (command === 'reset') {
  await wipeLocalDatabase(settings);
  // The payment stand-in's saved sessions belong to the demo data being wiped.
  rmSync(demoStandInFolder, { recursive: true, force: true });
  await startLocalDatabase(settings);
  const db = openDatabase(loadDatabaseConfig({ ...process.env, DB_PORT: String(settings.port) }));
  try {
    const [, migrations] = await db.migrate.latest();
    await db.seed.run();
    console.log(`Fresh database: ${migrations.length} migrations applied, demo data loaded.`);
  } finally {
    await db.destroy();
  }
} else {
  console.error('Usage: tsx scripts/db.ts start|stop|reset');
  process.exit(64);
}
