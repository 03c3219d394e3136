import type { ApiAgent } from './api-harness.ts';
import { priyaShipTo, quoteSavedDesign } from './priya-orders.ts';

/** Priya's seeded address, as the checkout form sends it. */
export const priyasShipTo = priyaShipTo;

/**
 * A fresh stored quote for Priya's seeded design 1 (the agent must be signed in as Priya), and the checkout body that
 * orders it for a regular date.
 */
export async function priyasCheckout(agent: ApiAgent) {
  const quote = await quoteSavedDesign(agent);
  return { quote, body: { quoteId: quote.quoteId, designId: 1, neededBy: '2026-12-18', shipTo: priyasShipTo } };
}
