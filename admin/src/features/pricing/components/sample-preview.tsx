import { lazy, Suspense } from 'react';
import type { PricingPreviewResponse, SamplePreview as Sample } from '@server/contracts/admin-pricing.ts';
import { formatMoney } from '@ui/format.ts';

// The charting library loads in its own chunk, only when a price list is opened.
const SampleChart = lazy(() => import('./sample-chart.tsx').then((m) => ({ default: m.SampleChart })));

function signed(cents: number, currency: string): string {
  if (cents === 0) return 'no change';
  return `${cents > 0 ? '+' : '−'}${formatMoney(Math.abs(cents), currency)}`;
}

const totalOf = (side: Sample['published']) => (side.ok ? side.totalCents : null);

/**
 * Three stored quotes priced with the published list and with the draft: a grouped bar chart to see the change at a
 * glance, and the same figures in a table, which is also the chart's text alternative.
 */
export function SamplePreview({ preview, isUpdating }: { preview: PricingPreviewResponse; isUpdating: boolean }) {
  const { currency, samples } = preview;
  if (samples.length === 0)
    return <p className="text-sm text-walnut-500">There are no stored quotes to compare yet.</p>;
  const chartRows = samples.map((sample) => ({
    name: sample.role,
    published: (totalOf(sample.published) ?? 0) / 100,
    draft: (totalOf(sample.draft) ?? 0) / 100,
  }));
  return (
    <div className={`grid gap-4 transition-opacity ${isUpdating ? 'opacity-60' : ''}`} aria-busy={isUpdating}>
      <Suspense fallback={<div className="h-56" />}>
        <SampleChart rows={chartRows} currency={currency} publishedVersion={preview.publishedVersion} />
      </Suspense>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[20rem] text-left text-sm">
          <caption className="sr-only">Three stored quotes priced with the published list and with this draft</caption>
          <thead className="text-walnut-500">
            <tr>
              <th scope="col" className="py-1.5 font-medium">
                Sample quote
              </th>
              <th scope="col" className="py-1.5 text-right font-medium">
                Published
              </th>
              <th scope="col" className="py-1.5 text-right font-medium">
                Draft
              </th>
              <th scope="col" className="py-1.5 text-right font-medium">
                Change
              </th>
            </tr>
          </thead>
          <tbody>
            {samples.map((sample) => (
              <tr key={sample.quoteId} className="border-t border-linen-200 align-top">
                <th scope="row" className="py-2 pr-3 font-normal">
                  <span className="font-semibold">{sample.role}</span> · quote {sample.quoteId}
                  <span className="block text-walnut-500">
                    {sample.description} × {sample.quantity}
                    {sample.isRush ? ', rush' : ''}
                  </span>
                </th>
                <td className="py-2 pl-2 text-right tabular-nums">
                  {sample.published.ok ? formatMoney(sample.published.totalCents, currency) : '—'}
                </td>
                <td className="py-2 pl-2 text-right tabular-nums">
                  {sample.draft.ok ? (
                    formatMoney(sample.draft.totalCents, currency)
                  ) : (
                    <span className="text-madder-700">{sample.draft.reason}</span>
                  )}
                </td>
                <td
                  className={`py-2 pl-2 text-right font-semibold tabular-nums ${sample.differenceCents && sample.differenceCents > 0 ? 'text-madder-700' : 'text-sage-700'}`}
                >
                  {sample.differenceCents === null ? '—' : signed(sample.differenceCents, currency)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
