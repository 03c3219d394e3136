import { fail, type EngineResult } from './engine-result.ts';
import type { GuidanceMessage } from './guidance.ts';
import { isNonNegativeNumber, isRecord } from './input-checks.ts';

/**
 * Under 3 years is where small-parts rules start: US 16 CFR 1501 bans small parts in articles for children
 * under 3 (clothing itself is exempt by §1501.3(d); cautioning about detachable trims is common practice, no source).
 */
const SMALL_PARTS_AGE_LIMIT_MONTHS = 36;

/** Where on a garment ribbon ties or drawstrings are. */
export type CordPlace = 'hood' | 'neck' | 'waist';
/** How a garment fastens. */
export type GarmentClosure = 'none' | 'snaps' | 'buttons' | 'hook_and_loop' | 'ties' | 'zip';

export interface GarmentCautionInput {
  /** The wearer's age in months, when known: the youngest the chosen size is made for. */
  wearerAgeMonths?: number;
  /** Buttons, beads, bows, appliqué pieces: anything on the design that could come off. */
  hasDetachableEmbellishments: boolean;
  /** The garment is sold or described as sleepwear (pyjamas, nightgowns, sleep sacks). */
  isSleepwear: boolean;
  /** Where the garment has ribbon ties (a bonnet's under the chin is `neck`). */
  tiePlaces: readonly CordPlace[];
  /** Where the garment has drawstrings (a cord pulled through a channel to gather it). */
  drawstringPlaces: readonly CordPlace[];
  closure: GarmentClosure;
  /** The fastening goes round the neck (a bib's snap, a bonnet's ties). */
  closesAtNeck: boolean;
}

const cordPlaces: readonly CordPlace[] = ['hood', 'neck', 'waist'];
const closures: readonly GarmentClosure[] = ['none', 'snaps', 'buttons', 'hook_and_loop', 'ties', 'zip'];
const isPlaceList = (value: unknown) =>
  Array.isArray(value) && value.every((place) => cordPlaces.includes(place as CordPlace));

/** What fastens round the neck, in words after "fastens round the neck". */
const neckFastening: Record<GarmentClosure, string> = {
  none: '',
  snaps: ' with a snap',
  buttons: ' with a button',
  hook_and_loop: ' with a hook-and-loop tab',
  ties: ' with ties',
  zip: ' with a zip',
};
const severityOrder = { warning: 0, caution: 1, info: 2 } as const;

/**
 * Safety cautions for an embroidered children's garment, as messages the apps show. They are guidance only:
 * they point to the rules that may apply (US examples, from CPSC pages) and never state that a garment complies.
 * Hazards come first (warnings, then cautions, then good practice); the message deferring to local regulations is
 * always included, last.
 */
export function garmentCautions(input: GarmentCautionInput): EngineResult<{ messages: GuidanceMessage[] }> {
  if (!isRecord(input)) return fail('The garment details are missing.');
  const { wearerAgeMonths, hasDetachableEmbellishments, isSleepwear, tiePlaces, drawstringPlaces } = input;
  if (wearerAgeMonths !== undefined && !isNonNegativeNumber(wearerAgeMonths))
    return fail('The age must be a number of months, 0 or more.');
  if (
    typeof hasDetachableEmbellishments !== 'boolean' ||
    typeof isSleepwear !== 'boolean' ||
    typeof input.closesAtNeck !== 'boolean' ||
    !isPlaceList(tiePlaces) ||
    !isPlaceList(drawstringPlaces) ||
    !closures.includes(input.closure)
  ) {
    return fail(
      'Say whether the garment has detachable trims, is sleepwear, where it has ties or drawstrings, and how it fastens.',
    );
  }
  const isUnderThree = wearerAgeMonths !== undefined && wearerAgeMonths < SMALL_PARTS_AGE_LIMIT_MONTHS;
  const messages: GuidanceMessage[] = [];

  if (hasDetachableEmbellishments && wearerAgeMonths === undefined) {
    messages.push({
      code: 'caution.small-parts',
      severity: 'caution',
      title: 'Small parts and young children',
      text: 'Buttons, beads, bows, appliqué pieces and other trims that could come off are a choking hazard for children under 3. If this garment may be worn by a child that young, leave them off.',
      appliesWhen: 'Detachable trims, wearer’s age not given',
    });
  } else if (hasDetachableEmbellishments && isUnderThree) {
    messages.push({
      code: 'caution.small-parts',
      severity: 'warning',
      title: 'Choking hazard',
      text: 'Buttons, beads, bows, appliqué pieces and other trims that could come off are a choking hazard for children under 3. Leave them off this garment. In the US, small-parts rules for young children are in 16 CFR 1501.',
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
  // 16 CFR 1615 (sizes 0–6X) and 1616 (7–14) set the flammability of children's sleepwear; garments for babies of
  // 9 months and under are exempt, as are tight-fitting ones (from memory: check the CPSC's pages for the detail).
  if (isSleepwear) {
    messages.push({
      code: 'caution.sleepwear',
      severity: 'warning',
      title: 'Children’s sleepwear has fire-safety rules',
      text: 'In many countries children’s sleepwear must be flame resistant or tight-fitting, and that covers the fabric, thread and trims. Do not sell an embroidered garment as sleepwear unless the garment and the embroidery meet those rules. In the US they are 16 CFR 1615 and 1616.',
      appliesWhen: 'A garment sold or described as sleepwear',
    });
  }
  // ASTM F1816 (children's upper outerwear, sizes 2T to 16): no drawstrings at the hood or neck; waist and bottom
  // drawstrings at most 3 in (75 mm) outside the channel when flat, no toggles or knots, tacked at the middle.
  // The CPSC lists the hood and neck drawstrings as a substantial product hazard in 16 CFR 1120 (from memory).
  if (drawstringPlaces.some((place) => place !== 'waist')) {
    messages.push({
      code: 'caution.drawstring',
      severity: 'warning',
      title: 'Drawstrings at the hood or neck',
      text: 'Drawstrings at the hood or neck of children’s tops and outerwear can catch and strangle. Remove them or choose another garment. In the US, the CPSC treats them as a substantial product hazard (16 CFR 1120; ASTM F1816).',
      appliesWhen: 'A hood or neck drawstring on a child’s garment',
    });
  }
  if (drawstringPlaces.includes('waist')) {
    messages.push({
      code: 'caution.waist-drawstring',
      severity: 'caution',
      title: 'Drawstring at the waist',
      text: 'A drawstring at the waist can catch on slides, car doors and bus doors. It should be stitched to the garment at its middle, have no knots or toggles at its ends, and show no more than 3 inches (75 mm) outside the channel when the garment lies flat. In the US, ASTM F1816 asks this of children’s tops and outerwear.',
      appliesWhen: 'A waist drawstring on a child’s garment',
    });
  }
  // Ties are not drawstrings, so F1816 does not name them; the care below is common practice, no source.
  const tiedAt = tiePlaces.filter((place) => place !== 'waist');
  if (tiedAt.length > 0) {
    messages.push({
      code: 'caution.neck-ties',
      severity: 'caution',
      title: tiedAt.includes('neck') ? 'Ribbon ties under the chin' : 'Ribbon ties at the hood',
      text: `This garment ties ${tiedAt.includes('neck') ? 'under the chin' : 'at the hood'} with ribbons. Tie them in a bow, keep the loose ends short, and take the garment off before naps and sleep and whenever your child is not watched: anything tied round a child’s neck can catch and strangle.`,
      appliesWhen: 'Ribbon ties at the hood or neck',
    });
  }
  // A bib's neck fastening: take it off for sleep and stay near is the usual label wording (common practice, no source).
  if (input.closesAtNeck && !tiePlaces.includes('neck')) {
    messages.push({
      code: 'caution.neck-closure',
      severity: 'caution',
      title: 'Fastens round the neck',
      text: `This garment fastens round the neck${neckFastening[input.closure]}. Put it on only while your child is awake and watched, take it off before naps and sleep, and check the fastening holds each time.`,
      appliesWhen: 'A fastening round the neck',
    });
  }
  messages.sort((a, b) => severityOrder[a.severity] - severityOrder[b.severity]);
  messages.push({
    code: 'caution.local-rules',
    severity: 'info',
    title: 'Check the rules where you sell',
    text: 'These notes are general guidance, not a safety test or a legal review, and they do not certify this garment. Rules for children’s products differ by country; check the ones that apply where you sell (in the US, the Consumer Product Safety Commission publishes them).',
    appliesWhen: 'Always',
  });
  return { ok: true, messages };
}

/** Whether any of the messages is more than good practice: checkout asks the customer to read these first. */
export const needsSafetyAcknowledgement = (messages: readonly GuidanceMessage[]) =>
  messages.some((message) => message.severity !== 'info');

/** A garment's safety facts as the catalogue keeps them. */
export interface GarmentSafetyFactsInput {
  tiePlaces: readonly CordPlace[];
  drawstringPlaces: readonly CordPlace[];
  closure: GarmentClosure;
  closesAtNeck: boolean;
  intendedUse: 'day_wear' | 'sleepwear';
}

/**
 * The cautions for a catalogue garment worn by the youngest child a size is made for (months), with or without
 * trims on the design that could come off: the one reading of the catalogue's facts the garment page, the quote,
 * checkout, the proof and the production sheet share.
 */
export function cautionsForGarment(
  facts: GarmentSafetyFactsInput,
  youngestMonths: number,
  hasDetachableEmbellishments: boolean,
): EngineResult<{ messages: GuidanceMessage[] }> {
  if (!isRecord(facts)) return fail('The garment details are missing.');
  return garmentCautions({
    wearerAgeMonths: youngestMonths,
    hasDetachableEmbellishments,
    isSleepwear: facts.intendedUse === 'sleepwear',
    tiePlaces: facts.tiePlaces,
    drawstringPlaces: facts.drawstringPlaces,
    closure: facts.closure,
    closesAtNeck: facts.closesAtNeck,
  });
}
