import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { loadDatabaseConfig } from '../../server/src/config.ts';
import { openDatabase } from '../../server/src/db/knex.ts';
import { createHealthService } from '../../server/src/modules/health/health-service.ts';
import { createHealthRouter } from '../../server/src/modules/health/routes.ts';
import { localStack } from '../../scripts/stack.ts';
import { useApiHarness } from '../support/api-harness.ts';

const harness = useApiHarness();
// Port 9 (discard) has nothing listening on loopback here: every connection is refused at once.
const unreachable = openDatabase({ ...loadDatabaseConfig({ ...process.env, ...localStack('test').env }), port: 9 });
afterAll(async () => {
  await unreachable.destroy();
});

const healthApp = (isDraining: () => boolean, db = unreachable) =>
  express().use('/api/health', createHealthRouter({ health: createHealthService({ db, isDraining }) }));

describe('health checks', () => {
  it('when a proxy asks, then liveness and readiness answer 200 without starting a session', async () => {
    const live = await harness.agent().get('/api/health').expect(200);
    expect(live.body).toEqual({ ok: true });
    expect(live.headers['set-cookie']).toBeUndefined();
    const ready = await harness.agent().get('/api/health/ready').expect(200);
    expect(ready.body).toEqual({ ready: true, database: 'reachable', message: 'Ready.' });
  });

  it('when the database cannot be reached, then readiness is 503 and says so', async () => {
    const res = await request(healthApp(() => false))
      .get('/api/health/ready')
      .expect(503);
    expect(res.body).toEqual({
      ready: false,
      database: 'unreachable',
      message: 'This server cannot reach its database.',
    });
    await request(healthApp(() => false))
      .get('/api/health')
      .expect(200);
  });

  it('when the server is shutting down, then readiness is 503 so the proxy sends work elsewhere', async () => {
    const res = await request(healthApp(() => true, harness.db))
      .get('/api/health/ready')
      .expect(503);
    expect(res.body).toMatchObject({ ready: false, database: 'reachable', message: 'This server is shutting down.' });
  });
});
