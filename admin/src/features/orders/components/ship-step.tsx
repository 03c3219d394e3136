import { shippedWords } from '@server/contracts/order-status.ts';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { type z } from 'zod';
import { shipOrderRequest, type ShipOrderRequest } from '@server/contracts/studio-orders.ts';
import { Button } from '@ui/components/button.tsx';

const input = 'min-h-11 rounded-lg border border-linen-300 bg-white px-3 text-sm aria-invalid:border-madder-600';

/**
 * Marking the order posted: the carrier and tracking number (both optional), which both order pages and the
 * customer's e-mail show. A pick-up order is marked handed over instead, with nothing to fill in.
 */
export function ShipStep({
  isPickup,
  isBusy,
  serverFields,
  onShip,
  onBack,
}: {
  isPickup: boolean;
  isBusy: boolean;
  serverFields: Record<string, string>;
  onShip: (request: ShipOrderRequest) => void;
  onBack: () => void;
}) {
  const id = useId();
  const { register, handleSubmit, formState } = useForm<
    z.input<typeof shipOrderRequest>,
    unknown,
    z.output<typeof shipOrderRequest>
  >({ resolver: zodResolver(shipOrderRequest), defaultValues: { carrier: '', trackingNumber: '' } });
  const errorOf = (field: 'carrier' | 'trackingNumber') => formState.errors[field]?.message ?? serverFields[field];
  return (
    <form
      aria-label={isPickup ? 'Hand over the order' : 'Post the order'}
      noValidate
      onSubmit={handleSubmit((values) => onShip(values))}
      className="grid gap-3 rounded-lg border border-linen-200 p-3 text-sm"
    >
      {!isPickup && (
        <div className="grid gap-3 sm:grid-cols-2">
          {(
            [
              ['carrier', 'Carrier', 'Parcel post'],
              ['trackingNumber', 'Tracking number (if the parcel has one)', ''],
            ] as const
          ).map(([field, label, placeholder]) => (
            <label key={field} className="grid gap-1" htmlFor={`${id}-${field}`}>
              <span className="font-medium">{label}</span>
              <input
                id={`${id}-${field}`}
                placeholder={placeholder}
                className={input}
                aria-invalid={errorOf(field) ? true : undefined}
                {...register(field)}
              />
              {errorOf(field) && <span className="text-madder-700">{errorOf(field)}</span>}
            </label>
          ))}
        </div>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={isBusy}>
          {`${isPickup ? shippedWords.pickup : shippedWords.delivery}: tell the customer`}
        </Button>
        <Button tone="quiet" onClick={onBack}>
          Not now
        </Button>
      </div>
    </form>
  );
}
