import { Router } from 'express';
import { currentUserOf, requireSignIn } from '../../auth/roles.ts';
import { savedAddressParams } from '../../contracts/saved-addresses.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { CustomerAddressService } from './customer-address-service.ts';

/** The signed-in customer's saved addresses: listed for checkout, and forgotten one at a time. */
export function createAddressesRouter(deps: { addresses: CustomerAddressService }): Router {
  const router = Router();
  router.use(requireSignIn);
  router.get('/', async (req, res) => {
    sendResult(res, await deps.addresses.list(currentUserOf(req)!.id));
  });
  router.delete(
    '/:id',
    validated({ params: savedAddressParams }, async ({ params }, req, res) => {
      sendResult(res, await deps.addresses.forget(currentUserOf(req)!.id, params.id));
    }),
  );
  return router;
}
