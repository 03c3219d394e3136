import { Router } from 'express';
import type { HealthService } from './health-service.ts';

/** `/api/health`: liveness (the process answers) and `/ready`: readiness (it can do work), 503 when not. */
export function createHealthRouter(deps: { health: HealthService }): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.json({ ok: true });
  });
  router.get('/ready', async (_req, res) => {
    const readiness = await deps.health.readiness();
    res.status(readiness.ready ? 200 : 503).json(readiness);
  });
  return router;
}
