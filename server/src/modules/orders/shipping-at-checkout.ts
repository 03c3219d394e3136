/** The checkout's rule for the shipping method: the one the quote priced, and one the shop still offers. */
import type { ShippingMethod } from '../../contracts/shipping.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { shippingMethodInWords, shippingRefusal, type ShippingRates } from '../../engine/index.ts';
import type { StoredQuote } from '../quotes/stored-quote-service.ts';

/**
 * The method the order ships by. Refused when the shop no longer offers it (422, naming what it offers instead), and
 * when the quote was priced for another method or before shipping was quoted (409: price it again), so the order's
 * shipping is always the server's own figure from the quote.
 */
export function checkShippingChoice(
  quote: Pick<StoredQuote, 'shippingMethod'>,
  asked: ShippingMethod | undefined,
  rates: ShippingRates | undefined,
): Result<ShippingMethod> {
  const method = asked ?? quote.shippingMethod;
  if (method === null) {
    return failure('conflict', 'This price was worked out before delivery was priced. Price the design again.', {
      quoteId: 'Price your design again before ordering',
    });
  }
  const refusal = shippingRefusal(rates, method);
  if (refusal) return failure('unprocessable', refusal, { shippingMethod: refusal });
  if (method !== quote.shippingMethod) {
    const priced = shippingMethodInWords(quote.shippingMethod ?? 'delivery');
    return failure(
      'conflict',
      `This price was worked out for ${priced}. Price it again with ${shippingMethodInWords(method)}.`,
      { shippingMethod: 'Price your order again with this choice' },
    );
  }
  return ok(method);
}
