import { shipToByCustomer } from '../../seeds/data/orders.ts';
import { storedQuoteResponse } from '../../server/src/contracts/stored-quotes.ts';
import { savedDesignResponse } from '../../server/src/contracts/saved-designs.ts';
import type { ApiAgent } from './api-harness.ts';

/** Priya's seeded address, as the checkout form sends it. */
export const priyasShipTo = shipToByCustomer.priya;

/**
 * A fresh stored quote for Priya's seeded design 1 (the agent must be signed in as Priya), and the checkout body that
 * orders it for a regular date.
 */
export async function priyasCheckout(agent: ApiAgent) {
  const { design } = savedDesignResponse.parse((await agent.get('/api/designs/1').expect(200)).body);
  const quote = storedQuoteResponse.parse(
    (
      await agent
        .post('/api/quotes')
        .send({
          garmentId: design.garmentId,
          sizeId: design.sizeId,
          colourId: design.colourId,
          quantity: 1,
          isRush: false,
          document: design.document,
          designId: 1,
        })
        .expect(201)
    ).body,
  );
  return { quote, body: { quoteId: quote.quoteId, designId: 1, neededBy: '2026-12-18', shipTo: priyasShipTo } };
}
