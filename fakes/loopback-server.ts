import { createServer, type RequestListener } from 'node:http';
import type { AddressInfo, Server } from 'node:net';

/** The host every fake binds to unless told otherwise. */
export const DEFAULT_FAKE_HOST = '127.0.0.1';

// The fakes stand in for hosted services on a developer's machine or in CI; nothing off the machine may reach them.
const LOOPBACK_HOSTS = new Set(['127.0.0.1', 'localhost', '::1', '[::1]']);

export function isLoopbackHost(host: string): boolean {
  return LOOPBACK_HOSTS.has(host) || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(host);
}

/** Base URL such as `http://127.0.0.1:4010`, bracketing IPv6 literals. */
export function originFor(scheme: 'http' | 'smtp', host: string, port: number): string {
  const hostPart = host.includes(':') && !host.startsWith('[') ? `[${host}]` : host;
  return `${scheme}://${hostPart}:${port}`;
}

/** Binds a server to a loopback address; port 0 picks a free port. Resolves with the port actually bound. */
export function listenOnLoopback(server: Server, port: number, host: string): Promise<number> {
  if (!isLoopbackHost(host)) {
    return Promise.reject(new Error(`The fakes listen on loopback only; refusing host "${host}".`));
  }
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve((server.address() as AddressInfo).port);
    });
  });
}

/** Serves an HTTP handler (an express app) on loopback. */
export async function serveHttpOnLoopback(
  handler: RequestListener,
  port: number,
  host: string,
): Promise<{ url: string; close(): Promise<void> }> {
  const server = createServer(handler);
  const boundPort = await listenOnLoopback(server, port, host);
  return {
    url: originFor('http', host, boundPort),
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        // Idle keep-alive sockets (fetch, the SDKs) would otherwise hold close() open for seconds.
        server.closeAllConnections();
      }),
  };
}
