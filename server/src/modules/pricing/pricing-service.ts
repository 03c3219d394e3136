import type { Db } from '../../db/knex.ts';
import { checkPricingRuleSet, type PricingRuleSet } from '../../engine/index.ts';
import type {
  PricingPreviewResponse,
  PricingRules,
  RuleSetDetailResponse,
  RuleSetListResponse,
  UpdateDraftRequest,
} from '../../contracts/admin-pricing.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import {
  findPublishedRules,
  findRuleSet,
  insertDraft,
  listRuleSets,
  lockRuleSets,
  publishDraft,
  readGarmentLabels,
  readRecentQuotes,
  updateDraftRules,
} from './pricing-rule-set-repo.ts';
import { chooseSampleQuotes, compareSample } from './pricing-samples.ts';
import { shippingRatesOf } from '../settings/shipping-settings-service.ts';

/** How many recent quotes the samples are chosen from. */
const sampleWindow = 30;

/** The engine's own check, as a 400 naming the rules when it fails. */
function checkRules(ruleSet: PricingRuleSet): Result<PricingRuleSet> {
  const check = checkPricingRuleSet(ruleSet);
  return check.ok ? ok(ruleSet) : failure('invalid', check.reason, { rules: check.reason });
}

const withVersion = (rules: PricingRules, version: number): PricingRuleSet => ({ version, ...rules });
const withoutVersion = ({ version: _version, ...rules }: PricingRuleSet): PricingRules => rules;

/**
 * Versioned price lists. A draft is edited in place; publishing retires the published version and publishes the
 * draft in one transaction. Quotes keep the id of the version they were priced with, so old quotes never change.
 */
export function createPricingService(deps: { db: Db; now: () => Date }) {
  const { db } = deps;

  async function list(user: CurrentUser): Promise<RuleSetListResponse> {
    const records = await listRuleSets(db);
    return { ruleSets: records.map(({ rules: _rules, ...summary }) => summary), canEdit: user.role === 'owner' };
  }

  async function get(id: number): Promise<Result<RuleSetDetailResponse>> {
    const record = await findRuleSet(db, id);
    if (!record) return failure('not-found', `There is no price list ${id}.`);
    return ok({ ruleSet: { ...record, rules: withoutVersion(record.rules) } });
  }

  /** A new draft copied from the published version; there is at most one draft at a time. */
  async function startDraft(user: CurrentUser): Promise<Result<RuleSetDetailResponse>> {
    const id = await db.transaction(async (trx) => {
      const all = await lockRuleSets(trx);
      const draft = all.find((ruleSet) => ruleSet.status === 'draft');
      if (draft)
        return failure('conflict', `Version ${draft.version} is already a draft: edit that one, or publish it first.`);
      const published = all.find((ruleSet) => ruleSet.status === 'published');
      if (!published) return failure('conflict', 'There is no published price list to start a draft from.');
      const version = Math.max(...all.map((ruleSet) => ruleSet.version)) + 1;
      return ok(
        await insertDraft(trx, {
          rules: { ...published.rules, version },
          notes: null,
          createdByUserId: user.id,
          now: deps.now(),
        }),
      );
    });
    return id.ok ? get(id.value) : id;
  }

  async function updateDraft(id: number, request: UpdateDraftRequest): Promise<Result<RuleSetDetailResponse>> {
    const saved = await db.transaction(async (trx) => {
      const target = (await lockRuleSets(trx)).find((ruleSet) => ruleSet.id === id);
      if (!target) return failure('not-found', `There is no price list ${id}.`);
      if (target.status !== 'draft')
        return failure(
          'conflict',
          `Version ${target.version} is ${target.status}; only a draft can be changed. Start a new draft instead.`,
        );
      const checked = checkRules(withVersion(request.rules, target.version));
      if (!checked.ok) return checked;
      await updateDraftRules(trx, id, { rules: checked.value, notes: request.notes || null, now: deps.now() });
      return ok(id);
    });
    return saved.ok ? get(id) : saved;
  }

  async function publish(id: number): Promise<Result<RuleSetDetailResponse>> {
    const published = await db.transaction(async (trx) => {
      const target = (await lockRuleSets(trx)).find((ruleSet) => ruleSet.id === id);
      if (!target) return failure('not-found', `There is no price list ${id}.`);
      if (target.status !== 'draft')
        return failure('conflict', `Version ${target.version} is ${target.status}; only a draft can be published.`);
      const checked = checkRules(target.rules);
      if (!checked.ok) return checked;
      await publishDraft(trx, id, deps.now());
      return ok(id);
    });
    return published.ok ? get(id) : published;
  }

  /** Three recent stored quotes priced with the published list and with these (unsaved) rules. Reads only. */
  async function preview(rules: PricingRules): Promise<Result<PricingPreviewResponse>> {
    const published = await findPublishedRules(db);
    if (!published) return failure('conflict', 'There is no published price list to compare with.');
    const draft = checkRules(withVersion(rules, published.version + 1));
    if (!draft.ok) return draft;
    const samples = chooseSampleQuotes(await readRecentQuotes(db, sampleWindow));
    const labels = await readGarmentLabels(db, [...new Set(samples.map((sample) => sample.input.garment))]);
    const rates = await shippingRatesOf(db);
    return ok({
      currency: published.currency,
      publishedVersion: published.version,
      samples: samples.map((sample) => compareSample(sample, published, draft.value, labels, rates)),
    });
  }

  return { list, get, startDraft, updateDraft, publish, preview };
}

export type PricingService = ReturnType<typeof createPricingService>;
