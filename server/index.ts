import { join } from 'node:path';
import { createDb } from '../db/connection';
import { createApp } from './app';

const port = Number(process.env.PORT ?? 8080);
const host = process.env.HOST ?? '127.0.0.1';
const db = createDb();
const app = createApp({
  db,
  webDir: process.env.WEB_DIR ?? join(__dirname, '..', 'dist'),
  exposeStack: process.env.NODE_ENV === 'development',
});

const server = app.listen(port, host, () => {
  const address = server.address();
  const actual = typeof address === 'object' && address ? address.port : port;
  console.log(`[conestack] serving on http://${host}:${actual}`);
});

async function shutdown(): Promise<void> {
  server.close();
  server.closeAllConnections();
  await db.destroy();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown());
process.on('SIGTERM', () => void shutdown());
