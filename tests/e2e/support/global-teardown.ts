import { stopAppServer } from './app-server.ts';

export default async function globalTeardown(): Promise<void> {
  await stopAppServer();
}
