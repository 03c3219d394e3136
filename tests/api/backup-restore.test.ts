/**
 * `npm run db:backup` and `npm run db:restore` against the test database: a restored copy has every table with the
 * same rows, byte for byte, as MariaDB's own CHECKSUM TABLE reads them.
 */
import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase, type Db } from '../../server/src/db/knex.ts';
import { dropLocalDatabase, projectRoot } from '../../scripts/db-lifecycle.ts';
import { localStack } from '../../scripts/stack.ts';

const run = promisify(execFile);
const copyName = 'hoopwright_restore_check';
const folder = mkdtempSync(join(tmpdir(), 'hw-backup-'));
const env = { ...process.env, ...localStack('test').env };
const source: Db = openDatabase(loadDatabaseConfig(env));
let copy: Db | undefined;

const script = (...args: string[]) =>
  run(process.execPath, [join(projectRoot, 'node_modules/tsx/dist/cli.mjs'), 'scripts/db-backup.ts', ...args], {
    cwd: projectRoot,
    env,
  });

beforeAll(async () => {
  await source.migrate.latest();
  await source.seed.run();
  // An upload's bytes live in the database too: a binary value with every byte from 0 to 255 must survive.
  const bytes = Buffer.from(Array.from({ length: 256 }, (_, i) => i));
  const owner = await source('users').first('id');
  await source('artwork_uploads').insert({
    owner_user_id: owner.id,
    original_name: 'every-byte.png',
    mime_type: 'image/png',
    byte_size: bytes.length,
    png: bytes,
    width_px: 16,
    height_px: 16,
  });
});
afterAll(async () => {
  await copy?.destroy();
  await source.destroy();
  dropLocalDatabase(copyName);
  rmSync(folder, { recursive: true, force: true });
});

/** `CHECKSUM TABLE` for every base table: MariaDB's own digest of the rows, the same for the same contents. */
async function checksums(db: Db): Promise<Record<string, string>> {
  const tables = (await db.raw('SHOW FULL TABLES WHERE Table_type = ?', ['BASE TABLE']))[0] as Record<string, string>[];
  const sums: Record<string, string> = {};
  for (const row of tables) {
    const name = Object.values(row)[0]!;
    const [[result]] = await db.raw('CHECKSUM TABLE ??', [name]);
    const [{ n }] = await db(name).count({ n: '*' });
    sums[name] = `${n} rows, checksum ${result.Checksum}`;
  }
  return sums;
}

describe('backups', () => {
  it('when the test database is backed up and restored into a fresh one, then every table has the same rows and checksum', async () => {
    const file = join(folder, 'shop.sql.gz');
    const backedUp = await script('backup', file);
    expect(backedUp.stdout).toMatch(/Backed up hoopwright_test .* to .*shop\.sql\.gz \(\d+ KB\)\./);

    const restored = await script('restore', file, '--into', copyName);
    expect(restored.stdout).toContain(`Restored ${file} into ${copyName}:`);

    copy = openDatabase(loadDatabaseConfig({ ...env, DB_NAME: copyName }));
    const expected = await checksums(source);
    expect(Object.keys(expected).length).toBeGreaterThan(15);
    expect(await checksums(copy)).toEqual(expected);
  });

  it('when a restore would land on a database that has tables, then it refuses and says how to go on', async () => {
    const file = join(folder, 'shop.sql.gz');
    const refused = await script('restore', file, '--into', copyName).catch((error) => error);
    expect(refused.code).toBe(1);
    expect(refused.stderr).toMatch(/already has \d+ tables\. Restore into an empty database .* or add --replace/);
  });
});
