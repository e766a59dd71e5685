import compression from 'compression';
import express, { type Express } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { Knex } from 'knex';
import { createCalcRouter } from './calc/router';
import { createDriversRouter } from './drivers/router';
import { createHealthRouter } from './health/router';
import { createOverlayRouter } from './overlay/router';
import { apiNotFound, errorHandler } from './http/error-handler';

export interface AppOptions {
  db: Knex;
  /** Folder of the exported web app; omitted in API-only tests. */
  webDir?: string;
  exposeStack?: boolean;
  /** Anonymous saving of comparison links, on until sign-in lands (ALLOW_ANONYMOUS_SAVE=0 turns it off). */
  allowAnonymousSave?: boolean;
  /** Search index staleness window, ms; tests use 0 so fixture writes show at once. */
  searchStaleAfterMs?: number;
}

export function createApp(options: AppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  // Curves are long arrays of similar numbers; gzip shrinks them several times over.
  app.use(compression());
  app.use(express.json({ limit: '2mb' }));

  app.use('/api/health', createHealthRouter(options.db));
  app.use('/api/drivers', createDriversRouter(options.db, { staleAfterMs: options.searchStaleAfterMs }));
  app.use('/api/calc', createCalcRouter());
  app.use('/api', createOverlayRouter(options.db, { allowAnonymousSave: options.allowAnonymousSave ?? process.env.ALLOW_ANONYMOUS_SAVE !== '0', staleAfterMs: options.searchStaleAfterMs }));
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
