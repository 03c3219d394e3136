/**
 * `npm start` as a new user runs it on two days: start, order and pay, stop with Ctrl-C, start again on the same data
 * folder, order and pay again. The demo stack runs on its own port offset so it never meets the test stack.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { checkoutStartedResponse } from '../../server/src/contracts/orders.ts';
import { projectRoot } from '../../scripts/db-lifecycle.ts';
import { payWithTestCard, priyaShipTo, quoteSavedDesign } from '../support/priya-orders.ts';
import { signInOverHttp } from '../support/api-calls.ts';

const offset = Number(process.env.HW_PORT_OFFSET ?? 0) + 300;
const appOrigin = `http://127.0.0.1:${3000 + offset}`;
const signInOrigin = `http://127.0.0.1:${4010 + offset}`;
let running: ChildProcess | undefined;

/** Runs `npm start`'s script and resolves once it prints that the shop is running. */
function startDemoShop(): Promise<ChildProcess> {
  const { PORT: _port, APP_ORIGIN: _origin, HOST: _host, DATABASE_URL: _url, ...env } = process.env;
  const child = spawn(process.execPath, [join(projectRoot, 'node_modules/tsx/dist/cli.mjs'), 'scripts/start.ts'], {
    cwd: projectRoot,
    env: { ...env, HW_PORT_OFFSET: String(offset) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  return new Promise((resolve, reject) => {
    const collect = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes('Hoopwright demo shop is running.')) resolve(child);
    };
    child.stdout!.on('data', collect);
    child.stderr!.on('data', collect);
    child.once('exit', (code) => reject(new Error(`npm start exited (${code}) before it was ready:\n${output}`)));
  });
}

async function stopDemoShop(child: ChildProcess): Promise<void> {
  const exited = new Promise((resolve) => child.once('exit', resolve));
  child.kill('SIGINT');
  await exited;
}

/** Signs Priya in on the running shop, prices her saved design 1 and orders it; resolves with the payment page. */
async function orderAndPay(): Promise<{ number: string; paidStatus: number }> {
  const agent = request.agent(appOrigin).set('Origin', appOrigin);
  await signInOverHttp(agent, signInOrigin, 'priya@example.test');

  const quote = await quoteSavedDesign(agent);
  const placed = await agent.post('/api/orders').send({
    quoteId: quote.quoteId,
    designId: 1,
    neededBy: quote.readyDates.earliestReadyDate,
    shipTo: priyaShipTo,
  });
  expect(placed.status, JSON.stringify(placed.body)).toBe(201);
  const started = checkoutStartedResponse.parse(placed.body);
  const paidStatus = await payWithTestCard(started.checkoutUrl!);
  return { number: started.number, paidStatus };
}

afterAll(async () => {
  if (running && running.exitCode === null) await stopDemoShop(running);
});

describe('npm start on two days', () => {
  it('when the demo shop is stopped and started again on the same data, then an order is paid on each day', async () => {
    running = await startDemoShop();
    const first = await orderAndPay();
    expect(first.paidStatus).toBe(303);
    await stopDemoShop(running);

    running = await startDemoShop();
    const second = await orderAndPay();
    expect(second.paidStatus).toBe(303);
    expect(second.number).not.toBe(first.number);
    await stopDemoShop(running);
  }, 240_000);
});
