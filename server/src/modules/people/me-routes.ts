import { Router } from 'express';
import { currentUserOf, requireSignIn } from '../../auth/roles.ts';
import type { MeResponse } from '../../contracts/users.ts';

export function createMeRouter(): Router {
  const router = Router();
  router.get('/', requireSignIn, (req, res) => {
    const body: MeResponse = { user: currentUserOf(req)! };
    res.json(body);
  });
  return router;
}
