import type { Server } from 'node:http';
import type { Knex } from 'knex';
import { createApp, type AppOptions } from '../../server/app';
import { freePort } from './free-port';

/** A real listening server: the sign-in flow makes the server call its own token endpoint. */
export async function startTestServer(db: Knex, options: Partial<AppOptions> = {}, port?: number): Promise<{ url: string; close: () => Promise<void> }> {
  const p = port ?? (await freePort());
  const url = `http://127.0.0.1:${p}`;
  const app = createApp({ db, searchStaleAfterMs: 0, writesPerMinute: 10_000, ...options, auth: { publicUrl: url, signInPerMinute: 10_000, ...options.auth } });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(p, '127.0.0.1', () => resolve(s));
  });
  return {
    url,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

const cookieOf = (res: Response): string | undefined => res.headers.getSetCookie().map((c) => c.split(';')[0]).find((c) => c.startsWith('conestack.sid='));

/**
 * Walks the whole OAuth dance against the fake provider and returns the session cookie. `profile`
 * sets the display name and e-mail the provider reports for an account it has not seen yet.
 */
export async function signIn(url: string, login: string, returnTo = '/', profile: { name?: string; email?: string } = {}): Promise<{ cookie: string; location: string }> {
  const start = await fetch(`${url}/auth/github?returnTo=${encodeURIComponent(returnTo)}`, { redirect: 'manual' });
  const preCookie = cookieOf(start);
  const authorize = new URL(start.headers.get('location') as string, url);
  const form = new URLSearchParams({ login, redirect_uri: authorize.searchParams.get('redirect_uri') as string, state: authorize.searchParams.get('state') ?? '', ...profile });
  const granted = await fetch(authorize, { method: 'POST', body: form, redirect: 'manual', headers: { origin: url } });
  const callback = granted.headers.get('location') as string;
  const back = await fetch(callback, { redirect: 'manual', headers: preCookie ? { cookie: preCookie } : {} });
  const cookie = cookieOf(back) ?? preCookie;
  if (!cookie) throw new Error(`sign-in for ${login} set no session cookie (status ${back.status})`);
  return { cookie, location: back.headers.get('location') ?? '' };
}
