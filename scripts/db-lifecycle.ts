/**
 * The project's own MariaDB: Debian's `mariadb-server`, initialised in `.data/mariadb/` inside the checkout and
 * started on 127.0.0.1 on a project port, so it never touches a system server on 3306.
 *
 * Everything here shells out to the MariaDB tools over the instance's unix socket as the operating-system user, which
 * `mariadb-install-db` grants unix_socket authentication; the application itself connects over TCP with a password.
 */
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { userInfo } from 'node:os';
import { join, resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';

export const projectRoot = resolve(import.meta.dirname, '..');

export interface LocalDatabaseSettings {
  port: number;
  dataDir: string;
  user: string;
  password: string;
  databases: string[];
}

/** Settings for the project's local instance; `HW_DB_PORT` moves it off the default 3307. */
export function localDatabaseSettings(env: NodeJS.ProcessEnv = process.env): LocalDatabaseSettings {
  return {
    port: Number(env.HW_DB_PORT ?? 3307),
    dataDir: join(projectRoot, '.data', 'mariadb'),
    user: 'hoopwright',
    password: 'hoopwright-local',
    databases: ['hoopwright', 'hoopwright_test'],
  };
}

const osUser = userInfo().username;
const isRoot = process.getuid?.() === 0;

function socketPath(dataDir: string): string {
  const inside = join(dataDir, 'mariadbd.sock');
  // A unix socket path must fit in 107 bytes; deep checkouts fall back to a per-project name in /tmp.
  if (inside.length < 100) return inside;
  return join('/tmp', `hoopwright-${createHash('sha256').update(dataDir).digest('hex').slice(0, 12)}.sock`);
}

function findProgram(name: string): string | undefined {
  for (const dir of ['/usr/sbin', '/usr/bin', '/usr/local/sbin', '/usr/local/bin']) {
    const candidate = join(dir, name);
    if (existsSync(candidate)) return candidate;
  }
  const which = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
  return which.status === 0 ? which.stdout.trim() : undefined;
}

function installMariaDbIfMissing(): void {
  if (findProgram('mariadbd')) return;
  if (!isRoot) {
    console.error('MariaDB is not installed. Install it with: sudo apt-get install -y mariadb-server');
    process.exit(1);
  }
  console.log('Installing MariaDB from Debian packages (apt-get install mariadb-server)...');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'mariadb-server', 'mariadb-client'], {
    stdio: 'inherit',
    env,
  });
}

function clientArgs(settings: LocalDatabaseSettings): string[] {
  return ['--no-defaults', `--socket=${socketPath(settings.dataDir)}`, `--user=${osUser}`];
}

function ping(settings: LocalDatabaseSettings): boolean {
  const admin = findProgram('mariadb-admin') ?? 'mariadb-admin';
  return spawnSync(admin, [...clientArgs(settings), '--connect-timeout=2', 'ping'], { stdio: 'ignore' }).status === 0;
}

function runSql(settings: LocalDatabaseSettings, sql: string): void {
  const client = findProgram('mariadb') ?? 'mariadb';
  execFileSync(client, [...clientArgs(settings), '--batch'], { input: sql, stdio: ['pipe', 'inherit', 'inherit'] });
}

function pidFile(settings: LocalDatabaseSettings): string {
  return join(settings.dataDir, 'mariadbd.pid');
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** The local MariaDB's process id while it runs (benchmarks read its CPU time). */
export const localDatabasePid = (settings = localDatabaseSettings()) => runningPid(settings);

function runningPid(settings: LocalDatabaseSettings): number | undefined {
  const file = pidFile(settings);
  if (!existsSync(file)) return undefined;
  const pid = Number(readFileSync(file, 'utf8').trim());
  return isAlive(pid) ? pid : undefined;
}

function isPortFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createServer()
      .once('error', () => resolve(false))
      .once('listening', () => probe.close(() => resolve(true)));
    probe.listen(port, '127.0.0.1');
  });
}

function initialiseDataDir(settings: LocalDatabaseSettings): void {
  if (existsSync(join(settings.dataDir, 'mysql'))) return;
  console.log(`Initialising a MariaDB data folder in ${settings.dataDir} ...`);
  mkdirSync(settings.dataDir, { recursive: true });
  const installDb = findProgram('mariadb-install-db') ?? 'mariadb-install-db';
  execFileSync(
    installDb,
    [
      '--no-defaults',
      `--datadir=${settings.dataDir}`,
      `--user=${osUser}`,
      '--auth-root-authentication-method=socket',
      '--skip-test-db',
    ],
    { stdio: ['ignore', 'ignore', 'inherit'] },
  );
}

function grantSql(settings: LocalDatabaseSettings): string {
  const lines: string[] = [];
  for (const host of ['127.0.0.1', 'localhost']) {
    lines.push(`CREATE USER IF NOT EXISTS '${settings.user}'@'${host}' IDENTIFIED BY '${settings.password}';`);
    for (const db of settings.databases) {
      lines.push(`GRANT ALL PRIVILEGES ON \`${db}\`.* TO '${settings.user}'@'${host}';`);
    }
  }
  for (const db of settings.databases) {
    lines.push(`CREATE DATABASE IF NOT EXISTS \`${db}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`);
  }
  return lines.join('\n');
}

/**
 * Installs (as root), initialises and starts the local instance, then makes sure the databases and the application
 * user exist. Returns whether this call started the server, so a caller knows whether to stop it again.
 */
export async function startLocalDatabase(settings = localDatabaseSettings()): Promise<{ started: boolean }> {
  installMariaDbIfMissing();
  if (runningPid(settings) && ping(settings)) {
    runSql(settings, grantSql(settings));
    return { started: false };
  }
  if (!(await isPortFree(settings.port))) {
    throw new Error(
      `Port ${settings.port} on 127.0.0.1 is taken by another program (another checkout's database?). ` +
        `Stop it, or choose another port, e.g. HW_DB_PORT=3308 npm start.`,
    );
  }
  initialiseDataDir(settings);
  const logFile = join(settings.dataDir, 'mariadbd.err');
  const args = [
    '--no-defaults',
    `--datadir=${settings.dataDir}`,
    `--port=${settings.port}`,
    '--bind-address=127.0.0.1',
    `--socket=${socketPath(settings.dataDir)}`,
    `--pid-file=${pidFile(settings)}`,
    `--log-error=${logFile}`,
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--innodb-buffer-pool-size=64M',
    '--innodb-flush-log-at-trx-commit=2',
    ...(isRoot ? ['--user=root'] : []),
  ];
  const child = spawn(findProgram('mariadbd') ?? 'mariadbd', args, { detached: true, stdio: 'ignore' });
  let exitCode: number | null = null;
  child.on('exit', (code) => (exitCode = code ?? 1));
  child.unref();
  const deadline = Date.now() + 60_000;
  while (!ping(settings)) {
    if (exitCode !== null || Date.now() > deadline) {
      const log = existsSync(logFile) ? readFileSync(logFile, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`MariaDB did not start on 127.0.0.1:${settings.port}.\n${log}`);
    }
    await sleep(250);
  }
  runSql(settings, grantSql(settings));
  return { started: true };
}

/** Shuts the local instance down cleanly and waits until its process has gone. */
export async function stopLocalDatabase(settings = localDatabaseSettings()): Promise<{ stopped: boolean }> {
  const pid = runningPid(settings);
  if (!pid) return { stopped: false };
  const admin = findProgram('mariadb-admin') ?? 'mariadb-admin';
  const result = spawnSync(admin, [...clientArgs(settings), 'shutdown'], { stdio: 'ignore' });
  if (result.status !== 0) process.kill(pid, 'SIGTERM');
  // mariadbd removes its pid file before it has fully exited; wait for the process itself, so the port is free.
  const deadline = Date.now() + 30_000;
  while (isAlive(pid) && Date.now() < deadline) await sleep(200);
  return { stopped: true };
}

/**
 * Kills the local instance at once (SIGKILL, as a crash or a lost machine would) and waits until it has gone, for
 * the benchmarks that measure how the app behaves while its database is away. The next start runs crash recovery.
 */
export async function killLocalDatabase(settings = localDatabaseSettings()): Promise<{ killed: boolean }> {
  const pid = runningPid(settings);
  if (!pid) return { killed: false };
  process.kill(pid, 'SIGKILL');
  const deadline = Date.now() + 30_000;
  while (isAlive(pid) && Date.now() < deadline) await sleep(100);
  return { killed: true };
}

/** Stops the instance and deletes its data folder; the next start initialises it afresh. */
export async function wipeLocalDatabase(settings = localDatabaseSettings()): Promise<void> {
  await stopLocalDatabase(settings);
  rmSync(settings.dataDir, { recursive: true, force: true });
}

/** Drops and recreates one database of the local instance (used by the test command for a clean test database). */
export function recreateLocalDatabase(name: string, settings = localDatabaseSettings()): void {
  runSql(settings, `DROP DATABASE IF EXISTS \`${name}\`;\n${grantSql(settings)}`);
}

/** Creates one more database on the local instance (if missing) and lets the application user use it. */
export function ensureLocalDatabase(name: string, settings = localDatabaseSettings()): void {
  runSql({ ...settings, databases: [name] }, grantSql({ ...settings, databases: [name] }));
}

/** Drops one scratch database of the local instance (the order-board benchmark's). */
export function dropLocalDatabase(name: string, settings = localDatabaseSettings()): void {
  runSql(settings, `DROP DATABASE IF EXISTS \`${name}\`;`);
}
