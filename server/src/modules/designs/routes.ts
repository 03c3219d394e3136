import { Router, type Request } from 'express';
import type { z } from 'zod';
import { currentUserOf, requireSignIn } from '../../auth/roles.ts';
import { designIdParams, saveDesignRequest } from '../../contracts/saved-designs.ts';
import { renameDesignRequest } from '../../contracts/design-sharing.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { DesignService } from './design-service.ts';
import type { DesignSharingService } from './design-sharing-service.ts';

type DesignIdParams = z.infer<typeof designIdParams>;

/** The signed-in person's id; requireSignIn runs first on this router, so there always is one. */
const customerIdOf = (req: Request) => currentUserOf(req)!.id;

/** A customer's saved designs: signed in only, and each person reaches only their own. */
export function createDesignsRouter(deps: { designs: DesignService; sharing: DesignSharingService }): Router {
  const router = Router();
  router.use(requireSignIn);
  router.get('/', async (req, res) => {
    sendResult(res, await deps.designs.list(customerIdOf(req)));
  });
  router.post('/', validate(saveDesignRequest), async (req, res) => {
    sendResult(res, await deps.designs.create(customerIdOf(req), req.body), 201);
  });
  router.get('/:id', validate(designIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    sendResult(res, await deps.designs.get(customerIdOf(req), id));
  });
  router.put('/:id', validate(designIdParams, 'params'), validate(saveDesignRequest), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    sendResult(res, await deps.designs.update(customerIdOf(req), id, req.body));
  });
  router.delete('/:id', validate(designIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    const result = await deps.designs.remove(customerIdOf(req), id);
    if (result.ok) res.status(204).end();
    else sendResult(res, result);
  });
  router.patch('/:id', validate(designIdParams, 'params'), validate(renameDesignRequest), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    sendResult(res, await deps.designs.rename(customerIdOf(req), id, req.body.name));
  });
  router.post('/:id/duplicate', validate(designIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    sendResult(res, await deps.designs.duplicate(customerIdOf(req), id), 201);
  });
  router.post('/:id/share', validate(designIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    sendResult(res, await deps.sharing.share(customerIdOf(req), id));
  });
  router.delete('/:id/share', validate(designIdParams, 'params'), async (req, res) => {
    const { id } = res.locals.params as DesignIdParams;
    const result = await deps.sharing.unshare(customerIdOf(req), id);
    if (result.ok) res.status(204).end();
    else sendResult(res, result);
  });
  return router;
}
