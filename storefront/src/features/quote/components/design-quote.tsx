import type { QuotePreviewRequest } from '@server/contracts/quotes.ts';
import { ErrorNotice } from '@ui/components/page-state.tsx';
import { useDesignQuote } from '../hooks/use-design-quote.ts';
import { MakingNotes } from './making-notes.tsx';
import { QuoteLines } from './quote-lines.tsx';

/** Where the short total on a phone links to. */
export const DESIGN_QUOTE_ID = 'your-price';

/**
 * The server's itemized price for the design as it stands. The last price stays on show, dimmed, while the next is
 * worked out; a design the server refuses shows the server's own reason.
 */
export function DesignQuote({ request }: { request: QuotePreviewRequest }) {
  const { preview, isEmpty, isPricing } = useDesignQuote(request);

  return (
    <section
      id={DESIGN_QUOTE_ID}
      aria-labelledby="price-heading"
      className="scroll-mt-4 rounded-card border border-linen-200 bg-white p-5 shadow-sm"
    >
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="price-heading" className="text-lg font-semibold">
          Your price
        </h2>
        <p role="status" aria-live="polite" className="text-sm text-walnut-500">
          {isPricing ? 'Pricing…' : ''}
        </p>
      </div>
      {isEmpty ? (
        <p className="mt-2 text-sm text-walnut-700">
          Add a border, a name or a motif and the price appears here, line by line.
        </p>
      ) : preview.isError && !isPricing ? (
        <div className="mt-3">
          <ErrorNotice message={preview.error.message} />
        </div>
      ) : preview.data ? (
        <div className={`mt-3 transition-opacity ${isPricing ? 'opacity-60' : ''}`}>
          <QuoteLines quote={preview.data.quote} />
          {preview.data.placements.some((placement) => placement.isPriceProvisional) && (
            <p className="mt-3 rounded-lg border border-saffron-500/50 bg-saffron-100 p-3 text-sm">
              The studio will confirm the price after digitizing your picture: they turn it into stitches by hand, then
              tell you the final price before anything is made or charged.
            </p>
          )}
          <MakingNotes preview={preview.data} />
        </div>
      ) : (
        <p className="mt-2 text-sm text-walnut-500">Working out your price…</p>
      )}
    </section>
  );
}
