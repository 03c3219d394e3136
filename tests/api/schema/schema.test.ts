/**
 * The first schema and the demo seeds, against the real test database: a fresh migrate from nothing, the seeded
 * counts, foreign and unique keys that refuse bad rows, and a second seeding that changes nothing.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDatabaseConfig } from '../../../server/src/config.ts';
import { openDatabase, type Db } from '../../../server/src/db/knex.ts';
import { seededTables } from '../../../seeds/00_reset.ts';
import { demoPeople } from '../../../seeds/data/people.ts';

let db: Db;

/** CHECKSUM TABLE of every seeded table: equal sums mean equal rows. */
async function checksums(): Promise<Record<string, string>> {
  const [rows] = await db.raw(`CHECKSUM TABLE ${seededTables.map((table) => `\`${table}\``).join(', ')}`);
  return Object.fromEntries(
    (rows as { Table: string; Checksum: string | number }[]).map((row) => [row.Table, String(row.Checksum)]),
  );
}

async function count(table: string, where: Record<string, unknown> = {}): Promise<number> {
  const [row] = await db(table).where(where).count({ n: '*' });
  return Number(row.n);
}

beforeAll(async () => {
  db = openDatabase(loadDatabaseConfig({ ...process.env, DB_NAME: 'hoopwright_test' }));
  await db.migrate.rollback(undefined, true);
  await db.migrate.latest();
  await db.seed.run();
});

afterAll(async () => {
  await db?.destroy();
});

describe('schema and demo seeds', () => {
  it('when migrated from nothing and seeded, then every table holds the demo scenario', async () => {
    expect(await count('users')).toBe(demoPeople.length);
    expect(await count('users', { role: 'owner' })).toBe(1);
    expect(await count('shop_settings')).toBe(1);
    expect(await count('garments')).toBeGreaterThanOrEqual(4);
    expect(await count('motifs')).toBeGreaterThanOrEqual(6);
    expect(await count('lettering_fonts')).toBeGreaterThanOrEqual(3);
    expect(await count('threads')).toBeGreaterThanOrEqual(30);
    expect(await count('hoops')).toBeGreaterThanOrEqual(3);
    expect(await count('pricing_rule_sets', { status: 'published' })).toBe(1);
    expect(await count('pricing_rule_sets', { status: 'draft' })).toBe(1);

    const sizesPerGarment = await db('garment_sizes').select('garment_id').count({ n: '*' }).groupBy('garment_id');
    expect(sizesPerGarment.every((row) => Number(row.n) >= 4)).toBe(true);
    const statuses = (await db('orders').distinct('status')).map((row) => row.status).sort();
    expect(statuses).toEqual([
      'authorized',
      'awaiting_payment',
      'cancelled',
      'changes_requested',
      'in_production',
      'proof_approved',
      'proof_sent',
      'refunded',
      'shipped',
      'stitched',
    ]);
  });

  it('when the worked case is seeded, then the 180 mm daisy chain sits 4 times round the 692 mm bishop hem', async () => {
    const motif = await db('motifs').where({ slug: 'daisy-chain' }).first();
    expect([Number(motif.width_mm), motif.min_scale_pct, motif.max_scale_pct]).toEqual([180, 90, 110]);
    const design = await db('designs').where({ id: 6 }).first();
    const document = typeof design.document === 'string' ? JSON.parse(design.document) : design.document;
    expect(document.placements[0]).toMatchObject({ motif: 'daisy-chain', count: 4, scalePct: 96.11 });
  });

  it('when an order item names an order that does not exist, then the foreign key refuses it', async () => {
    const item = await db('order_items').first();
    await expect(db('order_items').insert({ ...item, id: undefined, order_id: 999_999 })).rejects.toMatchObject({
      code: 'ER_NO_REFERENCED_ROW_2',
    });
  });

  it('when a garment still has designs, then it cannot be deleted', async () => {
    await expect(db('garments').where({ slug: 'bishop-dress' }).del()).rejects.toMatchObject({
      code: 'ER_ROW_IS_REFERENCED_2',
    });
  });

  it('when a second user takes an e-mail already in use, in other capitals, then the unique key refuses it', async () => {
    await expect(
      db('users').insert({ email: demoPeople[0].email.toUpperCase(), name: 'Someone Else' }),
    ).rejects.toMatchObject({ code: 'ER_DUP_ENTRY' });
  });

  it('when a motif has a smaller maximum scale than its minimum, then the check constraint refuses it', async () => {
    const motif = await db('motifs').where({ slug: 'sailboats' }).first();
    // MariaDB's ER_CONSTRAINT_FAILED is errno 4025; mysql2 names codes after MySQL's table, so match the message.
    await expect(db('motifs').where({ id: motif.id }).update({ min_scale_pct: 95, max_scale_pct: 90 })).rejects.toThrow(
      /CONSTRAINT `motifs_scale_range` failed/,
    );
  });

  it('when the seeds run a second time, then every table is exactly as before', async () => {
    const before = await checksums();
    await db.seed.run();
    expect(await checksums()).toEqual(before);
  });

  it('when a real person has signed up, then the demo seeds refuse to run and change nothing', async () => {
    const [id] = await db('users').insert({ email: 'a.parent@gmail.example', name: 'A Parent', role: 'customer' });
    const before = await checksums();
    await expect(db.seed.run()).rejects.toThrow(/1 real customer or staff accounts/);
    expect(await checksums()).toEqual(before);
    await db('users').where({ id }).del();
  });
});
