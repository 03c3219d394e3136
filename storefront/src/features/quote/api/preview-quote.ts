import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { quotePreviewResponse, type QuotePreviewRequest } from '@server/contracts/quotes.ts';
import { apiRequest } from '@ui/api-client.ts';

/** Prices a design on the server without saving it. Every figure comes back from the server; nothing is trusted. */
export const previewQuote = (request: QuotePreviewRequest) =>
  apiRequest('/quotes/preview', quotePreviewResponse, { method: 'POST', body: request });

// Pricing does not change the server's state, so it is a query: cached per design, refetched when the design changes.
export const quotePreviewQuery = (request: QuotePreviewRequest) =>
  queryOptions({
    queryKey: ['quotes', 'preview', request],
    queryFn: () => previewQuote(request),
    staleTime: 60_000,
    placeholderData: keepPreviousData,
  });

export const useQuotePreview = (request: QuotePreviewRequest) => useQuery(quotePreviewQuery(request));
