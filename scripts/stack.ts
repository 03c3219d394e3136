/**
 * The pieces that `npm start` and `npm test` put together: the environment of one local stack (demo or test), the
 * database migration and seeding, the fakes, the app build and the server process.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { get } from 'node:http';
import { setTimeout as sleep } from 'node:timers/promises';
import { join } from 'node:path';
import { loadDatabaseConfig } from '../server/src/config.ts';
import { openDatabase } from '../server/src/db/knex.ts';
import { startFakes } from '../fakes/index.ts';
import { demoPeople } from '../seeds/data/people.ts';
import { localDatabaseSettings, projectRoot } from './db-lifecycle.ts';
import { BLOCKED_PORTS } from './blocked-ports.ts';

export type StackProfile = 'demo' | 'test';

interface Ports {
  app: number;
  google: number;
  stripe: number;
  smtp: number;
  smtpHttp: number;
}

// The test stack sits 100 ports above the demo stack, so `npm test` runs while the demo shop is open.
const portsByProfile: Record<StackProfile, Ports> = {
  demo: { app: 3000, google: 4010, stripe: 12111, smtp: 2525, smtpHttp: 4025 },
  test: { app: 3100, google: 4110, stripe: 12211, smtp: 2625, smtpHttp: 4125 },
};

export interface LocalStack {
  ports: Ports;
  appOrigin: string;
  env: NodeJS.ProcessEnv;
}

const testRateLimits: NodeJS.ProcessEnv = {
  RATE_LIMIT_SIGN_IN: '100000',
  RATE_LIMIT_QUOTE_PREVIEWS: '100000',
  RATE_LIMIT_UPLOADS: '100000',
  RATE_LIMIT_ORDERS: '100000',
  RATE_LIMIT_PROOF_ANSWERS: '100000',
};

/** Environment for the server in the local demo or test stack; values already set in the shell win. */
export function localStack(profile: StackProfile): LocalStack {
  const offset = Number(process.env.HW_PORT_OFFSET ?? 0);
  refuseBlockedPorts(offset);
  const ports = offsetPorts(portsByProfile[profile], offset);
  const appPort = profile === 'demo' && process.env.PORT ? Number(process.env.PORT) : ports.app;
  const appOrigin = `http://127.0.0.1:${appPort}`;
  const db = localDatabaseSettings();
  const env: NodeJS.ProcessEnv = {
    DB_HOST: '127.0.0.1',
    DB_PORT: String(db.port),
    DB_USER: db.user,
    DB_PASSWORD: db.password,
    DB_NAME: profile === 'demo' ? 'hoopwright' : 'hoopwright_test',
    HOST: '127.0.0.1',
    PORT: String(appPort),
    APP_ORIGIN: appOrigin,
    SESSION_SECRET: `local-${profile}-session-secret-not-for-production`,
    STATIC_DIR: join(projectRoot, 'dist'),
    OWNER_EMAILS: demoPeople
      .filter((p) => p.role === 'owner')
      .map((p) => p.email)
      .join(','),
    GOOGLE_CLIENT_ID: 'hoopwright-local-client',
    GOOGLE_CLIENT_SECRET: 'hoopwright-local-secret',
    GOOGLE_OAUTH_BASE_URL: `http://127.0.0.1:${ports.google}`,
    STRIPE_SECRET_KEY: 'sk_test_hoopwright_local',
    STRIPE_WEBHOOK_SECRET: 'whsec_hoopwright_local',
    STRIPE_API_URL: `http://127.0.0.1:${ports.stripe}`,
    SMTP_URL: `smtp://127.0.0.1:${ports.smtp}`,
    // The tests make many requests from one address in a short while; the rate-limit test lowers these for itself.
    ...(profile === 'test' ? testRateLimits : {}),
    ...(profile === 'demo' ? pickDefined(process.env, ['HOST', 'PORT', 'APP_ORIGIN']) : {}),
  };
  return { ports: { ...ports, app: appPort }, appOrigin, env };
}

/**
 * HW_PORT_OFFSET moves every port of both stacks, so two checkouts on one machine (each with its own MariaDB on its
 * own HW_DB_PORT) can run their tests side by side.
 */
function offsetPorts(ports: Ports, offset: number): Ports {
  if (!Number.isInteger(offset) || offset < 0 || offset > 20_000)
    throw new Error('HW_PORT_OFFSET must be a whole number from 0 to 20000.');
  return Object.fromEntries(Object.entries(ports).map(([name, port]) => [name, port + offset])) as unknown as Ports;
}

/** Every port of both stacks at an offset (and the API benchmark's bare endpoint, 50 above the test app). */
function stackPortsAt(offset: number): { name: string; port: number }[] {
  return (Object.entries(portsByProfile) as [StackProfile, Ports][]).flatMap(([profile, ports]) => [
    ...Object.entries(offsetPorts(ports, offset)).map(([name, port]) => ({
      name: `the ${profile} stack's ${name}`,
      port,
    })),
    ...(profile === 'test' ? [{ name: 'the API benchmark', port: ports.app + offset + 50 }] : []),
  ]);
}

/**
 * Stops before anything starts when a port of the stacks is one browsers and fetch refuse (6000 with
 * HW_PORT_OFFSET=3000, say), naming the port and the next offset, in steps of 100, whose ports are all allowed.
 */
export function refuseBlockedPorts(offset: number): void {
  const blocked = stackPortsAt(offset).find(({ port }) => BLOCKED_PORTS.has(port));
  if (!blocked) return;
  let free = offset - (offset % 100) + 100;
  while (stackPortsAt(free).some(({ port }) => BLOCKED_PORTS.has(port))) free += 100;
  throw new Error(
    `Port ${blocked.port} (${blocked.name}, HW_PORT_OFFSET=${offset}) is on the browsers' and fetch's blocked-port list, so nothing could reach it. Use another offset, e.g. HW_PORT_OFFSET=${free}.`,
  );
}

function pickDefined(env: NodeJS.ProcessEnv, keys: string[]): NodeJS.ProcessEnv {
  return Object.fromEntries(keys.filter((k) => env[k]).map((k) => [k, env[k]]));
}

/** Applies pending migrations; seeds the demo data when asked to always, or when the database has no users yet. */
export async function migrateAndSeed(
  env: NodeJS.ProcessEnv,
  seed: 'always' | 'when-empty',
): Promise<{ migrated: number; seeded: boolean }> {
  const db = openDatabase(loadDatabaseConfig({ ...process.env, ...env }));
  try {
    const [, applied] = await db.migrate.latest();
    const [{ n }] = await db('users').count({ n: '*' });
    const shouldSeed = seed === 'always' || Number(n) === 0;
    if (shouldSeed) await db.seed.run();
    return { migrated: applied.length, seeded: shouldSeed };
  } finally {
    await db.destroy();
  }
}

/** Starts the three local stand-ins (sign-in, payments, mail) on the stack's ports. */
/** Where the demo's payment stand-in keeps its sessions and holds between runs of `npm start` (wiped by db:reset). */
export const demoStandInFolder = join(projectRoot, '.data', 'stand-ins');

export function startLocalFakes(stack: LocalStack, options: { stripeStateFile?: string } = {}) {
  return startFakes({
    host: '127.0.0.1',
    googlePort: stack.ports.google,
    stripePort: stack.ports.stripe,
    smtpPort: stack.ports.smtp,
    smtpHttpPort: stack.ports.smtpHttp,
    identities: demoPeople.map(({ sub, email, name, givenName, familyName }) => ({
      sub,
      email,
      name,
      givenName,
      familyName,
    })),
    stripeApiKey: stack.env.STRIPE_SECRET_KEY!,
    stripeWebhookSecret: stack.env.STRIPE_WEBHOOK_SECRET!,
    stripeWebhookUrl: `${stack.appOrigin}/api/webhooks/stripe`,
    stripeStateFile: options.stripeStateFile,
  });
}

/** Runs a command from node_modules/.bin (or any program) and resolves with its exit code. */
export function run(command: string, args: string[], env: NodeJS.ProcessEnv = {}): Promise<number> {
  const bin = command.includes('/') ? command : join(projectRoot, 'node_modules', '.bin', command);
  return new Promise((resolve) => {
    const child = spawn(bin, args, { cwd: projectRoot, stdio: 'inherit', env: { ...process.env, ...env } });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

/** Builds both apps into dist/ (each build takes about a second). */
export async function buildApps(): Promise<void> {
  for (const app of ['storefront', 'admin']) {
    const code = await run('vite', ['build', app, '--logLevel', 'warn']);
    if (code !== 0) throw new Error(`Building the ${app} app failed.`);
  }
}

/** Whether GET <origin>/api/health answers 200 (node:http, which unlike fetch has no port list of its own). */
function answersHealth(origin: string): Promise<boolean> {
  return new Promise((resolve) => {
    const request = get(`${origin}/api/health`, { timeout: 2_000 }, (response) => {
      response.resume();
      resolve(response.statusCode === 200);
    });
    request.on('error', () => resolve(false));
    request.on('timeout', () => {
      request.destroy();
      resolve(false);
    });
  });
}

/** Waits until a child process answers /api/health; stops the child and throws when it exits or takes over 30 s. */
export async function waitForHealth(child: ChildProcess, origin: string, what: string): Promise<void> {
  let exited = child.exitCode !== null;
  child.once('exit', () => (exited = true));
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (exited) throw new Error(`${what} stopped while starting; see the messages above.`);
    if (await answersHealth(origin)) return;
    if (Date.now() > deadline) {
      await stopProcess(child);
      throw new Error(`${what} did not answer on ${origin} within 30 s.`);
    }
    await sleep(200);
  }
}

/**
 * Starts the API server as its own process and waits until it answers /api/health. `quiet` drops its standard
 * output, `isSilent` its error output (the access log) too. `onSpawn` gets the process at once, so a caller
 * stopping during the wait can stop it too.
 */
export async function startServerProcess(
  stack: LocalStack,
  options: { quiet?: boolean; isSilent?: boolean; onSpawn?: (child: ChildProcess) => void } = {},
): Promise<ChildProcess> {
  // HW_SERVER_NODE_ARGS passes Node options to the server alone, e.g. `--cpu-prof --cpu-prof-dir=/tmp/profile`
  // while a benchmark runs (Node refuses profiling flags in NODE_OPTIONS).
  const nodeArgs = (process.env.HW_SERVER_NODE_ARGS ?? '').split(' ').filter(Boolean);
  // A young heap of 64 MB (V8's default is 16): a price check allocates briefly and much, and with the default
  // nearly a fifth of a busy server's time went to collecting it (bench:api, CPU per request 0.83 → 0.56 ms).
  const child = spawn(
    process.execPath,
    ['--max-semi-space-size=64', ...nodeArgs, '--import', 'tsx', join(projectRoot, 'server/src/main.ts')],
    {
      cwd: projectRoot,
      env: { ...process.env, ...stack.env },
      stdio: options.isSilent ? 'ignore' : options.quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
    },
  );
  options.onSpawn?.(child);
  await waitForHealth(child, stack.appOrigin, 'The API server');
  return child;
}

/** Asks a child process to stop and waits for it (SIGKILL after a grace period). */
export async function stopProcess(child: ChildProcess | undefined, graceMs = 8_000): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), graceMs);
  await exited;
  clearTimeout(timer);
}
