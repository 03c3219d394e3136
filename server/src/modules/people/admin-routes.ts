import { Router } from 'express';
import type { z } from 'zod';
import { peopleQuery, personIdParams, setRoleRequest } from '../../contracts/admin-users.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { requireOwner } from '../../auth/require-owner.ts';
import { validate } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { PeopleService } from './people-service.ts';

/** People and the staff role: the owner's alone. */
export function createAdminUsersRouter(deps: { people: PeopleService }): Router {
  const router = Router();
  router.use(requireOwner('see and change who works in the studio'));
  router.get('/', validate(peopleQuery, 'query'), async (_req, res) => {
    res.json(await deps.people.list((res.locals.query as z.infer<typeof peopleQuery>).search || undefined));
  });
  router.put('/:id/role', validate(personIdParams, 'params'), validate(setRoleRequest), async (req, res) => {
    const { id } = res.locals.params as z.infer<typeof personIdParams>;
    sendResult(res, await deps.people.setRole(currentUserOf(req)!, id, req.body.role));
  });
  return router;
}
