/** Which of the shop's shipping methods a quote prices, and the refusal for one the shop does not offer now. */
import { shippingRefusal, type ShippingMethodCode, type ShippingRates } from '../../engine/index.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';

/**
 * The method asked for when the shop offers it, or the first it offers (delivery, then pick-up) when none was asked
 * for. One the shop no longer offers is refused (422) with the way it does offer, so the customer can choose again.
 */
export function chooseShippingMethod(
  rates: ShippingRates,
  asked: ShippingMethodCode | undefined,
): Result<ShippingMethodCode> {
  if (asked === undefined) {
    const first = (['delivery', 'pickup'] as const).find((method) => rates[method].isOffered);
    return first
      ? ok(first)
      : failure('conflict', 'The studio has not set up delivery or pick-up yet, so orders cannot be priced.');
  }
  const refusal = shippingRefusal(rates, asked);
  return refusal ? failure('unprocessable', refusal, { shippingMethod: refusal }) : ok(asked);
}
