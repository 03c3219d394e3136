import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { shippingSettings, type ShippingSettings } from '@server/contracts/shipping.ts';
import { Button } from '@ui/components/button.tsx';
import { ErrorNotice } from '@ui/components/page-state.tsx';
import { showServerErrors } from '@ui/show-server-errors.ts';
import { parseCents } from '../../../lib/money-input.ts';
import { useUpdateShippingSettings } from '../api/update-shipping-settings.ts';

const inputClassName =
  'mt-1 block min-h-10 w-full rounded-lg border border-linen-300 bg-white px-3 read-only:bg-linen-100 aria-invalid:border-madder-600';

/** An amount typed as dollars and cents ("6.95"), as the contract's cents; `blank` is what an empty box means. */
const moneyText = (what: string, blank: 'required' | 'never') =>
  z.string().transform((text, context) => {
    if (blank === 'never' && text.trim() === '') return null;
    const cents = parseCents(text);
    if (cents !== undefined) return cents;
    context.addIssue({ code: 'custom', message: `Enter ${what} as an amount, like 6.95` });
    return z.NEVER;
  });

/** The boxes as typed, checked into the contract's shape with the contract's own rules and words. */
const shippingFields = z
  .object({
    delivery: z.object({
      isOffered: z.boolean(),
      flatCents: moneyText('the delivery charge', 'required'),
      freeFromCents: moneyText('the free-delivery amount', 'never'),
    }),
    pickup: z.object({ isOffered: z.boolean(), note: z.string() }),
  })
  .pipe(shippingSettings);
type ShippingFieldsInput = z.input<typeof shippingFields>;

const dollars = (cents: number) => (cents / 100).toFixed(2);

/** Delivery and pick-up: what each order's shipping line costs, priced by the server on every quote. */
export function ShippingSettingsForm({ settings, canEdit }: { settings: ShippingSettings; canEdit: boolean }) {
  const id = useId();
  const update = useUpdateShippingSettings();
  const { register, handleSubmit, formState, setError } = useForm<ShippingFieldsInput, unknown, ShippingSettings>({
    resolver: zodResolver(shippingFields),
    defaultValues: {
      delivery: {
        isOffered: settings.delivery.isOffered,
        flatCents: dollars(settings.delivery.flatCents),
        freeFromCents: settings.delivery.freeFromCents === null ? '' : dollars(settings.delivery.freeFromCents),
      },
      pickup: settings.pickup,
    },
  });
  const errors = formState.errors;
  const fieldError = (message: string | undefined) =>
    message && <span className="text-sm font-normal text-madder-700">{message}</span>;

  return (
    <form
      className="grid gap-5"
      aria-label="Delivery and pick-up"
      noValidate
      onSubmit={handleSubmit((values) =>
        update.mutate(values, {
          onError: (error) => showServerErrors(error, setError, ['delivery', 'pickup']),
        }),
      )}
    >
      {!canEdit && (
        <p className="rounded-xl bg-linen-100 p-3 text-sm text-walnut-700">Only the studio owner can change these.</p>
      )}
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-1 text-base font-semibold">Delivery</legend>
        <label className="flex min-h-10 items-center gap-2 text-sm font-medium sm:col-span-2">
          <input
            type="checkbox"
            className="h-5 w-5 accent-madder-600"
            disabled={!canEdit}
            {...register('delivery.isOffered')}
          />
          Post orders to the customer
        </label>
        {fieldError(errors.delivery?.isOffered?.message)}
        <label className="grid text-sm font-medium" htmlFor={`${id}-flat`}>
          Delivery charge per order
          <input
            id={`${id}-flat`}
            inputMode="decimal"
            className={inputClassName}
            readOnly={!canEdit}
            aria-invalid={errors.delivery?.flatCents ? true : undefined}
            {...register('delivery.flatCents')}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">One charge per order, however much it holds.</span>
          {fieldError(errors.delivery?.flatCents?.message)}
        </label>
        <label className="grid text-sm font-medium" htmlFor={`${id}-free`}>
          Free delivery from
          <input
            id={`${id}-free`}
            inputMode="decimal"
            className={inputClassName}
            readOnly={!canEdit}
            placeholder="Never free"
            aria-invalid={errors.delivery?.freeFromCents ? true : undefined}
            {...register('delivery.freeFromCents')}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">
            Orders of this much or more before tax ship free. Leave empty to always charge.
          </span>
          {fieldError(errors.delivery?.freeFromCents?.message)}
        </label>
      </fieldset>
      <fieldset className="grid gap-4">
        <legend className="mb-1 text-base font-semibold">Pick-up</legend>
        <label className="flex min-h-10 items-center gap-2 text-sm font-medium">
          <input
            type="checkbox"
            className="h-5 w-5 accent-madder-600"
            disabled={!canEdit}
            {...register('pickup.isOffered')}
          />
          Customers may collect from the studio, free
        </label>
        <label className="grid text-sm font-medium" htmlFor={`${id}-note`}>
          Where and when to collect
          <textarea
            id={`${id}-note`}
            rows={2}
            className={`${inputClassName} py-2`}
            readOnly={!canEdit}
            aria-invalid={errors.pickup?.note ? true : undefined}
            {...register('pickup.note')}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">Shown at checkout and on the order.</span>
          {fieldError(errors.pickup?.note?.message)}
        </label>
      </fieldset>
      {canEdit && (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? 'Saving…' : 'Save delivery and pick-up'}
          </Button>
          <span role="status" className="text-sm text-sage-700">
            {update.isSuccess ? 'Saved. New quotes use these rates.' : ''}
          </span>
        </div>
      )}
      {errors.root?.server?.message && <ErrorNotice message={errors.root.server.message} />}
    </form>
  );
}
