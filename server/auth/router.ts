import { Router, type RequestHandler } from 'express';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Knex } from 'knex';
import passport from 'passport';
import { Strategy as GitHubStrategy, type Profile, type StrategyOptions } from 'passport-github2';
import { z } from 'zod';
import { isDbUnavailable } from '../../db/db-errors';
import { errorCodes } from '../../shared/api/errors';
import { roleChangeSchema, type User } from '../../shared/schemas/users';
import { ApiError, parseOr400 } from '../http/api-error';
import { currentUser, markSessionUnreadable, requireRole, sessionUnreadable } from '../http/require-role';
import { limiter } from '../http/security';
import { createFakeProvider } from './fake-provider';
import { createUsersRepository } from './repository';
import { createUsersService } from './service';

export interface AuthOptions {
  /** The origin users reach the app at, e.g. http://127.0.0.1:8080; the callback URL hangs off it. */
  publicUrl: string;
  sessionSecret: string;
  /** Real provider settings; when omitted the local fake provider is mounted and used. */
  provider?: { clientId: string; clientSecret: string; authorizationURL?: string; tokenURL?: string; userProfileURL?: string; userEmailURL?: string };
  adminLogins?: readonly string[];
  signInPerMinute?: number;
}

export const SESSION_COOKIE = 'conestack.sid';
/** A signed-in session lasts a month. */
export const SESSION_MS = 30 * 86400_000;
/**
 * The session that carries the OAuth state to the provider and back holds nobody yet; it lasts
 * long enough for the round trip, so abandoned sign-ins do not leave month-long rows behind.
 */
export const SIGN_IN_SESSION_MS = 10 * 60_000;

const returnToSchema = z
  .string()
  .regex(/^\/(?!\/)[^\s]*$/, 'must be a path on this site')
  .max(500);

/** Sessions in MariaDB, passport with the GitHub strategy, and the sign-in, account and role routes. */
export function createAuth(db: Knex, options: AuthOptions) {
  const users = createUsersService(createUsersRepository(db), { adminLogins: options.adminLogins });
  const MySQLStore = MySQLStoreFactory(session as never);
  // The store wants a mysql-style query(sql, params) that returns a Promise of [rows, fields].
  const connection = { query: (sql: string, params: unknown[]) => db.raw(sql, params as never).then((r: unknown) => r) };
  const store = new MySQLStore({ createDatabaseTable: false, clearExpired: false, endConnectionOnClose: false, expiration: SESSION_MS }, connection as never);
  // A touch only pushes the expiry back; failing one must not fail a response already on its way.
  const touch = store.touch.bind(store);
  store.touch = ((sid: string, sess: unknown, cb?: (err: unknown) => void) =>
    touch(sid, sess, (err: unknown) => cb?.(err && isDbUnavailable(err) ? null : err))) as typeof store.touch;
  const secure = options.publicUrl.startsWith('https://');
  const sessions = session({
    name: SESSION_COOKIE,
    secret: options.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    proxy: secure,
    cookie: { httpOnly: true, sameSite: 'lax', secure, maxAge: SESSION_MS },
  });
  const sweep = setInterval(() => {
    void db('sessions').where('expires', '<', Math.floor(Date.now() / 1000)).delete().catch(() => undefined);
  }, 15 * 60_000);
  sweep.unref();

  const base = options.publicUrl.replace(/\/$/, '');
  const fake = !options.provider;
  const providerBase = `${base}/fake-provider`;
  const pp = new passport.Passport();
  pp.use(
    new GitHubStrategy(
      {
        clientID: options.provider?.clientId ?? 'conestack-local',
        clientSecret: options.provider?.clientSecret ?? 'conestack-local-secret',
        callbackURL: `${base}/auth/github/callback`,
        scope: ['user:email'],
        // passport-oauth2 keeps a random state in the session and checks it on return; the type
        // definitions only know the older string form.
        state: true as unknown as string,
        ...(fake
          ? {
              authorizationURL: `${providerBase}/login/oauth/authorize`,
              tokenURL: `${providerBase}/login/oauth/access_token`,
              userProfileURL: `${providerBase}/user`,
              userEmailURL: `${providerBase}/user/emails`,
            }
          : {
              ...(options.provider?.authorizationURL ? { authorizationURL: options.provider.authorizationURL } : {}),
              ...(options.provider?.tokenURL ? { tokenURL: options.provider.tokenURL } : {}),
              ...(options.provider?.userProfileURL ? { userProfileURL: options.provider.userProfileURL } : {}),
              ...(options.provider?.userEmailURL ? { userEmailURL: options.provider.userEmailURL } : {}),
            }),
      } satisfies StrategyOptions,
      (_access: string, _refresh: string, profile: Profile, done: (err: unknown, user?: User) => void) => {
        users
          .signIn({
            provider: 'github',
            id: String(profile.id),
            login: profile.username ?? String(profile.id),
            displayName: profile.displayName || profile.username || String(profile.id),
            email: profile.emails?.[0]?.value ?? null,
          })
          .then((u) => done(null, u), done);
      },
    ),
  );
  pp.serializeUser((user, done) => done(null, (user as User).id));
  pp.deserializeUser((id: number, done) => {
    users.findById(id).then((u) => done(null, u ?? false), done);
  });

  const readUser = pp.session();
  /**
   * Session, then the user (fresh from the database each request, so role changes apply at once).
   * When the database cannot say who is asking, a read goes on as a visitor's (the catalogue stays
   * up in an outage; routes that need the user answer 503), while a change or sign-in fails with 503.
   */
  const withSession: RequestHandler = (req, res, next) => {
    const failed = (err: unknown) => {
      const read = req.method === 'GET' || req.method === 'HEAD';
      if (!read || !isDbUnavailable(err) || req.originalUrl.startsWith('/auth/')) return next(err);
      markSessionUnreadable(req, err);
      next();
    };
    sessions(req, res, (err?: unknown) => (err ? failed(err) : readUser(req, res, (userErr?: unknown) => (userErr ? failed(userErr) : next()))));
  };
  const middleware: RequestHandler[] = [pp.initialize(), withSession];

  const auth = Router();
  if (fake) auth.use('/fake-provider', createFakeProvider());
  const signInLimit = limiter(options.signInPerMinute ?? 30, 'sign-in attempts');
  auth.get('/auth/github', signInLimit, (req, res, next) => {
    const parsed = returnToSchema.safeParse(req.query.returnTo ?? '/');
    (req.session as unknown as { returnTo?: string }).returnTo = parsed.success ? parsed.data : '/';
    // Someone already signed in keeps their month; the store row's expiry follows the cookie's.
    if (!req.user) req.session.cookie.maxAge = SIGN_IN_SESSION_MS;
    // The state check needs the session saved before the browser leaves for the provider.
    req.session.save((err) => (err ? next(err) : pp.authenticate('github')(req, res, next)));
  });
  auth.get('/auth/github/callback', signInLimit, (req, res, next) => {
    pp.authenticate('github', { keepSessionInfo: true }, (err: unknown, user: User | false) => {
      if (err) return next(err);
      if (!user) return res.redirect(302, '/signin?failed=1');
      req.logIn(user, { session: true, keepSessionInfo: true } as { session: boolean }, (loginErr) => {
        if (loginErr) return next(loginErr);
        const s = req.session as unknown as { returnTo?: string };
        const to = s.returnTo ?? '/';
        delete s.returnTo;
        // keepSessionInfo carried the short sign-in cookie over; the known user gets the full month.
        req.session.cookie.maxAge = SESSION_MS;
        req.session.save((saveErr) => (saveErr ? next(saveErr) : res.redirect(302, to)));
      });
    })(req, res, next);
  });
  auth.post('/auth/signout', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy(() => {
        res.clearCookie(SESSION_COOKIE, { path: '/' });
        res.status(204).end();
      });
    });
  });

  const api = Router();
  api.get('/me', (req, res, next) => {
    const user = currentUser(req);
    if (!user) return next(sessionUnreadable(req) ?? new ApiError(401, errorCodes.unauthenticated, 'Not signed in'));
    res.set('Cache-Control', 'no-store').json(user);
  });
  api.get('/admin/users', requireRole('admin'), async (_req, res) => {
    res.json({ users: await users.list() });
  });
  api.get('/admin/audit', requireRole('admin'), async (_req, res) => {
    res.json({ entries: await users.audit() });
  });
  api.patch('/admin/users/:id/role', requireRole('admin'), async (req, res) => {
    const { id } = parseOr400(z.object({ id: z.coerce.number().int().positive() }), req.params, 'params');
    const body = parseOr400(roleChangeSchema, req.body ?? {}, 'body');
    res.json(await users.changeRole(currentUser(req) as User, id, body.role, body.reason));
  });

  return { middleware, authRouter: auth, apiRouter: api, users, close: () => clearInterval(sweep) };
}
