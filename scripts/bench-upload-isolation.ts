/**
 * Isolation benchmark (issue 10, "Heavy work off the request thread"): the quote rate other visitors get while one
 * client keeps the server busy with the largest artwork it accepts, against their rate without that client.
 * Target: at least 0.7 × the undisturbed rate. Three rounds; each round interleaves CYCLES short windows of each of
 * three conditions, so that the load of anything else on the machine falls on all three alike:
 *   1. others alone: OTHER_CLIENTS loops, each posting /api/quotes/preview (the seeded daisy-chain dress) back to
 *      back, one request in flight per loop;
 *   2. the same, plus one client quoting its own largest allowed SVG (MAX_SVG_PATH_SEGMENTS segments) back to back
 *      one request at a time, as one browser sends them;
 *   3. the same, plus one client uploading that SVG back to back (a new visitor each time, so each upload is
 *      checked and measured in full) one at a time.
 * It also times the refusal of a 45-byte PNG declaring 20,000 × 20,000 px. The server runs as its own process, as
 * in production, against the scratch database `hoopwright_bench` (the order-board benchmark's; created here, dropped at the end).
 * Run with `npm run bench:isolation`.
 */
import { setTimeout as sleep } from 'node:timers/promises';
import { MAX_SVG_PATH_SEGMENTS } from '../server/src/engine/index.ts';
import { daisyDressQuote, artworkDressQuote } from '../tests/support/sample-designs.ts';
import { pngDeclaring, svgWithPathSegments } from '../tests/support/hostile-files.ts';
import {
  dropLocalDatabase,
  localDatabaseSettings,
  recreateLocalDatabase,
  startLocalDatabase,
  stopLocalDatabase,
} from './db-lifecycle.ts';
import { localStack, migrateAndSeed, startServerProcess, stopProcess, type LocalStack } from './stack.ts';

const DATABASE = 'hoopwright_bench';
const ROUNDS = 3;
const WINDOW_MS = 2_000;
const CYCLES = 4;
const OTHER_CLIENTS = 8;
/** One client, as a browser is: one request at a time, back to back. */
const HEAVY_LOOPS = 1;
const TARGET_RATIO = 0.7;
const BOMB_SAMPLES = 20;
/** Away from the demo and test stacks' ports. */
const PORT_SHIFT = 57;

const base = localStack('test');
const port = base.ports.app + PORT_SHIFT;
const stack: LocalStack = {
  ...base,
  appOrigin: `http://127.0.0.1:${port}`,
  env: { ...base.env, DB_NAME: DATABASE, PORT: String(port), APP_ORIGIN: `http://127.0.0.1:${port}` },
};
const headers = { Origin: stack.appOrigin };
const largestArtwork = svgWithPathSegments(MAX_SVG_PATH_SEGMENTS - 1);

async function uploadArtwork(svg: string, cookie?: string): Promise<{ status: number; id?: number; cookie?: string }> {
  const form = new FormData();
  form.append('file', new Blob([svg], { type: 'image/svg+xml' }), 'drawing.svg');
  const res = await fetch(`${stack.appOrigin}/api/artwork`, {
    method: 'POST',
    body: form,
    headers: { ...headers, ...(cookie ? { Cookie: cookie } : {}) },
  });
  const body = (await res.json()) as { artwork?: { id: number } };
  return { status: res.status, id: body.artwork?.id, cookie: res.headers.get('set-cookie')?.split(';')[0] ?? cookie };
}

const postQuote = (body: unknown, cookie?: string) =>
  fetch(`${stack.appOrigin}/api/quotes/preview`, {
    method: 'POST',
    headers: { ...headers, 'Content-Type': 'application/json', ...(cookie ? { Cookie: cookie } : {}) },
    body: JSON.stringify(body),
  });

/** Runs `loops` back-to-back request loops until `stop` says so; answers how many succeeded and failed. */
async function loopUntil(loops: number, stop: () => boolean, call: () => Promise<Response | { status: number }>) {
  let done = 0;
  let failed = 0;
  await Promise.all(
    Array.from({ length: loops }, async () => {
      while (!stop()) {
        const res = await call();
        if ('text' in res) await res.text();
        if (res.status < 400) done += 1;
        else failed += 1;
      }
    }),
  );
  return { done, failed };
}

/** Others' quotes per second over one window, with `heavy` (if any) running beside them. */
async function othersRate(heavy?: () => Promise<Response | { status: number }>) {
  const endsAt = Date.now() + WINDOW_MS;
  const stop = () => Date.now() >= endsAt;
  const [others, load] = await Promise.all([
    loopUntil(OTHER_CLIENTS, stop, () => postQuote(daisyDressQuote)),
    heavy ? loopUntil(HEAVY_LOOPS, stop, heavy) : Promise.resolve({ done: 0, failed: 0 }),
  ]);
  if (others.failed > 0) throw new Error(`${others.failed} of the other clients' quotes failed.`);
  return { perSecond: others.done / (WINDOW_MS / 1000), heavyDone: load.done, heavyFailed: load.failed };
}

type Window = Awaited<ReturnType<typeof othersRate>>;

/** Windows of one condition taken together: the mean rate and the heavy client's totals. */
function combined(windows: Window[]): Window {
  return {
    perSecond: windows.reduce((sum, window) => sum + window.perSecond, 0) / windows.length,
    heavyDone: windows.reduce((sum, window) => sum + window.heavyDone, 0),
    heavyFailed: windows.reduce((sum, window) => sum + window.heavyFailed, 0),
  };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

const { started } = await startLocalDatabase();
let server: Awaited<ReturnType<typeof startServerProcess>> | undefined;
let exitCode = 0;
try {
  recreateLocalDatabase(DATABASE, { ...localDatabaseSettings(), databases: [DATABASE] });
  await migrateAndSeed(stack.env, 'always');
  server = await startServerProcess(stack, { quiet: true });

  const heavyClient = await uploadArtwork(largestArtwork);
  if (heavyClient.status !== 201 || !heavyClient.id)
    throw new Error(`The largest allowed artwork was refused (${heavyClient.status}).`);
  const heavyQuote = artworkDressQuote(heavyClient.id, 60);
  const check = await postQuote(heavyQuote, heavyClient.cookie);
  if (check.status !== 200) throw new Error(`Quoting the largest artwork answered ${check.status}.`);
  await check.text();

  const bombTimes: number[] = [];
  for (let i = 0; i < BOMB_SAMPLES; i += 1) {
    const startedAt = performance.now();
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(pngDeclaring(20_000, 20_000))], { type: 'image/png' }), 'tiny.png');
    const res = await fetch(`${stack.appOrigin}/api/artwork`, { method: 'POST', body: form, headers });
    await res.text();
    if (res.status !== 413) throw new Error(`The pixel bomb answered ${res.status}, not 413.`);
    bombTimes.push(performance.now() - startedAt);
  }

  console.log(
    `Load: ${OTHER_CLIENTS} other clients quoting the seeded daisy-chain dress back to back (1 request in flight each), ` +
      `${CYCLES} windows of ${WINDOW_MS / 1000} s per condition and round, interleaved; the heavy client keeps ${HEAVY_LOOPS} request in flight; server with ` +
      `HEAVY_WORK_THREADS=${process.env.HEAVY_WORK_THREADS ?? 'default'}, one Node process, on this machine.`,
  );
  console.log(`Largest allowed artwork: ${MAX_SVG_PATH_SEGMENTS - 1} path segments, ${largestArtwork.length} bytes.`);
  console.log(
    `Pixel bomb (45-byte PNG declaring 20,000 × 20,000 px): refused 413 in ${median(bombTimes).toFixed(1)} ms median over ${BOMB_SAMPLES}, max ${Math.max(...bombTimes).toFixed(1)} ms.`,
  );
  await othersRate(); // warm-up: fonts, catalogue, JIT
  for (let round = 1; round <= ROUNDS; round += 1) {
    const windows = { alone: [] as Window[], quoting: [] as Window[], uploading: [] as Window[] };
    for (let cycle = 0; cycle < CYCLES; cycle += 1) {
      windows.alone.push(await othersRate());
      windows.quoting.push(await othersRate(() => postQuote(heavyQuote, heavyClient.cookie)));
      windows.uploading.push(await othersRate(() => uploadArtwork(largestArtwork)));
    }
    const [alone, quoting, uploading] = [windows.alone, windows.quoting, windows.uploading].map(combined);
    const ratio = (rate: number) => (rate / alone.perSecond).toFixed(2);
    console.log(
      `Round ${round}: others alone ${alone.perSecond.toFixed(1)} quotes/s; ` +
        `with the heavy client quoting ${quoting.perSecond.toFixed(1)}/s (${ratio(quoting.perSecond)} ×; it made ${quoting.heavyDone} quotes); ` +
        `with it uploading ${uploading.perSecond.toFixed(1)}/s (${ratio(uploading.perSecond)} ×; ${uploading.heavyDone} uploads, ${uploading.heavyFailed} refused).`,
    );
    // The target is for the quoting client; the uploading one is shown beside it.
    if (quoting.perSecond / alone.perSecond < TARGET_RATIO) exitCode = 1;
  }
  console.log(
    exitCode === 0
      ? `With the heavy client quoting, others kept at least ${TARGET_RATIO} × their rate in every round.`
      : `With the heavy client quoting, others fell below ${TARGET_RATIO} × their rate in some round.`,
  );
} catch (error) {
  console.error(error);
  exitCode = 1;
} finally {
  await stopProcess(server);
  await sleep(200);
  dropLocalDatabase(DATABASE);
  if (started) await stopLocalDatabase();
}
process.exit(exitCode);
