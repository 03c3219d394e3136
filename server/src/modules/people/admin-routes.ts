import { Router } from 'express';
import { peopleQuery, personIdParams, setRoleRequest } from '../../contracts/admin-users.ts';
import { currentUserOf } from '../../auth/roles.ts';
import { requireOwner } from '../../auth/require-owner.ts';
import { validated } from '../../middleware/validate.ts';
import { sendResult } from '../../middleware/send-result.ts';
import type { PeopleService } from './people-service.ts';

/** People and the staff role: the owner's alone. */
export function createAdminUsersRouter(deps: { people: PeopleService }): Router {
  const router = Router();
  router.use(requireOwner('see and change who works in the studio'));
  router.get(
    '/',
    validated({ query: peopleQuery }, async ({ query }, _req, res) => {
      res.json(await deps.people.list(query.search || undefined));
    }),
  );
  router.put(
    '/:id/role',
    validated({ params: personIdParams, body: setRoleRequest }, async ({ params, body }, req, res) => {
      sendResult(res, await deps.people.setRole(currentUserOf(req)!, params.id, body.role));
    }),
  );
  return router;
}
