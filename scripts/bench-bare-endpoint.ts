/**
 * The bare endpoint `npm run bench:api` measures the server against: Express 5 with its JSON body parser, one
 * route per scenario answering the body the real server gave (BARE_ROUTES), and nothing else.
 */
import express from 'express';

const routes = JSON.parse(process.env.BARE_ROUTES ?? '[]') as { method: 'GET' | 'POST'; path: string; body: string }[];
const app = express();
app.use(express.json({ limit: '1mb' }));
app.get('/api/health', (_req, res) => {
  res.json({ ok: true });
});
for (const route of routes) {
  const answer = JSON.parse(route.body);
  app[route.method === 'GET' ? 'get' : 'post'](route.path, (_req, res) => {
    res.json(answer);
  });
}
const server = app.listen(Number(process.env.PORT), '127.0.0.1');
process.on('SIGTERM', () => server.close(() => process.exit(0)));
