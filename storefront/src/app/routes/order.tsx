import { lazy, Suspense } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { ApiError } from '@ui/api-client.ts';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { formatMoney, formatCustomerDate } from '@ui/format.ts';
import { useGarments } from '../../features/catalogue/api/get-garments.ts';
import { GarmentPicture } from '../../features/catalogue/components/garment-picture.tsx';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { useFonts } from '../../features/catalogue/api/get-fonts.ts';
import { useThreads } from '../../features/catalogue/api/get-threads.ts';
import { QuoteLines } from '../../features/quote/components/quote-lines.tsx';
import { DeliveryDetails } from '@ui/components/delivery-details.tsx';
import { useOrder } from '../../features/orders/api/get-order.ts';
import { OrderStatusBadge } from '../../features/orders/components/order-status-badge.tsx';
import { OrderSteps } from '../../features/orders/components/order-steps.tsx';
import { OrderTimeline } from '../../features/orders/components/order-timeline.tsx';
import { PaymentState } from '../../features/orders/components/payment-state.tsx';
import { ProofReview } from '../../features/orders/components/proof-review.tsx';
import { SafetyCautions } from '../../components/safety-cautions.tsx';
import { LayoutNotes } from '@ui/components/layout-notes.tsx';
import { DesignSummary } from '../../features/orders/components/design-summary.tsx';
import { CancelOrderButton } from '../../features/orders/components/cancel-order-button.tsx';
import { SignInNeeded } from '../../components/sign-in-needed.tsx';
import { paths } from '../../config/paths.ts';

// Lazy: the preview measures lettering with the designer's canvas library, which the rest of the page never needs.
const DesignPreview = lazy(() =>
  import('../../features/designer/components/design-preview.tsx').then(({ DesignPreview }) => ({
    default: DesignPreview,
  })),
);

const card = 'rounded-card border border-linen-200 bg-white p-5 shadow-sm';

function checkoutReturnOf(value: string | null): 'done' | 'cancelled' | null {
  return value === 'done' || value === 'cancelled' ? value : null;
}

export function OrderPage() {
  const { number = '' } = useParams();
  const [params] = useSearchParams();
  const checkoutReturn = checkoutReturnOf(params.get('checkout'));
  const order = useOrder(number, { isBackFromPayment: checkoutReturn !== null });
  const garments = useGarments();
  const motifs = useMotifs();
  const fonts = useFonts();
  const threads = useThreads();

  if (order.isPending) return <Loading label="Opening your order…" />;
  if (order.isError) {
    if (order.error instanceof ApiError && order.error.kind === 'unauthenticated')
      return <SignInNeeded message="Sign in to see your order." returnTo={paths.order.href(number)} />;
    return (
      <div className="space-y-4">
        <ErrorNotice
          message={order.error.message}
          onRetry={
            order.error instanceof ApiError && order.error.kind === 'not-found' ? undefined : () => void order.refetch()
          }
        />
        <Link to={paths.orders.href()} className="text-madder-600 underline">
          All your orders
        </Link>
      </div>
    );
  }
  const { order: summary, design, quote, proofs, timeline, actions, cautions, layoutNotes } = order.data;
  const garment = garments.data?.find((candidate) => candidate.id === design.garmentId);
  const hasProofToAnswer = proofs.some((proof) => proof.isAnswerable);

  return (
    <div className="space-y-6">
      <div>
        <Link to={paths.orders.href()} className="text-sm text-walnut-500 hover:text-madder-600">
          ← Your orders
        </Link>
        <div className="mt-1 flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold sm:text-3xl">Order {summary.number}</h1>
          <OrderStatusBadge status={summary.status} />
        </div>
        <p className="mt-1 text-walnut-700">
          {summary.description} · {formatMoney(summary.totalCents, summary.currency)}
          {summary.dueDate &&
            ` · ${summary.neededBy ? 'needed by' : 'ready by about'} ${formatCustomerDate(summary.dueDate)}`}
          {summary.isRush && ' · rush'}
        </p>
      </div>

      {checkoutReturn === 'done' && summary.status !== 'awaiting_payment' && summary.status !== 'cancelled' && (
        <p role="status" className="rounded-card border border-sage-500 bg-sage-50 p-4 text-sage-700">
          Thank you! Your order is in and your card is held, not charged. We will e-mail you as soon as your proof is
          ready.
        </p>
      )}

      <section aria-labelledby="steps-heading" className={card}>
        <h2 id="steps-heading" className="sr-only">
          Where your order is
        </h2>
        <OrderSteps status={summary.status} />
      </section>

      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(18rem,2fr)]">
        <div className="min-w-0 space-y-6">
          <section
            aria-labelledby="proof-heading"
            className={`${card} ${hasProofToAnswer ? 'ring-2 ring-saffron-500' : ''}`}
          >
            <h2 id="proof-heading" className="mb-3 text-lg font-semibold">
              Your proof
            </h2>
            {summary.status === 'awaiting_payment' ? (
              <p className="text-walnut-700">
                Once your card is held we draw a proof of your design on the garment for you to approve.
              </p>
            ) : (
              <ProofReview number={summary.number} proofs={proofs} currency={summary.currency} />
            )}
            <LayoutNotes
              notes={layoutNotes}
              advice="If that is not what you meant, ask for a change on the proof and say which to move."
              className="mt-4"
            />
            <SafetyCautions
              cautions={cautions}
              heading={`Safety notes for ${design.garmentName}, size ${design.sizeLabel}`}
              className="mt-4"
            />
          </section>
          <section aria-labelledby="history-heading" className={card}>
            <h2 id="history-heading" className="mb-3 text-lg font-semibold">
              What has happened
            </h2>
            <OrderTimeline timeline={timeline} />
          </section>
        </div>
        <div className="min-w-0 space-y-6">
          <PaymentState order={order.data} checkoutReturn={checkoutReturn} />
          <section aria-labelledby="design-heading" className={card}>
            <h2 id="design-heading" className="mb-3 text-lg font-semibold">
              Your design
            </h2>
            {garment && (
              <div className="mb-3 rounded-card bg-linen-100 p-3">
                {motifs.data && fonts.data && threads.data ? (
                  <Suspense
                    fallback={
                      <GarmentPicture garment={garment} colourHex={design.colourHex} imageClassName="max-h-56" />
                    }
                  >
                    <DesignPreview
                      garment={garment}
                      sizeId={design.sizeId}
                      colourHex={design.colourHex}
                      document={design.document}
                      motifs={motifs.data}
                      fonts={fonts.data}
                      threads={threads.data}
                      uploads={design.uploads}
                      label={`Your design on the ${design.garmentName.toLowerCase()}`}
                    />
                  </Suspense>
                ) : (
                  <GarmentPicture garment={garment} colourHex={design.colourHex} imageClassName="max-h-56" />
                )}
              </div>
            )}
            <DesignSummary design={design} />
          </section>
          <section aria-labelledby="price-heading" className={card}>
            <h2 id="price-heading" className="mb-2 text-lg font-semibold">
              Your price
            </h2>
            <QuoteLines
              quote={{ ...quote, totalCents: summary.totalCents, currency: summary.currency }}
              caption="What the order costs"
            />
            <p className="mt-2 text-xs text-walnut-500">
              Priced with the studio’s price list version {quote.ruleSetVersion}.
            </p>
          </section>
          <section aria-labelledby="ship-heading" className={card}>
            <h2 id="ship-heading" className="mb-2 text-lg font-semibold">
              {summary.delivery.method === 'pickup' ? 'Picking it up' : 'Sending to'}
            </h2>
            <DeliveryDetails delivery={summary.delivery} shipTo={summary.shipTo} audience="customer" />
            {summary.customerNote && (
              <p className="mt-2 text-sm text-walnut-700">Your note: “{summary.customerNote}”</p>
            )}
          </section>
          {actions.includes('cancel') && <CancelOrderButton number={summary.number} />}
        </div>
      </div>
    </div>
  );
}
