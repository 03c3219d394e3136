import { shippedWords } from '@server/contracts/order-status.ts';
import { useState, type ReactNode } from 'react';
import type { OrderDetailResponse } from '@server/contracts/admin-orders.ts';
import { Button } from '@ui/components/button.tsx';
import type { ApiError } from '@ui/api-client.ts';
import { formatMoney } from '@ui/format.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';
import { useOrderAction, type OrderActionRequest } from '../api/order-actions.ts';
import { parseCents } from '../../../lib/money-input.ts';
import { ShipStep } from './ship-step.tsx';

type Step = 'charge' | 'cancel' | 'refund' | 'ship' | null;
const input = 'min-h-11 rounded-lg border border-linen-300 bg-white px-3 text-sm';

/** A money move waits for a second, explicit click; the question says what will happen to whose money. */
function Confirm({
  question,
  children,
  onConfirm,
  onBack,
  isBusy,
  confirmLabel,
}: {
  question: string;
  children?: ReactNode;
  onConfirm: () => void;
  onBack: () => void;
  isBusy: boolean;
  confirmLabel: string;
}) {
  return (
    <div className="grid gap-3 rounded-lg border border-madder-500/40 bg-madder-50 p-3 text-sm">
      <p className="font-medium">{question}</p>
      {children}
      <div className="flex flex-wrap gap-2">
        <Button onClick={onConfirm} disabled={isBusy}>
          {isBusy ? 'Working…' : confirmLabel}
        </Button>
        <Button tone="quiet" onClick={onBack} disabled={isBusy}>
          Not now
        </Button>
      </div>
    </div>
  );
}

/**
 * The studio's buttons for this order, only those the state machine allows now (the server sends them), with a
 * confirmation for every money move and the server's answer shown in place.
 */
export function OrderActions({ detail }: { detail: OrderDetailResponse }) {
  const { order, payments, studioActions, charge } = detail;
  const [step, setStep] = useState<Step>(null);
  const [reason, setReason] = useState('');
  const [refundText, setRefundText] = useState('');
  const [isFullRefund, setIsFullRefund] = useState(true);
  const action = useOrderAction(order.number);
  const money = (cents: number) => formatMoney(cents, order.currency);
  const live = payments.at(-1);
  const refundableCents = live ? live.capturedCents - live.refundedCents : 0;
  const fields = (action.error as ApiError | null)?.fields ?? {};
  const can = (name: OrderDetailResponse['studioActions'][number]) => studioActions.includes(name);
  const run = (request: OrderActionRequest) => action.mutate(request, { onSuccess: () => setStep(null) });
  const open = (next: Step) => {
    action.reset();
    setStep(next);
  };
  const refundCents = isFullRefund ? refundableCents : parseCents(refundText);
  const isRefundValid =
    refundCents !== undefined && refundCents > 0 && refundCents <= refundableCents && reason.trim() !== '';

  if (studioActions.filter((name) => name !== 'send_proof').length === 0) {
    return (
      <p className="text-sm text-walnut-500">
        Nothing to do here now{order.status === 'proof_sent' ? ': the customer has the proof.' : '.'}
      </p>
    );
  }
  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap gap-2">
        {can('start_production') && charge && (
          <Button onClick={() => open('charge')}>Approve & charge {money(charge.amountCents)}</Button>
        )}
        {can('mark_stitched') && (
          <Button onClick={() => run({ action: 'stitched' })} disabled={action.isPending}>
            Mark stitched
          </Button>
        )}
        {can('ship') && <Button onClick={() => open('ship')}>Mark {shippedWords.either.toLowerCase()}</Button>}
        {can('refund') && refundableCents > 0 && (
          <Button tone="quiet" onClick={() => open('refund')}>
            Refund…
          </Button>
        )}
        {can('cancel') && (
          <Button tone="quiet" onClick={() => open('cancel')}>
            Cancel order…
          </Button>
        )}
      </div>
      {can('start_production') && charge && (
        <p className="text-sm text-walnut-700" id="charge-plan">
          {charge.summary}
        </p>
      )}
      {can('start_production') && !charge && (
        <p className="rounded-md bg-saffron-100 p-2 text-sm">
          The proof is approved, but no card is held or saved: the customer has been asked to pay. The order goes into
          production once they have.
        </p>
      )}
      {step === 'charge' && charge && (
        <Confirm
          question={
            charge.kind === 'ask_customer'
              ? `E-mail ${order.customer.name} a link to pay ${money(charge.amountCents)}?`
              : `Charge ${money(charge.amountCents)} to ${order.customer.name}’s card and start production?`
          }
          confirmLabel={charge.kind === 'ask_customer' ? 'Send the payment link' : 'Charge the card'}
          isBusy={action.isPending}
          onBack={() => setStep(null)}
          onConfirm={() => run({ action: 'capture' })}
        />
      )}
      {step === 'cancel' && (
        <Confirm
          question={`Cancel ${order.number}${order.paymentStatus === 'authorized' ? ' and release the hold on the card' : ''}? The customer is told why.`}
          confirmLabel="Cancel the order"
          isBusy={action.isPending || reason.trim() === ''}
          onBack={() => setStep(null)}
          onConfirm={() => run({ action: 'cancel', body: { reason } })}
        >
          <label className="grid gap-1">
            <span className="font-medium">Reason, for the customer</span>
            <textarea
              value={reason}
              onChange={(event) => setReason(event.target.value)}
              rows={2}
              className="rounded-lg border border-linen-300 p-2"
              aria-invalid={Boolean(fields.reason)}
            />
            {fields.reason && <span className="text-madder-700">{fields.reason}</span>}
          </label>
        </Confirm>
      )}
      {step === 'refund' && (
        <Confirm
          question={`Refund to ${order.customer.name}’s card (${money(refundableCents)} can still be refunded)?`}
          confirmLabel={refundCents ? `Refund ${money(refundCents)}` : 'Refund'}
          isBusy={action.isPending || !isRefundValid}
          onBack={() => setStep(null)}
          onConfirm={() =>
            run({ action: 'refunds', body: { reason, ...(isFullRefund ? {} : { amountCents: refundCents }) } })
          }
        >
          <fieldset className="flex flex-wrap items-center gap-4">
            <legend className="sr-only">How much</legend>
            <label className="flex items-center gap-2">
              <input type="radio" checked={isFullRefund} onChange={() => setIsFullRefund(true)} /> All of it (
              {money(refundableCents)})
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" checked={!isFullRefund} onChange={() => setIsFullRefund(false)} /> Part:
            </label>
            {!isFullRefund && (
              <label className="flex items-center gap-2">
                <span className="sr-only">Amount to refund</span>
                <input
                  inputMode="decimal"
                  value={refundText}
                  onChange={(event) => setRefundText(event.target.value)}
                  placeholder="5.00"
                  className={`${input} w-28`}
                  aria-invalid={Boolean(fields.amountCents) || (refundText !== '' && !isRefundValid)}
                />
              </label>
            )}
          </fieldset>
          {!isFullRefund && refundText !== '' && (refundCents === undefined || refundCents > refundableCents) && (
            <p className="text-madder-700">Enter an amount up to {money(refundableCents)}.</p>
          )}
          {fields.amountCents && <p className="text-madder-700">{fields.amountCents}</p>}
          <label className="grid gap-1">
            <span className="font-medium">Reason, for the customer</span>
            <textarea
              value={reason}
              onChange={(event) => setReason(event.target.value)}
              rows={2}
              className="rounded-lg border border-linen-300 p-2"
            />
          </label>
        </Confirm>
      )}
      {step === 'ship' && (
        <ShipStep
          isPickup={order.delivery.method === 'pickup'}
          isBusy={action.isPending}
          serverFields={fields}
          onShip={(body) => run({ action: 'shipped', body })}
          onBack={() => setStep(null)}
        />
      )}
      {action.isError && (
        <p role="alert" className="rounded-md bg-madder-50 p-2 text-sm text-madder-700">
          {action.error.message}
        </p>
      )}
      {action.isSuccess && step === null && (
        <p role="status" className="rounded-md bg-sage-50 p-2 text-sm text-sage-700">
          Done: the order now reads “{statusLabels[action.data.status]}”.
        </p>
      )}
    </div>
  );
}
