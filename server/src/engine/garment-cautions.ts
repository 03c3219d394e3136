import { fail, type EngineResult } from './engine-result.ts';
import type { GuidanceMessage } from './guidance.ts';
import { isNonNegativeNumber, isRecord } from './input-checks.ts';

/**
 * Under 3 years is where small-parts rules start: US 16 CFR 1501 bans small parts in articles for children
 * under 3 (clothing itself is exempt by §1501.3(d); cautioning about detachable trims is common practice, no source).
 */
const SMALL_PARTS_AGE_LIMIT_MONTHS = 36;

export interface GarmentCautionInput {
  /** The wearer's age in months, when known. */
  wearerAgeMonths?: number;
  /** Buttons, beads, rhinestones, appliqué pieces, bows: anything that could come off. */
  hasDetachableEmbellishments: boolean;
  /** The garment is sold or described as sleepwear (pyjamas, nightgowns, sleep sacks). */
  isSleepwear: boolean;
  hasHoodOrNeckDrawstring: boolean;
}

/**
 * Safety cautions for an embroidered children's garment, as messages the apps show. They are guidance only:
 * they point to the rules that may apply (US examples, from CPSC pages) and never state that a garment complies.
 * The message deferring to local regulations is always included.
 */
export function garmentCautions(input: GarmentCautionInput): EngineResult<{ messages: GuidanceMessage[] }> {
  if (!isRecord(input)) return fail('The garment details are missing.');
  const { wearerAgeMonths, hasDetachableEmbellishments, isSleepwear, hasHoodOrNeckDrawstring } = input;
  if (wearerAgeMonths !== undefined && !isNonNegativeNumber(wearerAgeMonths))
    return fail('The age must be a number of months, 0 or more.');
  if (
    typeof hasDetachableEmbellishments !== 'boolean' ||
    typeof isSleepwear !== 'boolean' ||
    typeof hasHoodOrNeckDrawstring !== 'boolean'
  ) {
    return fail('Say whether the garment has detachable trims, is sleepwear, and has a hood or neck drawstring.');
  }
  const isUnderThree = wearerAgeMonths !== undefined && wearerAgeMonths < SMALL_PARTS_AGE_LIMIT_MONTHS;
  const messages: GuidanceMessage[] = [];

  if (hasDetachableEmbellishments && wearerAgeMonths === undefined) {
    messages.push({
      code: 'caution.small-parts',
      severity: 'caution',
      title: 'Small parts and young children',
      text: 'Buttons, beads, rhinestones and other trims that could come off are a choking hazard for children under 3. If this garment may be worn by a child that young, leave them off.',
      appliesWhen: 'Detachable trims, wearer’s age not given',
    });
  } else if (hasDetachableEmbellishments && isUnderThree) {
    messages.push({
      code: 'caution.small-parts',
      severity: 'warning',
      title: 'Choking hazard',
      text: 'Buttons, beads, rhinestones and other trims that could come off are a choking hazard for children under 3. Leave them off this garment. In the US, small-parts rules for young children are in 16 CFR 1501.',
      appliesWhen: 'Detachable trims on a garment for a child under 3',
    });
  }
  if (isUnderThree) {
    messages.push({
      code: 'caution.thread-ends',
      severity: 'info',
      title: 'Secure thread ends',
      text: 'The embroidery itself is not a small part, but loose thread ends and trimmed jumps should be secured and cut close so little fingers cannot pull them.',
      appliesWhen: 'A garment for a child under 3',
    });
  }
  if (isSleepwear) {
    messages.push({
      code: 'caution.sleepwear',
      severity: 'warning',
      title: 'Children’s sleepwear has fire-safety rules',
      text: 'In many countries children’s sleepwear must be flame resistant or tight-fitting, and that covers the fabric, thread and trims. Do not sell an embroidered garment as sleepwear unless the garment and the embroidery meet those rules. In the US they are 16 CFR 1615 and 1616.',
      appliesWhen: 'A garment sold or described as sleepwear',
    });
  }
  if (hasHoodOrNeckDrawstring) {
    messages.push({
      code: 'caution.drawstring',
      severity: 'warning',
      title: 'Drawstrings at the hood or neck',
      text: 'Drawstrings at the hood or neck of children’s tops and outerwear can catch and strangle. Remove them or choose another garment. In the US, the CPSC treats them as a substantial product hazard (16 CFR 1120; ASTM F1816).',
      appliesWhen: 'A hood or neck drawstring on a child’s garment',
    });
  }
  messages.push({
    code: 'caution.local-rules',
    severity: 'info',
    title: 'Check the rules where you sell',
    text: 'These notes are general guidance, not a safety test or a legal review, and they do not certify this garment. Rules for children’s products differ by country; check the ones that apply where you sell (in the US, the Consumer Product Safety Commission publishes them).',
    appliesWhen: 'Always',
  });
  return { ok: true, messages };
}
