import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { formatMoney, formatStudioDate } from '@ui/format.ts';
import { DeliveryDetails } from '@ui/components/delivery-details.tsx';
import { LayoutNotes } from '@ui/components/layout-notes.tsx';
import { useOrder } from '../../features/orders/api/get-order.ts';
import { OrderTimeline } from '../../features/orders/components/order-timeline.tsx';
import { OrderMoney } from '../../features/orders/components/order-money.tsx';
import { OrderActions } from '../../features/orders/components/order-actions.tsx';
import { ProofVersions } from '../../features/orders/components/proof-versions.tsx';
import { SendProofForm } from '../../features/orders/components/send-proof-form.tsx';
import { DesignWorkPanel } from '../../features/orders/components/design-work-panel.tsx';
import { statusLabels } from '../../lib/order-status-labels.ts';
import { paths } from '../../config/paths.ts';

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
      <h2 className="mb-3 text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

export function OrderPage() {
  const { number = '' } = useParams();
  const detail = useOrder(number);
  if (detail.isPending) return <Loading label={`Opening order ${number}…`} />;
  if (detail.isError) return <ErrorNotice message={detail.error.message} onRetry={() => void detail.refetch()} />;
  const { order, items, proofs, events, studioActions, layoutNotes } = detail.data;
  return (
    <div className="grid gap-6">
      <div>
        <Link to={paths.home.href()} className="text-sm text-walnut-500 hover:text-madder-600">
          ← Today
        </Link>
        <Link to={paths.orders.href()} className="ml-4 text-sm text-walnut-500 hover:text-madder-600">
          All orders
        </Link>
        <div className="mt-1 flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <h1 className="text-2xl font-semibold">Order {order.number}</h1>
          <span className="rounded-full bg-sage-50 px-3 py-1 text-sm font-medium text-sage-700">
            {statusLabels[order.status]}
          </span>
          <Link
            to={paths.productionSheet.href(order.number)}
            className="text-sm font-medium text-madder-600 underline hover:text-madder-700"
          >
            Production sheet
          </Link>
        </div>
        <p className="mt-1 text-walnut-700">
          {order.customer.name} ·{' '}
          <a className="underline" href={`mailto:${order.customer.email}`}>
            {order.customer.email}
          </a>
          {order.neededBy && (
            <>
              {' '}
              · needed by <strong>{formatStudioDate(order.neededBy)}</strong>
            </>
          )}
        </p>
        {order.customerNote && (
          <p className="mt-2 max-w-2xl rounded-lg bg-saffron-100 p-3 text-sm">“{order.customerNote}”</p>
        )}
      </div>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="grid min-w-0 content-start gap-6">
          <Panel title="Next step">
            <OrderActions detail={detail.data} />
          </Panel>
          <Panel title="What to make">
            <ul className="grid gap-2 text-sm">
              {items.map((item) => (
                <li key={item.id} className="flex justify-between gap-3 border-b border-linen-200 pb-2 last:border-0">
                  <span>
                    <span className="font-medium">{item.designName}</span>
                    <span className="block text-walnut-500">
                      {item.description} × {item.quantity}
                    </span>
                    {item.artwork.length > 0 && (
                      <span className="mt-2 flex flex-wrap gap-3">
                        {item.artwork.map((picture) => (
                          <a
                            key={picture.uploadId}
                            href={picture.imageUrl}
                            target="_blank"
                            rel="noreferrer"
                            className="grid w-28 gap-1 text-xs text-madder-600 hover:underline"
                          >
                            <img
                              src={picture.imageUrl}
                              alt={`The customer's picture for the ${picture.zoneLabel.toLowerCase()}, ${picture.widthMm} mm wide`}
                              className="h-24 w-28 rounded-md border border-linen-300 bg-white object-contain p-1"
                            />
                            Their picture · {picture.zoneLabel}, {picture.widthMm} mm wide (to digitize)
                          </a>
                        ))}
                      </span>
                    )}
                  </span>
                  <span className="tabular-nums">{formatMoney(item.totalCents, order.currency)}</span>
                </li>
              ))}
            </ul>
          </Panel>
          {studioActions.includes('send_proof') && (
            <Panel title="Digitizing and price">
              <DesignWorkPanel number={order.number} editorHref={paths.orderDesign.href(order.number)} />
            </Panel>
          )}
          <Panel title="Price and payment">
            <OrderMoney detail={detail.data} />
          </Panel>
          <Panel title={order.delivery.method === 'pickup' ? 'Pick-up' : 'Delivery'}>
            <DeliveryDetails delivery={order.delivery} shipTo={order.shipTo} audience="studio" />
          </Panel>
        </div>
        <div className="grid min-w-0 content-start gap-6">
          <Panel title="Proofs">
            <div className="grid gap-4">
              <LayoutNotes
                notes={layoutNotes}
                advice="Check the layout before the proof goes out: move one of them, or tell the customer in the proof's message."
              />
              {studioActions.includes('send_proof') && (
                <SendProofForm number={order.number} versionCount={proofs.length} />
              )}
              <ProofVersions proofs={proofs} currency={order.currency} />
            </div>
          </Panel>
          <Panel title="History">
            <OrderTimeline events={events} />
          </Panel>
        </div>
      </div>
    </div>
  );
}
