import { Router, type Request } from 'express';
import { currentUserOf, requireSignIn } from '../../auth/roles.ts';
import { designIdParams, saveDesignRequest } from '../../contracts/saved-designs.ts';
import { renameDesignRequest } from '../../contracts/design-sharing.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { DesignService } from './design-service.ts';
import type { DesignSharingService } from './design-sharing-service.ts';

/** The signed-in person's id; requireSignIn runs first on this router, so there always is one. */
const customerIdOf = (req: Request) => currentUserOf(req)!.id;

/** A customer's saved designs: signed in only, and each person reaches only their own. */
export function createDesignsRouter(deps: { designs: DesignService; sharing: DesignSharingService }): Router {
  const router = Router();
  router.use(requireSignIn);
  router.get('/', async (req, res) => {
    sendResult(res, await deps.designs.list(customerIdOf(req)));
  });
  router.post(
    '/',
    validated({ body: saveDesignRequest }, async ({ body }, req, res) => {
      sendResult(res, await deps.designs.create(customerIdOf(req), body), 201);
    }),
  );
  router.get(
    '/:id',
    validated({ params: designIdParams }, async ({ params: { id } }, req, res) => {
      sendResult(res, await deps.designs.get(customerIdOf(req), id));
    }),
  );
  router.put(
    '/:id',
    validated({ params: designIdParams, body: saveDesignRequest }, async ({ params: { id }, body }, req, res) => {
      sendResult(res, await deps.designs.update(customerIdOf(req), id, body));
    }),
  );
  router.delete(
    '/:id',
    validated({ params: designIdParams }, async ({ params: { id } }, req, res) => {
      const result = await deps.designs.remove(customerIdOf(req), id);
      if (result.ok) res.status(204).end();
      else sendResult(res, result);
    }),
  );
  router.patch(
    '/:id',
    validated({ params: designIdParams, body: renameDesignRequest }, async ({ params: { id }, body }, req, res) => {
      sendResult(res, await deps.designs.rename(customerIdOf(req), id, body.name));
    }),
  );
  router.post(
    '/:id/duplicate',
    validated({ params: designIdParams }, async ({ params: { id } }, req, res) => {
      sendResult(res, await deps.designs.duplicate(customerIdOf(req), id), 201);
    }),
  );
  router.post(
    '/:id/share',
    validated({ params: designIdParams }, async ({ params: { id } }, req, res) => {
      sendResult(res, await deps.sharing.share(customerIdOf(req), id));
    }),
  );
  router.delete(
    '/:id/share',
    validated({ params: designIdParams }, async ({ params: { id } }, req, res) => {
      const result = await deps.sharing.unshare(customerIdOf(req), id);
      if (result.ok) res.status(204).end();
      else sendResult(res, result);
    }),
  );
  return router;
}
