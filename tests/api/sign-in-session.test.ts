import { SESSION_MS, SIGN_IN_SESSION_MS } from '../../server/auth/router';
import { createTestDb, removePrefixed } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-signsess';

/** The stored session id inside a signed `conestack.sid=s:<id>.<signature>` cookie. */
const sessionIdOf = (cookie: string) => decodeURIComponent(cookie.split('=')[1]).replace(/^s:/, '').replace(/\.[^.]*$/, '');
const cookieOf = (res: Response) => res.headers.getSetCookie().find((c) => c.startsWith('conestack.sid='));

describe('sessions before and after sign-in', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;

  beforeAll(async () => {
    await removePrefixed(db, P);
    server = await startTestServer(db);
  });
  afterAll(async () => {
    await server.close();
    await removePrefixed(db, P);
    await db.destroy();
  });

  const storedExpiry = async (cookie: string) => Number((await db('sessions').where({ session_id: sessionIdOf(cookie) }).first('expires'))?.expires) * 1000;

  it('keeps the session of a sign-in that has only started for minutes, in the store and in the cookie', async () => {
    const start = await fetch(`${server.url}/auth/github`, { redirect: 'manual' });
    expect(start.status).toBe(302);
    const setCookie = cookieOf(start) as string;
    expect(setCookie).toBeDefined();
    const expires = await storedExpiry(setCookie.split(';')[0]);
    // Whole seconds in the store, so allow a second either way.
    expect(expires - Date.now()).toBeLessThanOrEqual(SIGN_IN_SESSION_MS + 1000);
    expect(expires - Date.now()).toBeGreaterThan(SIGN_IN_SESSION_MS - 60_000);
    const cookieExpires = Date.parse(/Expires=([^;]+)/i.exec(setCookie)?.[1] ?? '');
    expect(Math.abs(cookieExpires - expires)).toBeLessThanOrEqual(2000);
  });

  it('gives the month once the user is known', async () => {
    const { cookie } = await signIn(server.url, `${P}-member`);
    const expires = await storedExpiry(cookie);
    expect(expires - Date.now()).toBeGreaterThan(SESSION_MS - 60_000);
    expect(expires - Date.now()).toBeLessThanOrEqual(SESSION_MS + 1000);
    const me = await fetch(`${server.url}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(200);
  });

  it('leaves a signed-in session its month when its user opens the sign-in route again', async () => {
    const { cookie } = await signIn(server.url, `${P}-again`);
    const again = await fetch(`${server.url}/auth/github`, { redirect: 'manual', headers: { cookie } });
    expect(again.status).toBe(302);
    expect(await storedExpiry(cookie)).toBeGreaterThan(Date.now() + SESSION_MS - 60_000);
  });
});
