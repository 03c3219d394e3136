import type { Knex } from 'knex';

/**
 * Order numbers come from a MariaDB SEQUENCE instead of MAX(number) … FOR UPDATE, so two checkouts never wait on one
 * lock to be numbered. NOCACHE keeps numbers close together across restarts; a checkout that rolls back leaves a
 * gap, which an order number may have. It starts after the highest number already used.
 */
export async function up(knex: Knex): Promise<void> {
  const [rows] = await knex.raw('SELECT MAX(CAST(SUBSTRING(number, 4) AS UNSIGNED)) AS n FROM orders');
  const next = Math.max(Number((rows as { n: number | null }[])[0]?.n ?? 0) + 1, 1001);
  await knex.raw(`CREATE SEQUENCE order_numbers START WITH ${next} MINVALUE 1 INCREMENT BY 1 NOCACHE`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP SEQUENCE IF EXISTS order_numbers');
}
