import type { QuotePreviewRequest } from '@server/contracts/quotes.ts';
import { formatMoney } from '@ui/format.ts';
import { useDesignQuote } from '../hooks/use-design-quote.ts';
import { DESIGN_QUOTE_ID } from './design-quote.tsx';

/**
 * The server's total in one line, for beside the garment on a phone, where the itemized price is far down the
 * page; it links there. It shares the full price's query, so the server is asked once.
 */
export function DesignQuoteTotal({ request }: { request: QuotePreviewRequest }) {
  const { preview, isEmpty, isPricing } = useDesignQuote(request);
  if (isEmpty) return null;
  const words =
    preview.data && !preview.isError
      ? `Total ${formatMoney(preview.data.quote.totalCents, preview.data.quote.currency)}`
      : preview.isError && !isPricing
        ? 'We can’t price this yet'
        : 'Pricing…';
  return (
    <a
      href={`#${DESIGN_QUOTE_ID}`}
      className="flex min-h-11 items-center justify-between gap-3 rounded-full bg-white px-4 text-sm shadow-sm ring-1 ring-linen-200"
    >
      <span aria-live="polite" className={`font-semibold ${isPricing ? 'text-walnut-500' : ''}`}>
        {isPricing && preview.data ? `${words} · updating…` : words}
      </span>
      <span className="text-madder-600">How it’s priced ↓</span>
    </a>
  );
}
