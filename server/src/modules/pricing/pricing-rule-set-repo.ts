import type { Knex } from 'knex';
import type { Db } from '../../db/knex.ts';
import type { PricingRuleSet } from '../../engine/index.ts';
import type { RuleSetSummary } from '../../contracts/admin-pricing.ts';

type Conn = Db | Knex.Transaction;

export interface RuleSetRecord extends RuleSetSummary {
  rules: PricingRuleSet;
}

const iso = (value: Date | string | null): string | null => (value === null ? null : new Date(value).toISOString());

function toRecord(row: Record<string, any>): RuleSetRecord {
  return {
    id: row.id,
    version: row.version,
    status: row.status,
    currency: row.currency,
    notes: row.notes,
    createdAt: iso(row.created_at)!,
    updatedAt: iso(row.updated_at)!,
    publishedAt: iso(row.published_at),
    createdByName: row.created_by_name ?? null,
    quoteCount: Number(row.quote_count ?? 0),
    rules: row.rules as PricingRuleSet,
  };
}

function selectRuleSets(db: Conn) {
  return db('pricing_rule_sets as p')
    .leftJoin('users as u', 'u.id', 'p.created_by_user_id')
    .select(
      'p.*',
      'u.name as created_by_name',
      db.raw('(SELECT COUNT(*) FROM quotes q WHERE q.pricing_rule_set_id = p.id) as quote_count'),
    );
}

/** Every version, newest first. */
export async function listRuleSets(db: Conn): Promise<RuleSetRecord[]> {
  return (await selectRuleSets(db).orderBy('p.version', 'desc')).map(toRecord);
}

export async function findRuleSet(db: Conn, id: number): Promise<RuleSetRecord | undefined> {
  const row = await selectRuleSets(db).where('p.id', id).first();
  return row && toRecord(row);
}

/** Locks every version row until the transaction ends, so two publishes or drafts cannot interleave. */
export async function lockRuleSets(
  trx: Knex.Transaction,
): Promise<{ id: number; version: number; status: RuleSetSummary['status']; rules: PricingRuleSet }[]> {
  return trx('pricing_rule_sets').select('id', 'version', 'status', 'rules').orderBy('version').forUpdate();
}

export async function insertDraft(
  trx: Knex.Transaction,
  draft: { rules: PricingRuleSet; notes: string | null; createdByUserId: number; now: Date },
): Promise<number> {
  const [id] = await trx('pricing_rule_sets').insert({
    version: draft.rules.version,
    currency: draft.rules.currency,
    rules: JSON.stringify(draft.rules),
    status: 'draft',
    notes: draft.notes,
    created_by_user_id: draft.createdByUserId,
    created_at: draft.now,
    updated_at: draft.now,
  });
  return id;
}

export async function updateDraftRules(
  trx: Knex.Transaction,
  id: number,
  changes: { rules: PricingRuleSet; notes: string | null; now: Date },
): Promise<void> {
  await trx('pricing_rule_sets')
    .where({ id, status: 'draft' })
    .update({
      rules: JSON.stringify(changes.rules),
      currency: changes.rules.currency,
      notes: changes.notes,
      updated_at: changes.now,
    });
}

/** Retires the published version (it keeps its published_at) and publishes the draft; the one-published key holds. */
export async function publishDraft(trx: Knex.Transaction, id: number, now: Date): Promise<void> {
  await trx('pricing_rule_sets').where({ status: 'published' }).update({ status: 'retired', updated_at: now });
  await trx('pricing_rule_sets')
    .where({ id, status: 'draft' })
    .update({ status: 'published', published_at: now, updated_at: now });
}

export async function findPublishedRules(db: Conn): Promise<PricingRuleSet | undefined> {
  const row = await db('pricing_rule_sets').select('rules').where({ status: 'published' }).first();
  return row?.rules as PricingRuleSet | undefined;
}

/** A stored quote as the sample preview reprices it: its saved engine input and the names to show. */
export interface StoredQuoteRow {
  id: number;
  totalCents: number;
  designName: string | null;
  input: unknown;
}

export async function readRecentQuotes(db: Conn, limit: number): Promise<StoredQuoteRow[]> {
  const rows = await db('quotes as q')
    .leftJoin('designs as d', 'd.id', 'q.design_id')
    .select('q.id', 'q.total_cents', 'q.input', 'd.name as design_name')
    .orderBy([
      { column: 'q.created_at', order: 'desc' },
      { column: 'q.id', order: 'desc' },
    ])
    .limit(limit);
  return rows.map((row) => ({
    id: row.id,
    totalCents: Number(row.total_cents),
    designName: row.design_name,
    input: row.input,
  }));
}

/** Garment names and size labels by garment slug and size code, for the named garments. */
export async function readGarmentLabels(
  db: Conn,
  garmentSlugs: string[],
): Promise<Map<string, { name: string; sizeLabels: Map<string, string> }>> {
  const rows = await db('garment_sizes as s')
    .join('garments as g', 'g.id', 's.garment_id')
    .select('g.slug', 'g.name', 's.code', 's.label')
    .whereIn('g.slug', garmentSlugs);
  const labels = new Map<string, { name: string; sizeLabels: Map<string, string> }>();
  for (const row of rows) {
    const garment = labels.get(row.slug) ?? { name: row.name, sizeLabels: new Map() };
    garment.sizeLabels.set(row.code, row.label);
    labels.set(row.slug, garment);
  }
  return labels;
}
