import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { helmetPerRequest, securityHeaders } from '../../../server/src/middleware/security-headers.ts';

/** The headers an app with one middleware answers a GET with, less those every Express answer has anyway. */
async function headersFrom(middleware: express.RequestHandler): Promise<Record<string, string>> {
  const app = express();
  app.disable('x-powered-by');
  app.use(middleware);
  app.get('/', (_req, res) => {
    res.json({ ok: true });
  });
  const res = await request(app).get('/').expect(200);
  const { date: _date, connection: _connection, 'keep-alive': _keepAlive, ...rest } = res.headers;
  return rest as Record<string, string>;
}

describe('security headers worked out once', () => {
  for (const isCookieSecure of [false, true]) {
    it(`when the shop ${isCookieSecure ? 'is' : 'is not'} behind HTTPS, then every answer gets exactly the headers helmet sets per request`, async () => {
      const once = await headersFrom(securityHeaders({ isCookieSecure }));
      const perRequest = await headersFrom(helmetPerRequest({ isCookieSecure }));
      expect(once).toEqual(perRequest);
      expect(once['content-security-policy']).toContain("frame-ancestors 'none'");
      expect(once['x-content-type-options']).toBe('nosniff');
      expect('strict-transport-security' in once).toBe(isCookieSecure);
    });
  }
});
