import type { Knex } from 'knex';
import { addTimestamps, useTableDefaults } from './support/columns.ts';

/**
 * Work done after a request, kept in the database: a job is written in the transaction of the change that causes
 * it, claimed by one worker at a time (`FOR UPDATE SKIP LOCKED`), retried with a growing delay and marked done or
 * failed with its reason. A lease row per scheduled task lets exactly one instance run it each period. E-mails
 * become such jobs, so the outbox gains "retrying" and counts its attempts.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('jobs', (t) => {
    useTableDefaults(t);
    t.bigIncrements('id');
    t.string('kind', 60).notNullable();
    t.json('payload').notNullable();
    t.enum('status', ['queued', 'running', 'done', 'failed']).notNullable().defaultTo('queued');
    t.smallint('attempts').unsigned().notNullable().defaultTo(0);
    t.smallint('max_attempts').unsigned().notNullable().defaultTo(5);
    t.datetime('run_after', { precision: 3 }).notNullable();
    t.string('claimed_by', 100).nullable();
    t.datetime('claimed_until', { precision: 3 }).nullable();
    t.text('last_error').nullable();
    t.datetime('finished_at', { precision: 3 }).nullable();
    addTimestamps(knex, t);
    t.index(['status', 'run_after'], 'jobs_due_index');
  });
  await knex.schema.createTable('job_leases', (t) => {
    useTableDefaults(t);
    t.string('name', 60).primary();
    t.string('holder', 100).notNullable();
    t.datetime('lease_until', { precision: 3 }).notNullable();
    t.datetime('last_run_at', { precision: 3 }).nullable();
  });
  await knex.raw(
    "ALTER TABLE email_log MODIFY status ENUM('queued', 'retrying', 'sent', 'failed') NOT NULL DEFAULT 'queued'",
  );
  await knex.schema.alterTable('email_log', (t) => {
    t.smallint('attempts').unsigned().notNullable().defaultTo(0);
    t.datetime('next_attempt_at', { precision: 3 }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('email_log', (t) => {
    t.dropColumn('attempts');
    t.dropColumn('next_attempt_at');
  });
  await knex('email_log').where({ status: 'retrying' }).update({ status: 'queued' });
  await knex.raw("ALTER TABLE email_log MODIFY status ENUM('queued', 'sent', 'failed') NOT NULL DEFAULT 'queued'");
  await knex.schema.dropTable('job_leases');
  await knex.schema.dropTable('jobs');
}
