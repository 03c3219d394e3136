import { Router } from 'express';
import { shopSettings } from '../../contracts/admin-settings.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { requireOwner } from '../../auth/require-owner.ts';
import { sendResult } from '../../middleware/send-result.ts';
import { validated } from '../../middleware/validate.ts';
import type { SettingsService } from './settings-service.ts';
import { shippingSettings } from '../../contracts/shipping.ts';
import type { ShippingSettingsService } from './shipping-settings-service.ts';

/** The machine's pace, the studio's capacity, delivery and pick-up: staff read them, the owner changes them. */
export function createAdminSettingsRouter(deps: {
  settings: SettingsService;
  shipping: ShippingSettingsService;
}): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    const settings = await deps.settings.read();
    if (!settings.ok) return sendResult(res, settings);
    res.json({ settings: settings.value, canEdit: currentUserOf(req)!.role === 'owner' });
  });
  router.put(
    '/',
    requireOwner('change the shop settings'),
    validated({ body: shopSettings }, async ({ body }, _req, res) => {
      const settings = await deps.settings.update(body);
      if (!settings.ok) return sendResult(res, settings);
      res.json({ settings: settings.value, canEdit: true });
    }),
  );
  router.get('/shipping', async (req, res) => {
    const settings = await deps.shipping.read();
    if (!settings.ok) return sendResult(res, settings);
    res.json({ settings: settings.value, canEdit: currentUserOf(req)!.role === 'owner' });
  });
  router.put(
    '/shipping',
    requireOwner('change delivery and pick-up'),
    validated({ body: shippingSettings }, async ({ body }, _req, res) => {
      const settings = await deps.shipping.update(body);
      if (!settings.ok) return sendResult(res, settings);
      res.json({ settings: settings.value, canEdit: true });
    }),
  );
  return router;
}
