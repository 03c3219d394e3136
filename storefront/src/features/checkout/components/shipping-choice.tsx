import { useId } from 'react';
import type { QuoteShipping, ShippingMethod } from '@server/contracts/shipping.ts';
import { formatMoney } from '@ui/format.ts';

/**
 * How the order reaches the customer: the ways the shop offers, each priced by the server for this order. The price
 * is worked out again when the choice changes; a free-delivery amount and the pick-up note are the shop's own.
 */
export function ShippingChoice({
  shipping,
  currency,
  chosen,
  onChoose,
}: {
  shipping: QuoteShipping | undefined;
  currency: string | undefined;
  chosen: ShippingMethod | undefined;
  onChoose: (method: ShippingMethod) => void;
}) {
  const id = useId();
  if (!shipping || !currency) return <p className="text-sm text-walnut-500">Working out delivery…</p>;
  const selected = chosen ?? shipping.method;
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium">How should it reach you?</legend>
      {shipping.options.map((option) => (
        <label
          key={option.method}
          className="flex min-h-11 cursor-pointer items-start gap-3 rounded-lg border border-linen-300 p-3 has-checked:border-madder-600"
        >
          <input
            type="radio"
            name={`${id}-shipping`}
            value={option.method}
            checked={selected === option.method}
            onChange={() => onChoose(option.method)}
            className="mt-1 h-4 w-4 accent-madder-600"
          />
          <span className="grow text-sm">
            <span className="font-medium">{option.name}</span>
            {option.method === 'pickup' && shipping.pickupNote && (
              <span className="block text-walnut-500">{shipping.pickupNote}</span>
            )}
            {option.method === 'delivery' && shipping.freeDeliveryFromCents !== null && (
              <span className="block text-walnut-500">
                Free on orders of {formatMoney(shipping.freeDeliveryFromCents, currency)} or more before tax
              </span>
            )}
          </span>
          <span className="text-sm tabular-nums">
            {option.cents === 0 ? 'Free' : formatMoney(option.cents, currency)}
          </span>
        </label>
      ))}
    </fieldset>
  );
}
