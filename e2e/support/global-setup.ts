import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { startAppServer } from './server';

declare global {
  var __conestackServer: import('node:child_process').ChildProcess | undefined;
}

export default async function globalSetup(): Promise<void> {
  if (!existsSync(join(__dirname, '..', '..', 'dist', 'index.html'))) {
    throw new Error('Browser flows need the web export: run `npm test` (or `npm run build:web`) first');
  }
  const { url, child } = await startAppServer();
  globalThis.__conestackServer = child;
  process.env.E2E_BASE_URL = url;
}
