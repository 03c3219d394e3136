/** Priya (a demo customer) ordering her saved designs: the steps several API tests share. */
import { shipToByCustomer } from '../../seeds/data/orders.ts';
import { storedQuoteResponse } from '../../server/src/contracts/stored-quotes.ts';
import { savedDesignResponse } from '../../server/src/contracts/saved-designs.ts';
import type { ApiAgent } from './api-harness.ts';

/** Priya's seeded address, as the checkout form sends it. */
export const priyaShipTo = shipToByCustomer.priya;

/** One of the signed-in customer's saved designs as it is, as the body that prices it (and names it). */
export async function savedDesignQuoteBody(
  agent: ApiAgent,
  designId = 1,
  changes: { shippingMethod?: 'delivery' | 'pickup' } = {},
) {
  const { design } = savedDesignResponse.parse((await agent.get(`/api/designs/${designId}`).expect(200)).body);
  return {
    garmentId: design.garmentId,
    sizeId: design.sizeId,
    colourId: design.colourId,
    quantity: 1,
    isRush: false,
    document: design.document,
    designId,
    ...changes,
  };
}

/** Prices one of the signed-in customer's saved designs as it is and stores the quote. */
export async function quoteSavedDesign(
  agent: ApiAgent,
  designId = 1,
  changes: { shippingMethod?: 'delivery' | 'pickup' } = {},
) {
  const body = await savedDesignQuoteBody(agent, designId, changes);
  return storedQuoteResponse.parse((await agent.post('/api/quotes').send(body).expect(201)).body);
}

/** Pays on the payment stand-in's hosted page with a test card; resolves with the page's HTTP status. */
export async function payWithTestCard(checkoutUrl: string, cardNumber = '4242 4242 4242 4242'): Promise<number> {
  const form = new URLSearchParams({ card_number: cardNumber, expiry: '12/30', cvc: '123', name: 'Priya Castellanos' });
  const response = await fetch(checkoutUrl, { method: 'POST', body: form, redirect: 'manual' });
  await response.arrayBuffer();
  return response.status;
}
