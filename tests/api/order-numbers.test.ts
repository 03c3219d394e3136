import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkoutStartedResponse } from '../../server/src/contracts/orders.ts';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { priyaShipTo, quoteSavedDesign } from '../support/priya-orders.ts';

let harness: PaymentHarness;
beforeAll(async () => {
  harness = await startPaymentHarness();
});
afterAll(async () => {
  await harness.close();
});

describe('order numbers', () => {
  it('when six customers check out at once, then each order gets its own number after the demo orders, none waiting on a table lock', async () => {
    const agent = await signedInAgent(harness, 'priya@example.test');
    const quotes = await Promise.all(Array.from({ length: 6 }, () => quoteSavedDesign(agent)));
    const placed = await Promise.all(
      quotes.map((quote) =>
        agent
          .post('/api/orders')
          .send({ quoteId: quote.quoteId, designId: 1, neededBy: '2026-12-18', shipTo: priyaShipTo })
          .expect(201),
      ),
    );
    const numbers = placed.map((res) => checkoutStartedResponse.parse(res.body).number);
    expect(new Set(numbers).size).toBe(6);
    // The seeded demo shop's orders run to WB-1013; the sequence continues after them.
    const values = numbers.map((number) => Number(number.slice(3))).sort((a, b) => a - b);
    expect(values[0]).toBe(1014);
    expect(numbers.every((number) => /^WB-\d{4}$/.test(number))).toBe(true);
  });
});
