import { startAppServer } from './app-server.ts';

export default async function globalSetup(): Promise<void> {
  await startAppServer();
}
