import { Router, type Request } from 'express';
import { artworkOwnerOf } from '../artwork/artwork-owner.ts';
import { quotePreviewRequest } from '../../contracts/quotes.ts';
import { createQuoteRequest, quoteIdParams } from '../../contracts/stored-quotes.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { QuoteService } from './quote-service.ts';
import type { StoredQuoteService } from './stored-quote-service.ts';

declare module 'express-session' {
  interface SessionData {
    /** Quotes a visitor made before signing in, so they can open them again. */
    quoteIds?: number[];
  }
}

/** A visitor's session remembers this many of its latest quotes. */
const REMEMBERED_VISITOR_QUOTES = 20;

const viewerOf = (req: Request) => ({
  customerId: currentUserOf(req)?.id ?? null,
  sessionQuoteIds: req.session?.quoteIds ?? [],
});

/** Quotes for anyone, signed in or not: a visitor prices a design before making an account. */
export function createQuotesRouter(deps: { quotes: QuoteService; storedQuotes: StoredQuoteService }): Router {
  const router = Router();
  router.post(
    '/preview',
    validated({ body: quotePreviewRequest }, async ({ body }, req, res) => {
      sendResult(res, await deps.quotes.preview(body, artworkOwnerOf(req)));
    }),
  );
  router.post(
    '/',
    validated({ body: createQuoteRequest }, async ({ body }, req, res) => {
      const viewer = viewerOf(req);
      const result = await deps.storedQuotes.create(body, viewer.customerId);
      if (result.ok && viewer.customerId === null)
        req.session.quoteIds = [...viewer.sessionQuoteIds, result.value.quoteId].slice(-REMEMBERED_VISITOR_QUOTES);
      sendResult(res, result, 201);
    }),
  );
  // When an order placed today could be ready, for the designer's price panel (before any quote is stored).
  router.get('/ready-dates', async (_req, res) => {
    res.json(await deps.storedQuotes.readyDatesToday());
  });
  router.get(
    '/:id',
    validated({ params: quoteIdParams }, async ({ params }, req, res) => {
      sendResult(res, await deps.storedQuotes.get(params.id, viewerOf(req)));
    }),
  );
  return router;
}
