import { Router } from 'express';
import type { z } from 'zod';
import { orderNumberParams } from '../../contracts/admin-orders.ts';
import { productionSheetPdfQuery } from '../../contracts/production-sheet.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validate } from '../../middleware/validate.ts';
import type { ProductionSheetService } from './production-sheet-service.ts';

/** An approved order's production sheet, as data for the studio page and as a printable PDF. */
export function createProductionSheetRouter(deps: { sheets: ProductionSheetService }): Router {
  const router = Router();
  router.get('/:number/production-sheet', validate(orderNumberParams, 'params'), async (_req, res) => {
    const { number } = res.locals.params as z.infer<typeof orderNumberParams>;
    sendResult(res, await deps.sheets.get(number));
  });
  router.get(
    '/:number/production-sheet.pdf',
    validate(orderNumberParams, 'params'),
    validate(productionSheetPdfQuery, 'query'),
    async (_req, res) => {
      const { number } = res.locals.params as z.infer<typeof orderNumberParams>;
      const { paper } = res.locals.query as z.infer<typeof productionSheetPdfQuery>;
      const pdf = await deps.sheets.pdf(number, paper);
      if (!pdf.ok) {
        sendResult(res, pdf);
        return;
      }
      res.type('application/pdf');
      res.set('Content-Disposition', `attachment; filename="production-sheet-${number}-${paper}.pdf"`);
      res.send(pdf.value);
    },
  );
  return router;
}
