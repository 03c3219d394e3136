import type { Knex } from 'knex';
import { userIds } from './data/accounts.ts';
import { pricingRuleSets } from './data/pricing.ts';
import { at } from './data/seed-time.ts';

export async function seed(knex: Knex): Promise<void> {
  await knex('pricing_rule_sets').insert(
    pricingRuleSets.map((ruleSet) => ({
      id: ruleSet.id,
      version: ruleSet.rules.version,
      currency: ruleSet.rules.currency,
      rules: JSON.stringify(ruleSet.rules),
      status: ruleSet.status,
      notes: ruleSet.notes,
      published_at: ruleSet.publishedAt ? at(ruleSet.publishedAt) : null,
      created_by_user_id: userIds.marigold,
      created_at: at(ruleSet.createdAt),
      updated_at: at(ruleSet.publishedAt ?? ruleSet.createdAt),
    })),
  );
}
