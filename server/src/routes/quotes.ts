import { Router } from 'express';
import { artworkOwnerOf } from '../auth/artwork-owner.ts';
import { quotePreviewRequest } from '../contracts/quotes.ts';
import { validate } from '../middleware/validate.ts';
import { sendResult } from '../middleware/send-result.ts';
import type { QuoteService } from '../services/quote-service.ts';

/** Quotes for anyone, signed in or not: a visitor prices a design before making an account. */
export function createQuotesRouter(deps: { quotes: QuoteService }): Router {
  const router = Router();
  router.post('/preview', validate(quotePreviewRequest), async (req, res) => {
    sendResult(res, await deps.quotes.preview(req.body, artworkOwnerOf(req)));
  });
  return router;
}
