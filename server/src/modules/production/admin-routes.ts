import { Router } from 'express';
import { orderNumberParams } from '../../contracts/admin-orders.ts';
import { productionSheetPdfQuery } from '../../contracts/production-sheet.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validated } from '../../middleware/validate.ts';
import type { ProductionSheetService } from './production-sheet-service.ts';

/**
 * An approved order's production sheet, as data for the studio page and as a printable PDF. The orders module
 * mounts it inside its /api/admin/orders router.
 */
export function createProductionSheetRouter(deps: { sheets: ProductionSheetService }): Router {
  const router = Router();
  router.get(
    '/:number/production-sheet',
    validated({ params: orderNumberParams }, async ({ params }, _req, res) => {
      sendResult(res, await deps.sheets.get(params.number));
    }),
  );
  router.get(
    '/:number/production-sheet.pdf',
    validated({ params: orderNumberParams, query: productionSheetPdfQuery }, async ({ params, query }, _req, res) => {
      const pdf = await deps.sheets.pdf(params.number, query.paper);
      if (!pdf.ok) return sendResult(res, pdf);
      res.type('application/pdf');
      res.set('Content-Disposition', `attachment; filename="production-sheet-${params.number}-${query.paper}.pdf"`);
      res.send(pdf.value);
    }),
  );
  return router;
}
