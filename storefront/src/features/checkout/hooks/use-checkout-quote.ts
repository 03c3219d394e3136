import { useEffect, useState } from 'react';
import type { DesignDocument } from '@server/contracts/designs.ts';
import type { StoredQuoteResponse } from '@server/contracts/stored-quotes.ts';
import type { ShippingMethod } from '@server/contracts/shipping.ts';
import { useCreateQuote } from '../api/create-quote.ts';

/** Wait this long after the last change before asking for a new quote. */
const SETTLE_MS = 300;

/** The design as it will be ordered: the saved design, perhaps carried to another size at checkout. */
export interface OrderedDesign {
  id: number;
  garmentId: number;
  sizeId: number;
  colourId: number;
  document: DesignDocument;
}

/**
 * The stored quote for the design at this quantity and pace, asked for again whenever they change; the last
 * quote stays on show while the next is priced.
 */
export function useCheckoutQuote(
  design: OrderedDesign | undefined,
  quantity: number,
  isRush: boolean,
  shippingMethod?: ShippingMethod,
) {
  const create = useCreateQuote();
  const [priced, setPriced] = useState<{ key: string; quote: StoredQuoteResponse }>();
  const { mutate } = create;
  const key = design
    ? JSON.stringify([design.id, design.sizeId, design.document, quantity, isRush, shippingMethod])
    : '';
  useEffect(() => {
    if (!design) return;
    const timer = setTimeout(() => {
      const request = {
        designId: design.id,
        garmentId: design.garmentId,
        sizeId: design.sizeId,
        colourId: design.colourId,
        document: design.document,
        quantity,
        isRush,
        ...(shippingMethod ? { shippingMethod } : {}),
      };
      mutate(request, { onSuccess: (quote) => setPriced({ key, quote }) });
    }, SETTLE_MS);
    return () => clearTimeout(timer);
  }, [design, quantity, isRush, shippingMethod, mutate, key]);
  return { quote: priced?.quote, isPricing: create.isPending || priced?.key !== key, error: create.error };
}
