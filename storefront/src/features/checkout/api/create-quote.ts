import { useMutation } from '@tanstack/react-query';
import { storedQuoteResponse, type CreateQuoteRequest } from '@server/contracts/stored-quotes.ts';
import { apiRequest } from '@ui/api-client.ts';

/** Prices the design on the server and keeps the quote, which an order then takes its totals from. */
export const createQuote = (request: CreateQuoteRequest) =>
  apiRequest('/quotes', storedQuoteResponse, { method: 'POST', body: request });

// A stored quote is a new row each time, so it is a mutation; the page asks again whenever quantity or rush change.
export const useCreateQuote = () => useMutation({ mutationFn: createQuote });
