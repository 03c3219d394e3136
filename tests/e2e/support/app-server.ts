/**
 * The API server process for the browser journeys. It runs detached with its pid in a file, so that a journey in a
 * worker process can restart it (sessions must survive a restart) and the global teardown can stop it.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, openSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';

const root = resolve(import.meta.dirname, '../../..');
const pidFile = join(root, 'test-results', 'e2e-server.pid');
const logFile = join(root, 'test-results', 'e2e-server.log');
const origin = process.env.APP_ORIGIN ?? 'http://127.0.0.1:3100';

async function isHealthy(): Promise<boolean> {
  try {
    return (await fetch(`${origin}/api/health`)).ok;
  } catch {
    return false;
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

export async function startAppServer(): Promise<void> {
  mkdirSync(join(root, 'test-results'), { recursive: true });
  const log = openSync(logFile, 'a');
  const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'server/src/main.ts')], {
    cwd: root,
    env: process.env,
    detached: true,
    stdio: ['ignore', log, log],
  });
  child.unref();
  writeFileSync(pidFile, String(child.pid));
  const deadline = Date.now() + 30_000;
  while (!(await isHealthy())) {
    if (!isAlive(child.pid!) || Date.now() > deadline) {
      throw new Error(`The API server did not start; see ${logFile}:\n${readFileSync(logFile, 'utf8').slice(-2000)}`);
    }
    await sleep(150);
  }
}

export async function stopAppServer(): Promise<void> {
  if (!existsSync(pidFile)) return;
  const pid = Number(readFileSync(pidFile, 'utf8'));
  rmSync(pidFile);
  if (!isAlive(pid)) return;
  process.kill(pid, 'SIGTERM');
  const deadline = Date.now() + 10_000;
  while (isAlive(pid) && Date.now() < deadline) await sleep(100);
  if (isAlive(pid)) process.kill(pid, 'SIGKILL');
}

export async function restartAppServer(): Promise<void> {
  await stopAppServer();
  await startAppServer();
}
