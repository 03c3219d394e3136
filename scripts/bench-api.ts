/**
 * API benchmark (issue 13): the real server (its own process, on the test stack's database and ports, with the
 * local stand-ins) against a bare Express endpoint (also its own process) that answers the same bytes without
 * doing any work, driven by autocannon with 64 connections, alternately, for three rounds of: quote preview (a
 * dress, a border of many repeats, a name, two motifs), the catalogue list and a garment page. Targets: quote
 * preview at least 0.4 × the bare requests per second, the catalogue list at least 0.5 ×, and the quote's p99 at
 * most 4 × the bare endpoint's in the same run. The machine may be shared, so each run prints the load beside it.
 * Run with `npm run bench:api`.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { garmentDetailResponse, garmentListResponse } from '../server/src/contracts/catalogue.ts';
import { quotePreviewResponse, type QuotePreviewRequest } from '../server/src/contracts/quotes.ts';
import {
  localDatabasePid,
  projectRoot,
  recreateLocalDatabase,
  startLocalDatabase,
  stopLocalDatabase,
} from './db-lifecycle.ts';
import {
  localStack,
  migrateAndSeed,
  startLocalFakes,
  startServerProcess,
  stopProcess,
  waitForHealth,
} from './stack.ts';

const CONNECTIONS = 64;
const RUN_SECONDS = Number(process.env.BENCH_SECONDS ?? 6);
const ROUNDS = 3;
const TARGETS = { preview: 0.4, garments: 0.5, previewP99: 4 };

interface Scenario {
  name: 'preview' | 'garments' | 'garment';
  label: string;
  path: string;
  bareBody: string;
  method: 'GET' | 'POST';
  body?: string;
}

interface Figures {
  requestsPerSecond: number;
  p99Ms: number;
  errors: number;
  /** CPU time the serving process (and MariaDB, for the app) spent per answered request: a figure load moves less. */
  cpuMsPerRequest: number;
  databaseCpuMsPerRequest: number;
}

/** A process's CPU time so far in ms (user + system, every thread), from /proc (Linux). */
function cpuMsOf(pid: number | undefined): number {
  if (!pid) return 0;
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
    // utime and stime are fields 14 and 15 of proc(5), in clock ticks (100 a second on Linux).
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return 0;
  }
}

const stack = localStack('test');
const barePort = stack.ports.app + 50;
const bareOrigin = `http://127.0.0.1:${barePort}`;
let server: ChildProcess | undefined;
let bare: ChildProcess | undefined;
let fakes: Awaited<ReturnType<typeof startLocalFakes>> | undefined;
let startedDatabase = false;

const loadNow = () => `load ${loadavg()[0].toFixed(2)}`;

async function fetchJson(path: string, init?: RequestInit): Promise<unknown> {
  const response = await fetch(`${stack.appOrigin}${path}`, {
    ...init,
    headers: { 'content-type': 'application/json', origin: stack.appOrigin },
  });
  if (!response.ok) throw new Error(`${path} answered ${response.status}: ${await response.text()}`);
  return response.json();
}

/** The benchmark's design on the seeded shop: the bishop dress's largest size, a border round its hem, a name, two motifs. */
async function previewRequest(): Promise<{ request: QuotePreviewRequest; garmentSlug: string }> {
  const list = garmentListResponse.parse(await fetchJson('/api/catalogue/garments'));
  const dress = list.garments.find((garment) => garment.slug === 'bishop-dress') ?? list.garments[0];
  const page = garmentDetailResponse.parse(await fetchJson(`/api/catalogue/garments/${dress.slug}`));
  const size = page.garment.sizes.at(-1)!;
  const zone = size.zones.find((z) => z.code !== 'hem')!;
  const at = (share: number) => ({
    zone: zone.code,
    centerXMm: zone.xMm + zone.widthMm * share,
    centerYMm: zone.yMm + zone.heightMm / 2,
    rotationDeg: 0,
  });
  const request: QuotePreviewRequest = {
    garmentId: dress.id,
    sizeId: size.id,
    colourId: page.garment.colours[0].id,
    quantity: 3,
    isRush: false,
    document: {
      version: 1,
      placements: [
        {
          id: 'hem',
          kind: 'border',
          zone: 'hem',
          motif: 'scallop-and-dot',
          run: 'circumference',
          hemOffsetMm: 20,
          threads: ['WB-108'],
        },
        {
          id: 'name',
          kind: 'lettering',
          ...at(0.5),
          text: 'Amelia',
          font: 'rounded-block',
          letterHeightMm: 14,
          thread: 'WB-110',
        },
        {
          id: 'lamb',
          kind: 'motif',
          ...at(0.25),
          motif: 'little-lamb',
          scalePct: 90,
          threads: ['WB-127', 'WB-102', 'WB-109'],
        },
        {
          id: 'stars',
          kind: 'motif',
          ...at(0.75),
          motif: 'star-and-moon',
          scalePct: 90,
          threads: ['WB-129', 'WB-103'],
        },
      ],
    },
  };
  return { request, garmentSlug: dress.slug };
}

/** Starts the bare endpoint: Express 5, one route per scenario, each answering a fixed body. */
async function startBareEndpoint(scenarios: Scenario[]): Promise<ChildProcess> {
  // The same Node flags as the app's server (stack.ts), so only the work differs.
  const child = spawn(
    process.execPath,
    ['--max-semi-space-size=64', '--import', 'tsx', join(projectRoot, 'scripts/bench-bare-endpoint.ts')],
    {
      cwd: projectRoot,
      env: {
        ...process.env,
        PORT: String(barePort),
        BARE_ROUTES: JSON.stringify(scenarios.map(({ method, path, bareBody }) => ({ method, path, body: bareBody }))),
      },
      stdio: ['ignore', 'ignore', 'inherit'],
    },
  );
  await waitForHealth(child, bareOrigin, 'The bare endpoint');
  return child;
}

async function drive(origin: string, scenario: Scenario, seconds: number): Promise<Figures> {
  const servingPid = origin === bareOrigin ? bare?.pid : server?.pid;
  const databasePid = origin === bareOrigin ? undefined : localDatabasePid();
  const [cpuBefore, databaseBefore] = [cpuMsOf(servingPid), cpuMsOf(databasePid)];
  const result = await autocannon({
    url: `${origin}${scenario.path}`,
    connections: CONNECTIONS,
    duration: seconds,
    method: scenario.method,
    headers: { 'content-type': 'application/json', origin: stack.appOrigin },
    ...(scenario.body ? { body: scenario.body } : {}),
  });
  const answered = Math.max(1, result.requests.total);
  return {
    requestsPerSecond: result.requests.average,
    p99Ms: result.latency.p99,
    errors: result.errors + result.non2xx + result.timeouts,
    cpuMsPerRequest: (cpuMsOf(servingPid) - cpuBefore) / answered,
    databaseCpuMsPerRequest: (cpuMsOf(databasePid) - databaseBefore) / answered,
  };
}

/**
 * Waits until a process has finished starting: its worker threads load their code after the server answers its
 * first health check, and that CPU would otherwise be counted against the first round. Settled means under 5 % of a
 * core over half a second (at most 60 s).
 */
async function settled(pid: number | undefined): Promise<void> {
  for (let waited = 0, before = cpuMsOf(pid); waited < 60_000; waited += 500) {
    await new Promise((resolve) => setTimeout(resolve, 500));
    const now = cpuMsOf(pid);
    if (now - before < 25) return;
    before = now;
  }
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const rate = (figures: Figures) =>
  `${figures.requestsPerSecond.toFixed(0)} req/s, p99 ${figures.p99Ms} ms${figures.errors ? `, ${figures.errors} errors` : ''}`;
const cpu = (figures: Figures) =>
  `${figures.cpuMsPerRequest.toFixed(3)} ms${figures.databaseCpuMsPerRequest ? ` + MariaDB ${figures.databaseCpuMsPerRequest.toFixed(3)} ms` : ''}`;

async function main(): Promise<void> {
  console.log(
    `API benchmark: ${cpus().length} cores, ${CONNECTIONS} connections, ${RUN_SECONDS} s a run, ${loadNow()}`,
  );
  startedDatabase = (await startLocalDatabase()).started;
  recreateLocalDatabase('hoopwright_test');
  await migrateAndSeed(stack.env, 'always');
  fakes = await startLocalFakes(stack);
  server = await startServerProcess(stack, { isSilent: !process.env.BENCH_LOUD, onSpawn: (child) => (server = child) });

  const { request: preview, garmentSlug } = await previewRequest();
  const previewBody = JSON.stringify(preview);
  const answered = quotePreviewResponse.parse(
    await fetchJson('/api/quotes/preview', { method: 'POST', body: previewBody }),
  );
  const border = answered.placements.find((placement) => placement.id === 'hem')?.border;
  console.log(
    `The design: ${border?.count ?? 0} border repeats, a name, two motifs; ${answered.quote.totalCents} cents; ${previewBody.length} bytes asked, ${JSON.stringify(answered).length} answered.`,
  );
  // BENCH_DUMP=file keeps the answer for reading; BENCH_LOUD=1 lets the server's messages through.
  if (process.env.BENCH_DUMP) writeFileSync(process.env.BENCH_DUMP, JSON.stringify(answered, null, 1));
  const garments = await fetchJson('/api/catalogue/garments');
  const garmentPath = `/api/catalogue/garments/${garmentSlug}`;
  const garment = await fetchJson(garmentPath);
  const scenarios: Scenario[] = [
    {
      name: 'preview',
      label: 'quote preview',
      path: '/api/quotes/preview',
      method: 'POST',
      body: previewBody,
      bareBody: JSON.stringify(answered),
    },
    {
      name: 'garments',
      label: 'catalogue list',
      path: '/api/catalogue/garments',
      method: 'GET',
      bareBody: JSON.stringify(garments),
    },
    { name: 'garment', label: 'garment page', path: garmentPath, method: 'GET', bareBody: JSON.stringify(garment) },
  ];
  // BENCH_ONLY=preview (a comma list of scenario names) measures fewer, e.g. while profiling the server.
  const only = process.env.BENCH_ONLY?.split(',');
  if (only) scenarios.splice(0, scenarios.length, ...scenarios.filter((scenario) => only.includes(scenario.name)));
  bare = await startBareEndpoint(scenarios);

  await settled(server.pid);
  // Warm both up (JIT, pools, kept catalogue) before anything is counted.
  for (const scenario of scenarios) {
    await drive(stack.appOrigin, scenario, 2);
    await drive(bareOrigin, scenario, 2);
  }

  const ratios: Record<Scenario['name'], number[]> = { preview: [], garments: [], garment: [] };
  const p99s = { app: [] as number[], bare: [] as number[] };
  for (let round = 1; round <= ROUNDS; round += 1) {
    for (const scenario of scenarios) {
      const loadBefore = loadNow();
      const app = await drive(stack.appOrigin, scenario, RUN_SECONDS);
      const loadBetween = loadNow();
      const bareFigures = await drive(bareOrigin, scenario, RUN_SECONDS);
      const ratio = app.requestsPerSecond / bareFigures.requestsPerSecond;
      ratios[scenario.name].push(ratio);
      if (scenario.name === 'preview') {
        p99s.app.push(app.p99Ms);
        p99s.bare.push(bareFigures.p99Ms);
      }
      console.log(
        `round ${round} ${scenario.label.padEnd(15)} app ${rate(app)} (${loadBefore}) · bare ${rate(bareFigures)} (${loadBetween}) · ${ratio.toFixed(2)} ×`,
      );
      console.log(`        CPU per request: app ${cpu(app)} · bare ${cpu(bareFigures)}`);
    }
  }

  const verdict = (isMet: boolean) => (isMet ? 'PASS' : 'MISS');
  const previewRatio = median(ratios.preview);
  const [appP99, bareP99] = [median(p99s.app), median(p99s.bare)];
  console.log(`Medians of ${ROUNDS} rounds (${loadNow()}):`);
  if (ratios.garments.length)
    console.log(
      `  catalogue list ÷ bare: ${median(ratios.garments).toFixed(2)} (target ≥ ${TARGETS.garments}) ${verdict(median(ratios.garments) >= TARGETS.garments)}`,
    );
  if (ratios.garment.length) console.log(`  garment page ÷ bare: ${median(ratios.garment).toFixed(2)}`);
  console.log(
    `  quote preview ÷ bare: target ≥ ${TARGETS.preview} ${verdict(previewRatio >= TARGETS.preview)}; p99 target ≤ ${TARGETS.previewP99} × bare ${verdict(appP99 <= TARGETS.previewP99 * bareP99)}`,
  );
  console.log(`quote preview ÷ bare: ${previewRatio.toFixed(2)} (p99 ${appP99} ms vs ${bareP99} ms)`);
}

/** Stops what this run started, whichever way it ends. */
async function stopAll(): Promise<void> {
  await stopProcess(bare);
  await stopProcess(server);
  await fakes?.close();
  if (startedDatabase) await stopLocalDatabase();
}

let exitCode = 0;
process.on('SIGINT', () => void stopAll().then(() => process.exit(130)));
try {
  await main();
} catch (error) {
  console.error(`The API benchmark failed: ${(error as Error).message}`);
  exitCode = 1;
} finally {
  await stopAll();
}
process.exit(exitCode);
