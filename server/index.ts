import { join } from 'node:path';
import { createDb, dbSettingsFromEnv } from '../db/connection';
import { dbTimeoutsFromEnv } from '../db/outage-guard';
import { createApp } from './app';

const port = Number(process.env.PORT ?? 8080);
const host = process.env.HOST ?? '127.0.0.1';
const db = createDb(dbSettingsFromEnv(), { timeouts: dbTimeoutsFromEnv() });
const env = process.env;
// A real provider is configured by OAUTH_CLIENT_ID and OAUTH_CLIENT_SECRET; without them the local
// fake provider signs people in, which is only for development and tests.
const provider = env.OAUTH_CLIENT_ID
  ? {
      clientId: env.OAUTH_CLIENT_ID,
      clientSecret: env.OAUTH_CLIENT_SECRET ?? '',
      authorizationURL: env.OAUTH_AUTHORIZATION_URL,
      tokenURL: env.OAUTH_TOKEN_URL,
      userProfileURL: env.OAUTH_USER_URL,
      userEmailURL: env.OAUTH_EMAILS_URL,
    }
  : undefined;
if (provider && !env.SESSION_SECRET) {
  console.error('[conestack] SESSION_SECRET must be set when a real sign-in provider is configured');
  process.exit(2);
}
const app = createApp({
  db,
  webDir: env.WEB_DIR ?? join(__dirname, '..', 'dist'),
  exposeStack: env.NODE_ENV === 'development',
  auth: {
    publicUrl: env.PUBLIC_URL ?? `http://${host}:${port}`,
    sessionSecret: env.SESSION_SECRET ?? 'conestack-local-development-only',
    provider,
    adminLogins: (env.CONESTACK_ADMINS ?? (provider ? '' : 'test-admin')).split(',').map((s: string) => s.trim()).filter(Boolean),
  },
  allowAnonymousSave: env.ALLOW_ANONYMOUS_SAVE === '1',
  ...(Number(env.WRITES_PER_MINUTE) > 0 ? { writesPerMinute: Number(env.WRITES_PER_MINUTE) } : {}),
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
