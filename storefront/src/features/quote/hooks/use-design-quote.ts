import { useQuery } from '@tanstack/react-query';
import type { QuotePreviewRequest } from '@server/contracts/quotes.ts';
import { quotePreviewQuery } from '../api/preview-quote.ts';
import { useDebouncedValue } from '@ui/hooks/use-debounced-value.ts';

/** Long enough to wait out a run of arrow presses or typing, short enough to feel live. */
const SETTLE_MS = 300;

/**
 * The server's price for a design, asked for once the customer pauses; an empty design is not sent. The last
 * price stays available while the next is worked out (`isPricing`).
 */
export function useDesignQuote(request: QuotePreviewRequest) {
  const settled = useDebouncedValue(request, SETTLE_MS);
  const isEmpty = request.document.placements.length === 0;
  const preview = useQuery({ ...quotePreviewQuery(settled), enabled: settled.document.placements.length > 0 });
  const isPricing = !isEmpty && (settled !== request || preview.isFetching);
  return { preview, isEmpty, isPricing };
}
