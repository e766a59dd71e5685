import compression from 'compression';
import express, { type Express } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { Knex } from 'knex';
import { createAuth, SESSION_COOKIE, type AuthOptions } from './auth/router';
import { createCalcRouter } from './calc/router';
import { createDriversRouter } from './drivers/router';
import { createHealthRouter } from './health/router';
import { apiNotFound, errorHandler } from './http/error-handler';
import { embedSecurityHeaders, limiter, sameOriginOnly, securityHeaders } from './http/security';
import { createOverlayRouter } from './overlay/router';
import { createSubmissionsRouter } from './submissions/router';

export interface AppOptions {
  db: Knex;
  /** Folder of the exported web app; omitted in API-only tests. */
  webDir?: string;
  exposeStack?: boolean;
  /** Sign-in settings; defaults suit tests (fake provider, a throwaway secret). */
  auth?: Partial<AuthOptions>;
  /** Lets anyone save comparison links without signing in (off: saving needs a member). */
  allowAnonymousSave?: boolean;
  /** State-changing API requests per minute per client. */
  writesPerMinute?: number;
  /** Search index staleness window, ms; tests use 0 so fixture writes show at once. */
  searchStaleAfterMs?: number;
}

export function createApp(options: AppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  const publicUrl = options.auth?.publicUrl ?? 'http://127.0.0.1';
  if (publicUrl.startsWith('https://')) app.set('trust proxy', 1);
  // Curves are long arrays of similar numbers; gzip shrinks them several times over.
  app.use(compression());
  app.use(/^\/o\/[^/]+\/embed\/?$/, embedSecurityHeaders);
  app.use((req, res, next) => (/^\/o\/[^/]+\/embed\/?$/.test(req.path) ? next() : securityHeaders(req, res, next)));
  app.use(express.json({ limit: '2mb' }));

  const auth = createAuth(options.db, {
    publicUrl,
    sessionSecret: options.auth?.sessionSecret ?? 'conestack-test-secret',
    provider: options.auth?.provider,
    adminLogins: options.auth?.adminLogins,
    signInPerMinute: options.auth?.signInPerMinute,
  });
  // Health and the calculators need no user, so they never wait on the session store.
  app.use('/api/health', createHealthRouter(options.db));
  app.use(['/api', '/auth'], sameOriginOnly([publicUrl], SESSION_COOKIE));
  const writes = limiter(options.writesPerMinute ?? 120, 'changes');
  app.use('/api', (req, res, next) => (req.method === 'GET' || req.method === 'HEAD' ? next() : writes(req, res, next)));
  app.use('/api/calc', createCalcRouter());
  app.use(['/api', '/auth'], ...auth.middleware);
  app.use(auth.authRouter);
  app.use('/api', auth.apiRouter);

  app.use('/api/drivers', createDriversRouter(options.db, { staleAfterMs: options.searchStaleAfterMs }));
  app.use('/api', createOverlayRouter(options.db, { allowAnonymousSave: options.allowAnonymousSave ?? false, staleAfterMs: options.searchStaleAfterMs }));
  app.use('/api', createSubmissionsRouter(options.db));
  app.use('/api', apiNotFound);

  if (options.webDir && existsSync(options.webDir)) {
    const webDir = options.webDir;
    app.use(express.static(webDir, { index: false, maxAge: '1h' }));
    // The web export is a single-page app: every other path gets its shell and routes on the client.
    app.get('/{*splat}', (_req, res) => {
      res.set('Cache-Control', 'no-cache').sendFile(join(webDir, 'index.html'));
    });
  }

  app.use(errorHandler({ exposeStack: options.exposeStack ?? false }));
  return app;
}
