import type { Knex } from 'knex';
import { addCurrency, addTimestamps, useTableDefaults } from './support/columns.ts';

export async function up(knex: Knex): Promise<void> {
  // Price lists are versioned and never edited once published: a quote points at the version it was priced with,
  // and a new price list is a new draft version that is published in turn.
  await knex.schema.createTable('pricing_rule_sets', (t) => {
    useTableDefaults(t);
    t.increments('id');
    t.integer('version').unsigned().notNullable().unique();
    addCurrency(t, 'pricing_rule_sets');
    // The engine's PricingRuleSet (server/src/engine), all amounts in minor units.
    t.json('rules').notNullable();
    t.enum('status', ['draft', 'published', 'retired']).notNullable().defaultTo('draft');
    t.text('notes').nullable();
    t.datetime('published_at', { precision: 3 }).nullable();
    t.integer('created_by_user_id').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    addTimestamps(knex, t);
    // 1 for the published version, NULL otherwise: the unique key allows at most one published price list.
    t.specificType('published_slot', "TINYINT UNSIGNED AS (IF(`status` = 'published', 1, NULL)) PERSISTENT");
    t.unique(['published_slot'], { indexName: 'pricing_rule_sets_one_published' });
    t.index(['status', 'version'], 'pricing_rule_sets_status_index');
    t.check('`version` >= 1', [], 'pricing_rule_sets_version_positive');
    t.check("(`status` = 'draft') = (`published_at` IS NULL)", [], 'pricing_rule_sets_published_at');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('pricing_rule_sets');
}
