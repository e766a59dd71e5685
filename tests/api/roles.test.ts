import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createTestDb, removePrefixed } from '../support/test-db';
import { cleanupFixture, insertFixtureCatalogue } from '../support/fixtures';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-roles';
const roles = ['visitor', 'member', 'reviewer', 'moderator', 'admin'] as const;
type Role = (typeof roles)[number];

describe('roles and sessions', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  const cookies: Partial<Record<Role, string>> = {};
  let targetId = 0;
  let driverSlug = '';
  let submittedSetId = 0;
  const splFile = readFileSync(join(__dirname, '..', 'fixtures', 'uploads', 'spl-0deg-tab.txt'));

  beforeAll(async () => {
    await db('users').where('login', 'like', `${P}-%`).delete();
    const made = await insertFixtureCatalogue(db, P, [{ model: 'Roles A', level: 86 }]);
    driverSlug = made.drivers[0].slug;
    server = await startTestServer(db, { auth: { adminLogins: [`${P}-admin`] } });
    for (const role of roles.filter((r) => r !== 'visitor')) {
      cookies[role] = (await signIn(server.url, `${P}-${role}`)).cookie;
      if (role === 'reviewer' || role === 'moderator') await db('users').where({ login: `${P}-${role}` }).update({ role });
    }
    await signIn(server.url, `${P}-target`);
    targetId = (await db('users').where({ login: `${P}-target` }).first('id')).id;
    const sent = await call('POST', '/api/submissions', 'reviewer', await submissionBody('reviewer', 'Matrix set'));
    submittedSetId = (await sent.json()).setId;
  });
  afterAll(async () => {
    await server.close();
    await db('saved_overlays').where('title', 'like', `${P}%`).delete();
    await db('users').where('login', 'like', `${P}-%`).delete();
    await cleanupFixture(db, P);
    await removePrefixed(db, P);
    await db.destroy();
  });

  const cookieOf = (role: Role): Record<string, string> => (cookies[role] ? { cookie: cookies[role] as string } : {});
  const call = (method: string, path: string, role: Role, body?: unknown, origin = server.url) =>
    fetch(`${server.url}${path}`, {
      method,
      redirect: 'manual',
      headers: { 'content-type': 'application/json', origin, ...cookieOf(role) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  const uploadForm = () => {
    const form = new FormData();
    form.append('files', new Blob([splFile]), 'spl-0deg-tab.txt');
    form.append('meta', JSON.stringify([{ kind: 'spl', angleDeg: 0 }]));
    return form;
  };
  const upload = (role: Role, origin = server.url) =>
    fetch(`${server.url}/api/uploads/parse`, { method: 'POST', redirect: 'manual', body: uploadForm(), headers: { origin, ...cookieOf(role) } });
  /** A valid submission for roles that may stage files; others get a well-formed body they are refused before reading. */
  const submissionBody = async (role: Role, model = `Matrix ${role}`) => {
    const res = roles.indexOf(role) >= roles.indexOf('reviewer') ? await upload(role) : null;
    const token = res ? (await res.json()).files[0].token : 'a'.repeat(32);
    return { driver: { makerName: `${P} Matrix Works`, model, type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4 }, method: { driveVoltageV: 2.83, distanceM: 1, baffle: 'matrix baffle' }, uploads: [token] };
  };

  // Every state-changing route with the status each role must get. Expectations follow the role
  // model: members save links, admins hand out roles, anyone may use the calculators.
  type Route = { name: string; method: string; path: () => string; body: (role: Role) => unknown; expect: Record<Role, number>; send?: (role: Role, origin: string) => Promise<Response> };
  const matrix: Route[] = [
    {
      name: 'save a comparison link', method: 'POST', path: () => '/api/overlays', body: () => ({ title: `${P} link`, entries: [{ slug: driverSlug }] }),
      expect: { visitor: 401, member: 201, reviewer: 201, moderator: 201, admin: 201 },
    },
    {
      name: 'change a role', method: 'PATCH', path: () => `/api/admin/users/${targetId}/role`, body: () => ({ role: 'reviewer', reason: 'matrix' }),
      expect: { visitor: 401, member: 403, reviewer: 403, moderator: 403, admin: 200 },
    },
    {
      name: 'run a calculator', method: 'POST', path: () => '/api/calc/piston', body: () => ({ diameter: 0.1 }),
      expect: { visitor: 200, member: 200, reviewer: 200, moderator: 200, admin: 200 },
    },
    {
      name: 'read an uploaded file', method: 'POST', path: () => '/api/uploads/parse', body: () => undefined, send: (role, origin) => upload(role, origin),
      expect: { visitor: 401, member: 403, reviewer: 200, moderator: 200, admin: 200 },
    },
    {
      name: 'send a submission', method: 'POST', path: () => '/api/submissions', body: (role) => submissionBody(role),
      expect: { visitor: 401, member: 403, reviewer: 201, moderator: 201, admin: 201 },
    },
    {
      name: 'read a set again from its originals', method: 'POST', path: () => `/api/submissions/${submittedSetId}/renormalise`, body: () => undefined,
      expect: { visitor: 401, member: 403, reviewer: 403, moderator: 200, admin: 200 },
    },
  ];

  for (const route of matrix) {
    for (const role of roles) {
      it(`${route.name} as ${role} → ${route.expect[role]}`, async () => {
        const res = route.send ? await route.send(role, server.url) : await call(route.method, route.path(), role, await route.body(role));
        expect(res.status).toBe(route.expect[role]);
        if (res.status >= 400) expect((await res.json()).error.code).toMatch(/unauthenticated|forbidden/);
      });
    }
    it(`${route.name} from a forged cross-site page → 403`, async () => {
      const res = route.send ? await route.send('admin', 'http://attacker.example') : await call(route.method, route.path(), 'admin', await route.body('admin'), 'http://attacker.example');
      expect(res.status).toBe(403);
      expect((await res.json()).error.code).toBe('forbidden');
    });
  }

  it("lists a member's own saved links and nobody else's", async () => {
    const mine = await (await fetch(`${server.url}/api/me/overlays`, { headers: { cookie: cookies.member as string } })).json();
    expect(mine.overlays.map((o: { title: string }) => o.title)).toContain(`${P} link`);
    const visitor = await fetch(`${server.url}/api/me/overlays`);
    expect(visitor.status).toBe(401);
  });

  it('refuses a signed-in change with no Origin or Referer', async () => {
    const res = await fetch(`${server.url}/api/overlays`, { method: 'POST', headers: { 'content-type': 'application/json', cookie: cookies.member as string }, body: JSON.stringify({ title: `${P} x`, entries: [{ slug: driverSlug }] }) });
    expect(res.status).toBe(403);
  });

  it('signs out, after which the session no longer works', async () => {
    const { cookie } = await signIn(server.url, `${P}-leaver`);
    const out = await fetch(`${server.url}/auth/signout`, { method: 'POST', headers: { cookie, origin: server.url } });
    expect(out.status).toBe(204);
    const me = await fetch(`${server.url}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(401);
  });

  it('audits every role change with who made it', async () => {
    const res = await fetch(`${server.url}/api/admin/audit`, { headers: { cookie: cookies.admin as string } });
    const { entries } = await res.json();
    expect(entries.find((e: { target: string; actor: string }) => e.target === `${P}-target` && e.actor === `${P}-admin`)).toMatchObject({ newRole: 'reviewer' });
  });

  it('keeps a session across a server restart (sessions live in MariaDB)', async () => {
    const { cookie } = await signIn(server.url, `${P}-sticky`);
    await server.close();
    // A new process-like instance: fresh app, fresh memory, the same database.
    server = await startTestServer(db, { auth: { adminLogins: [`${P}-admin`] } });
    const me = await fetch(`${server.url}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(200);
    expect((await me.json()).login).toBe(`${P}-sticky`);
  });

  it('returns to the page the user came from, and new accounts start as members', async () => {
    const { cookie, location } = await signIn(server.url, `${P}-newcomer`, '/stack?drivers=a');
    expect(location).toBe('/stack?drivers=a');
    const me = await (await fetch(`${server.url}/api/me`, { headers: { cookie } })).json();
    expect(me).toMatchObject({ login: `${P}-newcomer`, role: 'member' });
  });

  it('rejects a callback whose OAuth state was forged', async () => {
    const start = await fetch(`${server.url}/auth/github`, { redirect: 'manual' });
    const cookie = start.headers.getSetCookie()[0].split(';')[0];
    const authorize = new URL(start.headers.get('location') as string);
    const form = new URLSearchParams({ login: `${P}-forger`, redirect_uri: authorize.searchParams.get('redirect_uri') as string, state: 'forged-state' });
    const granted = await fetch(authorize, { method: 'POST', body: form, redirect: 'manual', headers: { origin: server.url } });
    const back = await fetch(granted.headers.get('location') as string, { redirect: 'manual', headers: { cookie } });
    expect(back.status).toBe(302);
    expect(back.headers.get('location')).toBe('/signin?failed=1');
    const me = await fetch(`${server.url}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(401);
  });

  it('sends a Content-Security-Policy that lets CanvasKit compile and keeps frames to ourselves', async () => {
    const res = await fetch(`${server.url}/api/health`);
    const csp = res.headers.get('content-security-policy') ?? '';
    expect(csp).toContain("script-src 'self' 'wasm-unsafe-eval'");
    expect(csp).toContain("frame-ancestors 'self'");
  });

  it('limits sign-in attempts', async () => {
    const strict = await startTestServer(db, { auth: { signInPerMinute: 2 } });
    try {
      const statuses = [];
      for (let i = 0; i < 3; i++) statuses.push((await fetch(`${strict.url}/auth/github`, { redirect: 'manual' })).status);
      expect(statuses).toEqual([302, 302, 429]);
    } finally {
      await strict.close();
    }
  });
});
