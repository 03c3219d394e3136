import { useEffect, useId, type ReactNode } from 'react';
import { formatCustomerDate } from '@ui/format.ts';
import { useForm, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { placeOrderRequest } from '@server/contracts/orders.ts';
import { Button } from '@ui/components/button.tsx';
import { SavedAddressPicker } from './saved-address-picker.tsx';

/** The part of the order the customer types; the quote and design come from the page. */
export const checkoutFields = placeOrderRequest.pick({ neededBy: true, shipTo: true, note: true });
export type CheckoutFieldsInput = z.input<typeof checkoutFields>;
export type CheckoutFields = z.output<typeof checkoutFields>;

interface CheckoutFormProps {
  /** The first day an order can be ready without rush, and with it; from the stored quote. */
  readyDates: { earliestReadyDate: string; earliestRushDate: string } | undefined;
  today: string;
  onNeededByChange: (date: string) => void;
  onSubmit: (fields: CheckoutFields) => void;
  /** Field messages from the server, keyed by the request's field paths (shipTo.postalCode). */
  serverFields: Record<string, string> | undefined;
  isSubmitting: boolean;
  /** Shown above the button: the total to be held, and anything that stops the order. */
  summary: ReactNode;
  canSubmit: boolean;
  /** How the priced order travels: the address is where to post it, or, for pick-up, the customer's own. */
  shippingMethod: 'delivery' | 'pickup' | undefined;
}

const inputClass =
  'mt-1 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3 aria-invalid:border-madder-600';
const dayName = formatCustomerDate;

/** The date, address and note, checked with the same contract the server uses; server messages appear in place. */
export function CheckoutForm({
  readyDates,
  today,
  onNeededByChange,
  onSubmit,
  serverFields,
  isSubmitting,
  summary,
  canSubmit,
  shippingMethod,
}: CheckoutFormProps) {
  const id = useId();
  const form = useForm<CheckoutFieldsInput, unknown, CheckoutFields>({
    resolver: zodResolver(checkoutFields),
    defaultValues: {
      neededBy: '',
      shipTo: { name: '', line1: '', line2: '', city: '', region: '', postalCode: '', countryCode: 'US', phone: '' },
      note: '',
    },
  });
  const { register, formState, setError, watch, setValue } = form;
  const fillAddress = (address: CheckoutFieldsInput['shipTo']) => {
    for (const [key, value] of Object.entries({ line2: '', phone: '', ...address }))
      setValue(`shipTo.${key}` as FieldPath<CheckoutFieldsInput>, value ?? '', {
        shouldValidate: formState.isSubmitted,
      });
  };
  const neededBy = watch('neededBy');

  useEffect(() => onNeededByChange(neededBy), [neededBy, onNeededByChange]);
  useEffect(() => {
    for (const [path, message] of Object.entries(serverFields ?? {})) {
      if (path === 'neededBy' || path === 'note' || path.startsWith('shipTo.'))
        setError(path as FieldPath<CheckoutFieldsInput>, { message });
    }
  }, [serverFields, setError]);

  const errorOf = (path: string): string | undefined => {
    const parts = path.split('.');
    let node: unknown = formState.errors;
    for (const part of parts) node = (node as Record<string, unknown> | undefined)?.[part];
    return (node as { message?: string } | undefined)?.message;
  };
  const field = (
    path: FieldPath<CheckoutFieldsInput>,
    label: string,
    options: { autoComplete?: string; type?: string; optional?: boolean; className?: string } = {},
  ) => {
    const error = errorOf(path);
    const inputId = `${id}-${path}`;
    return (
      <div className={options.className}>
        <label htmlFor={inputId} className="text-sm font-medium">
          {label}
          {options.optional && <span className="font-normal text-walnut-500"> (optional)</span>}
        </label>
        <input
          id={inputId}
          type={options.type ?? 'text'}
          autoComplete={options.autoComplete}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${inputId}-error` : undefined}
          className={inputClass}
          {...register(path)}
        />
        {error && (
          <p id={`${inputId}-error`} className="mt-1 text-sm text-madder-700">
            {error}
          </p>
        )}
      </div>
    );
  };
  const neededByError = errorOf('neededBy');
  const isInsideLeadTime = readyDates !== undefined && neededBy !== '' && neededBy < readyDates.earliestReadyDate;

  return (
    <form noValidate onSubmit={form.handleSubmit(onSubmit)} className="space-y-6">
      <fieldset className="space-y-2">
        <legend className="text-lg font-semibold">When do you need it?</legend>
        {readyDates && (
          <p className="text-sm text-walnut-700">
            Ready by <strong className="font-semibold">{dayName(readyDates.earliestReadyDate)}</strong> at the usual
            pace, or from {dayName(readyDates.earliestRushDate)} as a rush.
          </p>
        )}
        <label htmlFor={`${id}-neededBy`} className="text-sm font-medium">
          Needed by
        </label>
        <input
          id={`${id}-neededBy`}
          type="date"
          min={readyDates?.earliestRushDate ?? today}
          aria-invalid={neededByError ? true : undefined}
          aria-describedby={`${id}-neededBy-note`}
          className={`${inputClass} sm:w-64`}
          {...register('neededBy')}
        />
        <p
          id={`${id}-neededBy-note`}
          role="status"
          className={`text-sm ${neededByError ? 'text-madder-700' : isInsideLeadTime ? 'font-medium text-madder-700' : 'text-walnut-500'}`}
        >
          {neededByError ??
            (isInsideLeadTime
              ? 'That is sooner than our usual time, so this is a rush order: the rush charge is added to the price.'
              : 'Give yourself a few days for the post.')}
        </p>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-lg font-semibold">
          {shippingMethod === 'pickup' ? 'Your address' : 'Where should we send it?'}
        </legend>
        {shippingMethod === 'pickup' && (
          <p className="text-sm text-walnut-500 sm:col-span-2">
            You collect the order from the studio; we keep your address with the order in case we need to reach you.
          </p>
        )}
        <SavedAddressPicker onUse={fillAddress} />
        {field('shipTo.name', 'Name', { autoComplete: 'name', className: 'sm:col-span-2' })}
        {field('shipTo.line1', 'Street address', { autoComplete: 'address-line1', className: 'sm:col-span-2' })}
        {field('shipTo.line2', 'Flat, suite or building', {
          autoComplete: 'address-line2',
          optional: true,
          className: 'sm:col-span-2',
        })}
        {field('shipTo.city', 'Town or city', { autoComplete: 'address-level2' })}
        {field('shipTo.region', 'State, county or region', { autoComplete: 'address-level1' })}
        {field('shipTo.postalCode', 'Postal code', { autoComplete: 'postal-code' })}
        {field('shipTo.countryCode', 'Country code (US, CA, GB…)', { autoComplete: 'country' })}
        {field('shipTo.phone', 'Phone, for the courier', { autoComplete: 'tel', type: 'tel', optional: true })}
      </fieldset>

      <div>
        <label htmlFor={`${id}-note`} className="text-lg font-semibold">
          A note to the studio <span className="text-sm font-normal text-walnut-500">(optional)</span>
        </label>
        <textarea
          id={`${id}-note`}
          rows={3}
          maxLength={1000}
          className="mt-1 block w-full rounded-lg border border-linen-300 bg-white p-3"
          placeholder="The occasion, how the name is said, anything we should know"
          {...register('note')}
        />
        {errorOf('note') && <p className="mt-1 text-sm text-madder-700">{errorOf('note')}</p>}
      </div>

      {summary}
      <Button type="submit" className="w-full sm:w-auto" disabled={!canSubmit || isSubmitting}>
        {isSubmitting ? 'Opening the payment page…' : 'Continue to payment'}
      </Button>
      <p className="text-xs text-walnut-500">
        Your card is only held now. We charge it after you approve the proof of your design.
      </p>
    </form>
  );
}
