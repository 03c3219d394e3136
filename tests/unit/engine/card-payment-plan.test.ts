import { describe, expect, it } from 'vitest';
import { chargeStepOf, planCardPayment } from '../../../server/src/engine/card-payment-plan.ts';

// Card authorizations for online payments last 7 days (Stripe docs: place a hold on a payment method, from memory).
const DAY_MS = 86_400_000;
const dec3Noon = Date.parse('2026-12-03T18:00:00Z');

describe('planCardPayment', () => {
  it('when the work is due Dec 22 and a hold placed on Dec 3 ends Dec 10, then the card is kept for later instead', () => {
    // The case in the issue: usual ready date Dec 17, needed Dec 22, the hold shown ended Dec 10.
    const plan = planCardPayment({
      dueDate: '2026-12-22',
      nowMs: dec3Noon,
      holdWindowDays: 7,
      timeZone: 'America/Chicago',
    });
    expect(plan).toEqual({ method: 'saved_card', holdEndsOn: '2026-12-10' });
  });

  it.each([
    ['2026-12-09', 'hold'],
    ['2026-12-10', 'saved_card'],
    ['2026-12-17', 'saved_card'],
  ] as const)('when the work is due %s, then the card is taken as %s', (dueDate, method) => {
    expect(planCardPayment({ dueDate, nowMs: dec3Noon, holdWindowDays: 7, timeZone: 'America/Chicago' }).method).toBe(
      method,
    );
  });

  it('when the shop is in Chicago at 11 pm on Dec 3 (Dec 4 in UTC), then the hold ends on the shop’s Dec 10', () => {
    const lateEvening = Date.parse('2026-12-04T05:00:00Z');
    expect(
      planCardPayment({ dueDate: null, nowMs: lateEvening, holdWindowDays: 7, timeZone: 'America/Chicago' }),
    ).toEqual({
      method: 'hold',
      holdEndsOn: '2026-12-10',
    });
  });
});

describe('chargeStepOf', () => {
  const hold = (heldCents: number, endsInDays: number) => ({
    heldCents,
    captureBeforeMs: dec3Noon + endsInDays * DAY_MS,
  });

  it.each([
    ['the total equals the live hold', 5000, hold(5000, 2), false, { kind: 'capture', amountCents: 5000 }],
    [
      'the total fell below the live hold',
      4500,
      hold(5000, 2),
      true,
      { kind: 'capture_less', amountCents: 4500, heldCents: 5000 },
    ],
    [
      'the total grew past the hold and the card is kept',
      5600,
      hold(5000, 2),
      true,
      { kind: 'charge_saved_card', amountCents: 5600, why: 'more_than_held' },
    ],
    [
      'the hold lapsed and the card is kept',
      5000,
      hold(5000, -1),
      true,
      { kind: 'charge_saved_card', amountCents: 5000, why: 'hold_lapsed' },
    ],
    ['only a kept card', 5000, null, true, { kind: 'charge_saved_card', amountCents: 5000, why: 'saved' }],
    [
      'the hold lapsed and no card is kept',
      5000,
      hold(5000, -1),
      false,
      { kind: 'ask_customer', amountCents: 5000, why: 'hold_lapsed' },
    ],
    [
      'the total grew past the hold and no card is kept',
      5600,
      hold(5000, 2),
      false,
      { kind: 'ask_customer', amountCents: 5600, why: 'more_than_held' },
    ],
  ])('when %s, then the charge is %o', (_case, totalCents, held, hasSavedCard, expected) => {
    expect(chargeStepOf({ totalCents, hold: held, hasSavedCard, nowMs: dec3Noon })).toEqual(expected);
  });
});
