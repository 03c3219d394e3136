import { describe, expect, it } from 'vitest';
import {
  adviseStabilizer,
  garmentCautions,
  needsSafetyAcknowledgement,
  type GuidanceMessage,
  type StabilizerInput,
} from '../../../server/src/engine/index.ts';

// 50 × 40 mm = 20 cm²: 300 stitches is 15 per cm² (airy), 1,000 is 50 (medium), 2,400 is 120 (dense).
const design = { widthMm: 50, heightMm: 40, isNapped: false };

function backingFor(stitches: number, fabric: StabilizerInput['fabric']) {
  const advice = adviseStabilizer({ ...design, stitches, fabric });
  if (!advice.ok) throw new Error(advice.reason);
  return [advice.density, advice.backing];
}

/** Every message reads as plain guidance and never claims that something complies or is certified as safe. */
function expectPlainGuidance(messages: GuidanceMessage[]) {
  for (const message of messages) {
    expect(['info', 'caution', 'warning']).toContain(message.severity);
    expect(message.title.length).toBeGreaterThan(3);
    expect(message.appliesWhen.length).toBeGreaterThan(3);
    expect(message.text).not.toMatch(/\b(complies|compliant|certified|guaranteed safe)\b/i);
  }
}

describe('adviseStabilizer', () => {
  it('when the fabric is woven, then density picks wash-away, tear-away or cut-away backing', () => {
    expect(backingFor(300, 'woven')).toEqual(['airy', 'water-soluble-adhesive']);
    expect(backingFor(1000, 'woven')).toEqual(['medium', 'tearaway']);
    expect(backingFor(2400, 'woven')).toEqual(['dense', 'cutaway-adhesive']);
  });

  it('when the fabric is a knit, then it is cut-away whatever the density; sheer fabric gets no-show mesh', () => {
    expect(backingFor(300, 'knit')[1]).toBe('cutaway');
    expect(backingFor(2400, 'knit')[1]).toBe('cutaway');
    expect(backingFor(1000, 'sheer')[1]).toBe('no-show-mesh');
  });

  it('when the fabric is napped or the wearer is a baby, then topping and a soft back cover are added', () => {
    const advice = adviseStabilizer({
      ...design,
      stitches: 1000,
      fabric: 'knit',
      isNapped: true,
      isForBabyOrToddler: true,
    });
    expect(advice.ok).toBe(true);
    if (!advice.ok) return;
    expect(advice.densityStitchesPerCm2).toBe(50);
    expect(advice.topping).toBe('water-soluble');
    expect(advice.messages.map((m) => m.code)).toEqual([
      'stabilizer.cutaway',
      'stabilizer.water-soluble-topping',
      'stabilizer.soft-back-cover',
    ]);
    expectPlainGuidance(advice.messages);
  });

  it('when a dense design goes on sheer fabric, then a caution is added', () => {
    const advice = adviseStabilizer({ ...design, stitches: 2400, fabric: 'sheer' });
    expect(advice.ok && advice.messages.map((m) => [m.code, m.severity])).toContainEqual([
      'stabilizer.dense-on-sheer',
      'caution',
    ]);
  });

  it.each([
    ['an unknown fabric', { ...design, stitches: 100, fabric: 'felt' }],
    ['a zero-width design', { ...design, widthMm: 0, stitches: 100, fabric: 'woven' }],
    [
      'crossed thresholds',
      {
        ...design,
        stitches: 100,
        fabric: 'woven',
        thresholds: { airyBelowStitchesPerCm2: 90, denseAboveStitchesPerCm2: 20 },
      },
    ],
  ])('when given %s, then it fails with a reason', (_, input) => {
    expect(adviseStabilizer(input as StabilizerInput).ok).toBe(false);
  });
});

describe('garmentCautions', () => {
  const plain = {
    hasDetachableEmbellishments: false,
    isSleepwear: false,
    tiePlaces: [],
    drawstringPlaces: [],
    closure: 'none',
    closesAtNeck: false,
  } as const;

  it('when nothing applies, then only the note to check local rules is shown', () => {
    const result = garmentCautions({ ...plain, wearerAgeMonths: 60 });
    expect(result.ok && result.messages.map((m) => m.code)).toEqual(['caution.local-rules']);
    expect(result.ok && result.messages[0].text).toMatch(/not a safety test or a legal review/);
  });

  it('when a garment for an 18-month-old has detachable trims, then a choking-hazard warning and thread-end advice appear', () => {
    const result = garmentCautions({ ...plain, wearerAgeMonths: 18, hasDetachableEmbellishments: true });
    expect(result.ok && result.messages.map((m) => [m.code, m.severity])).toEqual([
      ['caution.small-parts', 'warning'],
      ['caution.thread-ends', 'info'],
      ['caution.local-rules', 'info'],
    ]);
  });

  it('when the age is unknown, then detachable trims get a caution rather than a warning', () => {
    const result = garmentCautions({ ...plain, hasDetachableEmbellishments: true });
    expect(result.ok && result.messages[0]).toMatchObject({ code: 'caution.small-parts', severity: 'caution' });
  });

  it('when the garment is sleepwear with a hood drawstring, then both warnings appear and defer to the rules', () => {
    const result = garmentCautions({ ...plain, wearerAgeMonths: 72, isSleepwear: true, drawstringPlaces: ['hood'] });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.messages.map((m) => [m.code, m.severity])).toEqual([
      ['caution.sleepwear', 'warning'],
      ['caution.drawstring', 'warning'],
      ['caution.local-rules', 'info'],
    ]);
    expectPlainGuidance(result.messages);
  });

  it('when a bonnet for a 0-month-old ties under the chin, then the ties caution comes first and the fastening is not cautioned twice', () => {
    const result = garmentCautions({
      ...plain,
      wearerAgeMonths: 0,
      tiePlaces: ['neck'],
      closure: 'ties',
      closesAtNeck: true,
    });
    expect(result.ok && result.messages.map((m) => [m.code, m.severity])).toEqual([
      ['caution.neck-ties', 'caution'],
      ['caution.thread-ends', 'info'],
      ['caution.local-rules', 'info'],
    ]);
    expect(result.ok && result.messages[0]!.title).toBe('Ribbon ties under the chin');
    expect(result.ok && needsSafetyAcknowledgement(result.messages)).toBe(true);
  });

  it('when a bib snaps round the neck, then the neck-fastening caution names the snap', () => {
    const result = garmentCautions({ ...plain, wearerAgeMonths: 6, closure: 'snaps', closesAtNeck: true });
    expect(result.ok && result.messages[0]).toMatchObject({ code: 'caution.neck-closure', severity: 'caution' });
    expect(result.ok && result.messages[0]!.text).toMatch(/^This garment fastens round the neck with a snap\./);
  });

  it('when a drawstring is only at the waist, then it is a caution with the length limit, not the hood and neck warning', () => {
    const result = garmentCautions({ ...plain, wearerAgeMonths: 48, drawstringPlaces: ['waist'] });
    expect(result.ok && result.messages.map((m) => m.code)).toEqual([
      'caution.waist-drawstring',
      'caution.local-rules',
    ]);
    // ASTM F1816: at most 3 in (75 mm) outside the channel, from memory.
    expect(result.ok && result.messages[0]!.text).toMatch(/3 inches \(75 mm\)/);
  });

  it('when only good practice applies, then no acknowledgement is needed', () => {
    const result = garmentCautions({ ...plain, wearerAgeMonths: 6 });
    expect(result.ok && needsSafetyAcknowledgement(result.messages)).toBe(false);
  });

  it('when the age is negative or a flag is missing, then it fails with a reason', () => {
    expect(garmentCautions({ ...plain, wearerAgeMonths: -1 }).ok).toBe(false);
    expect(garmentCautions({ hasDetachableEmbellishments: true } as never).ok).toBe(false);
    expect(garmentCautions({ ...plain, tiePlaces: ['sleeve'] } as never).ok).toBe(false);
  });
});
