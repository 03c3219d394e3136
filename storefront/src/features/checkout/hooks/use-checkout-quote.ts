import { useEffect, useState } from 'react';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import type { StoredQuoteResponse } from '@server/contracts/stored-quotes.ts';
import { useCreateQuote } from '../api/create-quote.ts';

/** Wait this long after the last change before asking for a new quote. */
const SETTLE_MS = 300;

/**
 * The stored quote for the design at this quantity and pace, asked for again whenever either changes; the last
 * quote stays on show while the next is priced. `replace` takes a quote the server made itself (a repricing).
 */
export function useCheckoutQuote(design: SavedDesign | undefined, quantity: number, isRush: boolean) {
  const create = useCreateQuote();
  const [quote, setQuote] = useState<StoredQuoteResponse>();
  const { mutate } = create;
  useEffect(() => {
    if (!design) return;
    const timer = setTimeout(() => {
      mutate(
        { designId: design.id, garmentId: design.garmentId, sizeId: design.sizeId, colourId: design.colourId, document: design.document, quantity, isRush },
        { onSuccess: setQuote },
      );
    }, SETTLE_MS);
    return () => clearTimeout(timer);
  }, [design, quantity, isRush, mutate]);
  const isCurrent = quote !== undefined && quote.quantity === quantity && quote.isRush === isRush;
  return { quote, isPricing: create.isPending || !isCurrent, error: create.error, replace: setQuote };
}
