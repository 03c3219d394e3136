import { fail, type EngineResult } from './engine-result.ts';
import { isRecord, isWholeNumber } from './input-checks.ts';

/** How the parcel reaches the customer: posted to their address, or collected from the studio. */
export type ShippingMethodCode = 'delivery' | 'pickup';

/** The shop's shipping methods and rates, from its settings. All amounts are whole cents of the quote's currency. */
export interface ShippingRates {
  delivery: {
    isOffered: boolean;
    /** One charge per order, whatever it holds. */
    flatCents: number;
    /** Orders whose goods come to this or more ship free; null when delivery is never free. */
    freeFromCents: number | null;
  };
  pickup: {
    isOffered: boolean;
    /** Where and when to collect, in the studio's words. */
    note: string;
  };
}

/** One method the shop offers, priced for one order. */
export interface ShippingOption {
  method: ShippingMethodCode;
  /** Its name for people: "Delivery to your address". */
  name: string;
  cents: number;
}

const NAMES: Record<ShippingMethodCode, string> = {
  delivery: 'Delivery to your address',
  pickup: 'Pick up at the studio',
};

/**
 * The methods the shop offers, in a fixed order (delivery, then pick-up), each priced for an order whose goods and
 * work (the quote's subtotal before tax) come to `goodsCents`. Delivery is the flat rate, or nothing once the goods
 * reach the free-delivery amount (at the amount itself it is free); pick-up costs nothing.
 */
export function shippingOptions(rates: ShippingRates, goodsCents: number): EngineResult<{ options: ShippingOption[] }> {
  const check = checkShippingRates(rates);
  if (!check.ok) return check;
  if (!Number.isSafeInteger(goodsCents)) return fail('The amount to ship must be whole cents.');
  const options: ShippingOption[] = [];
  if (rates.delivery.isOffered) {
    const { flatCents, freeFromCents } = rates.delivery;
    const isFree = freeFromCents !== null && goodsCents >= freeFromCents;
    options.push({ method: 'delivery', name: NAMES.delivery, cents: isFree ? 0 : flatCents });
  }
  if (rates.pickup.isOffered) options.push({ method: 'pickup', name: NAMES.pickup, cents: 0 });
  return { ok: true, options };
}

/** Checks the rates before use: whole, non-negative amounts and at least one method offered. */
export function checkShippingRates(rates: ShippingRates): EngineResult<object> {
  if (!isRecord(rates) || !isRecord(rates.delivery) || !isRecord(rates.pickup))
    return fail('The shop has no shipping settings.');
  const { delivery, pickup } = rates;
  if (typeof delivery.isOffered !== 'boolean' || typeof pickup.isOffered !== 'boolean')
    return fail('Say whether the shop offers delivery and pick-up.');
  if (!delivery.isOffered && !pickup.isOffered) return fail('The shop offers neither delivery nor pick-up.');
  if (!isWholeNumber(delivery.flatCents)) return fail('The delivery charge must be whole cents, 0 or more.');
  if (delivery.freeFromCents !== null && !isWholeNumber(delivery.freeFromCents))
    return fail('The free-delivery amount must be whole cents, 0 or more.');
  if (typeof pickup.note !== 'string') return fail('The pick-up note must be text.');
  return { ok: true };
}

const IN_WORDS: Record<ShippingMethodCode, string> = {
  delivery: 'delivery to your address',
  pickup: 'pick-up at the studio',
};

/** A method in words inside a sentence: "pick-up at the studio". */
export const shippingMethodInWords = (method: ShippingMethodCode): string => IN_WORDS[method];

/**
 * Why the method cannot be chosen, in a sentence naming what the shop offers instead; undefined when it is offered.
 * Missing rates (a shop not set up) offer nothing.
 */
export function shippingRefusal(rates: ShippingRates | undefined, method: ShippingMethodCode): string | undefined {
  if (rates?.[method].isOffered) return undefined;
  const offered = (['delivery', 'pickup'] as const).filter((other) => rates?.[other].isOffered);
  const instead = offered.map(shippingMethodInWords).join(' or ');
  return `The studio no longer offers ${IN_WORDS[method]}${instead ? `; choose ${instead} instead` : ''}.`;
}
