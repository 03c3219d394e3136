import { expect, test } from '@playwright/test';

test('when the catalogue page loads, then its JavaScript goes out compressed and kept for good, and the page itself is checked again each time', async ({
  page,
  request,
}) => {
  const scripts: { url: string; encoding?: string; bytes: number }[] = [];
  page.on('response', (response) => {
    if (response.url().endsWith('.js'))
      scripts.push({
        url: response.url(),
        encoding: response.headers()['content-encoding'],
        bytes: Number(response.headers()['content-length'] ?? Number.POSITIVE_INFINITY),
      });
  });
  await page.goto('/');
  await page.waitForLoadState('networkidle');
  // Chromium asks for gzip over plain http and brotli only over https, so the browser's own download is gzip here.
  expect(scripts.length).toBeGreaterThan(0);
  // A chunk of a few bytes has no compressed copy (it would not be smaller); every other one goes out compressed.
  const plain = scripts.filter((script) => script.encoding !== 'gzip' && script.encoding !== 'br');
  expect(plain.filter((script) => script.bytes >= 1024)).toEqual([]);

  const entry = new URL(scripts.find((script) => script.encoding)!.url).pathname;
  const brotli = await request.get(entry, { headers: { 'Accept-Encoding': 'br, gzip' } });
  expect(brotli.headers()['content-encoding']).toBe('br');
  expect(brotli.headers()['content-type']).toContain('javascript');
  expect(brotli.headers()['cache-control']).toBe('public, max-age=31536000, immutable');
  const gzip = await request.get(entry, { headers: { 'Accept-Encoding': 'gzip' } });
  expect(gzip.headers()['content-encoding']).toBe('gzip');
  expect(await gzip.text()).toBe(await brotli.text());

  const index = await request.get('/', { headers: { 'Accept-Encoding': 'br, gzip' } });
  expect(index.headers()['cache-control']).toBe('no-cache');
});
