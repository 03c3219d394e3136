import type { Knex } from 'knex';

/**
 * The abuse limits' counters, in the database so every server instance counts the same requests. The shape is the
 * one rate-limiter-flexible's MySQL store reads and writes (`key`, `points`, `expire` in epoch milliseconds); the
 * app tells the store the table exists, so only this migration creates it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('rate_limits', (t) => {
    t.engine('InnoDB');
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire').unsigned().nullable();
    t.index(['expire'], 'rate_limits_expire_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rate_limits');
}
