import { Router } from 'express';
import type { Db } from '../../db/knex.ts';
import { shopSettings } from '../../contracts/admin-settings.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { requireOwner } from '../../auth/require-owner.ts';
import { readShopSettings, updateShopSettings } from './shop-settings-repo.ts';
import { HttpError } from '../../middleware/http-error.ts';
import { validate } from '../../middleware/validate.ts';

const missing = () => new HttpError('conflict', 'The studio has no settings yet; run the set-up first.');

/** The machine's pace and the studio's capacity: staff read them, the owner changes them. */
export function createAdminSettingsRouter(deps: { db: Db; now: () => Date }): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    const settings = await readShopSettings(deps.db);
    if (!settings) throw missing();
    res.json({ settings, canEdit: currentUserOf(req)!.role === 'owner' });
  });
  router.put('/', requireOwner('change the shop settings'), validate(shopSettings), async (req, res) => {
    if (!(await updateShopSettings(deps.db, req.body, deps.now()))) throw missing();
    res.json({ settings: await readShopSettings(deps.db), canEdit: true });
  });
  return router;
}
