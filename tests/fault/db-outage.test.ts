// The database frozen (SIGSTOP) and killed (SIGTERM): every route answers within 2 s, with 503
// db_unavailable where it needs the database, search and cached comparisons keep answering from
// memory, and the first request after the database is back succeeds within a second.
import { signIn } from '../support/sign-in';
import { startApp, type AppProcess } from './support/app-process';
import { isAlive, killFaultDb, mariadbPid, sleep, startFaultDb, faultDbConfig } from './support/fault-db';
import { recordFigure } from './support/figures';

jest.setTimeout(120_000);

type Who = 'visitor' | 'signed-in';
interface Route {
  name: string;
  method: string;
  path: () => string;
  body?: () => unknown;
  /** Status while the database is away, for a visitor and for a signed-in admin. */
  expect: Record<Who, number>;
}

const LIMIT_MS = 2000;
const RECOVERY_LIMIT_MS = 1000;

describe('database outages', () => {
  let app: AppProcess;
  let cookie = '';
  let slugs: string[] = [];
  let savedCode = '';
  let adminId = 0;

  const send = async (route: Route, who: Who) => {
    const started = performance.now();
    const res = await fetch(`${app.url}${route.path()}`, {
      method: route.method,
      redirect: 'manual',
      headers: { 'content-type': 'application/json', origin: app.url, ...(who === 'signed-in' ? { cookie } : {}) },
      body: route.body ? JSON.stringify(route.body()) : undefined,
    });
    const text = await res.text();
    return { route, who, status: res.status, ms: performance.now() - started, retryAfter: res.headers.get('retry-after'), text };
  };

  const search = () => `/api/drivers?q=${encodeURIComponent('mid')}&limit=10`;
  const comparison = () => `/api/overlay?drivers=${slugs.slice(0, 2).join(',')}`;
  // One or more routes of every router; those that need a user answer 401 to a visitor, which
  // needs no database to decide.
  const routes: Route[] = [
    { name: 'health', method: 'GET', path: () => '/api/health', expect: { visitor: 503, 'signed-in': 503 } },
    { name: 'search (from memory)', method: 'GET', path: search, expect: { visitor: 200, 'signed-in': 200 } },
    { name: 'driver page', method: 'GET', path: () => `/api/drivers/${slugs[0]}`, expect: { visitor: 503, 'signed-in': 503 } },
    { name: 'cached comparison (from memory)', method: 'GET', path: comparison, expect: { visitor: 200, 'signed-in': 200 } },
    { name: 'new comparison', method: 'GET', path: () => `/api/overlay?drivers=${slugs[2]}`, expect: { visitor: 503, 'signed-in': 503 } },
    { name: 'saved comparison', method: 'GET', path: () => `/api/overlays/${savedCode}`, expect: { visitor: 503, 'signed-in': 503 } },
    { name: 'save a comparison', method: 'POST', path: () => '/api/overlays', body: () => ({ title: 'outage', entries: [{ slug: slugs[0] }] }), expect: { visitor: 401, 'signed-in': 503 } },
    { name: 'my comparisons', method: 'GET', path: () => '/api/me/overlays', expect: { visitor: 401, 'signed-in': 503 } },
    { name: 'me', method: 'GET', path: () => '/api/me', expect: { visitor: 401, 'signed-in': 503 } },
    { name: 'admin: users', method: 'GET', path: () => '/api/admin/users', expect: { visitor: 401, 'signed-in': 503 } },
    { name: 'admin: role change', method: 'PATCH', path: () => `/api/admin/users/${adminId}/role`, body: () => ({ role: 'admin' }), expect: { visitor: 401, 'signed-in': 503 } },
    { name: 'my submissions', method: 'GET', path: () => '/api/submissions/mine', expect: { visitor: 401, 'signed-in': 503 } },
    {
      name: 'submission',
      method: 'POST',
      path: () => '/api/submissions',
      body: () => ({ driver: { slug: slugs[0] }, method: { driveVoltageV: 2.83, distanceM: 1, baffle: 'outage baffle' }, uploads: ['a'.repeat(32)] }),
      expect: { visitor: 401, 'signed-in': 503 },
    },
    { name: 'calculator (pure)', method: 'POST', path: () => '/api/calc/piston', body: () => ({ diameter: 0.1 }), expect: { visitor: 200, 'signed-in': 200 } },
    { name: 'sign-in', method: 'GET', path: () => '/auth/github', expect: { visitor: 503, 'signed-in': 503 } },
  ];

  /** Every route for both callers at once, then once more (later calls meet the closed gate). */
  async function sweep(): Promise<number> {
    const all = routes.flatMap((r) => (['visitor', 'signed-in'] as const).map((who) => [r, who] as const));
    const first = await Promise.all(all.map(([r, who]) => send(r, who)));
    const second = await Promise.all(all.map(([r, who]) => send(r, who)));
    for (const res of [...first, ...second]) {
      const label = `${res.route.name} as ${res.who}`;
      expect({ label, status: res.status }).toEqual({ label, status: res.route.expect[res.who] });
      expect({ label, fast: res.ms < LIMIT_MS }).toEqual({ label, fast: true });
      if (res.status === 503) {
        expect({ label, code: JSON.parse(res.text).error.code, retryAfter: Number(res.retryAfter) > 0 }).toEqual({ label, code: 'db_unavailable', retryAfter: true });
      }
    }
    return Math.max(...[...first, ...second].filter((r) => r.status === 503).map((r) => r.ms));
  }

  /** Polls the driver page, which needs the database, until it answers 200; ms taken. */
  async function recovery(): Promise<number> {
    const started = performance.now();
    for (;;) {
      const res = await fetch(`${app.url}/api/drivers/${slugs[0]}`, { headers: { cookie } });
      await res.arrayBuffer();
      if (res.status === 200) return performance.now() - started;
      if (performance.now() - started > 10_000) throw new Error(`still ${res.status} 10 s after the database came back`);
      await sleep(20);
    }
  }

  /** The signed-in and visitor views work again, from the database this time. */
  async function allWell(): Promise<void> {
    const me = await fetch(`${app.url}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(200);
    expect((await fetch(`${app.url}/api/health`)).status).toBe(200);
    expect((await fetch(`${app.url}/api/overlays/${savedCode}`)).status).toBe(200);
  }

  /** Fills the search index and the comparison cache, as ordinary traffic would. */
  async function warm(): Promise<void> {
    for (const path of [search(), comparison()]) {
      for (const headers of [{}, { cookie }] as Record<string, string>[]) expect((await fetch(`${app.url}${path}`, { headers })).status).toBe(200);
    }
  }

  beforeAll(async () => {
    app = await startApp();
    cookie = (await signIn(app.url, 'fault-admin')).cookie;
    const me = await (await fetch(`${app.url}/api/me`, { headers: { cookie } })).json();
    expect(me.role).toBe('admin');
    adminId = me.id;
    const list = await (await fetch(`${app.url}/api/drivers?limit=5`)).json();
    slugs = list.items.map((d: { slug: string }) => d.slug);
    expect(slugs.length).toBeGreaterThanOrEqual(3);
    const saved = await fetch(`${app.url}/api/overlays`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: app.url, cookie },
      body: JSON.stringify({ title: 'fault outage', entries: [{ slug: slugs[0] }, { slug: slugs[1] }] }),
    });
    expect(saved.status).toBe(201);
    savedCode = (await saved.json()).code;
  });
  afterAll(async () => {
    // Whatever happened, leave the database running for the next suite.
    const pid = (() => {
      try {
        return mariadbPid();
      } catch {
        return 0;
      }
    })();
    if (pid && isAlive(pid)) process.kill(pid, 'SIGCONT');
    else await startFaultDb(faultDbConfig().port);
    await app?.kill();
  });

  it('answers within 2 s while the database is frozen (SIGSTOP), and recovers within a second of SIGCONT', async () => {
    await warm();
    const pid = mariadbPid();
    process.kill(pid, 'SIGSTOP');
    let worst: number;
    try {
      worst = await sweep();
    } finally {
      process.kill(pid, 'SIGCONT');
    }
    const back = await recovery();
    recordFigure('503 latency, database frozen (SIGSTOP), slowest of all routes', `${Math.round(worst)} ms`);
    recordFigure('recovery after SIGCONT (first 200 from a route that needs the database)', `${Math.round(back)} ms`);
    expect(back).toBeLessThan(RECOVERY_LIMIT_MS);
    await allWell();
  });

  it('answers within 2 s while the database is down (SIGTERM), and recovers within a second of its restart', async () => {
    await warm();
    await killFaultDb();
    const worst = await sweep();
    await startFaultDb(faultDbConfig().port);
    const back = await recovery();
    recordFigure('503 latency, database killed (SIGTERM), slowest of all routes', `${Math.round(worst)} ms`);
    recordFigure('recovery after restart (first 200 once MariaDB answers)', `${Math.round(back)} ms`);
    expect(back).toBeLessThan(RECOVERY_LIMIT_MS);
    await allWell();
  });
});
