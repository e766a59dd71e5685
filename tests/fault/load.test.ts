// 50 connections for FAULT_LOAD_SECONDS (30 by default) on search and on a cached comparison,
// against the real server process: no errors, no timeouts, nothing but 2xx.
import autocannon from 'autocannon';
import { startApp, type AppProcess } from './support/app-process';
import { recordFigure } from './support/figures';

const seconds = Number(process.env.FAULT_LOAD_SECONDS ?? 30);
const CONNECTIONS = 50;
jest.setTimeout((seconds * 2 + 60) * 1000);

describe(`${CONNECTIONS} connections for ${seconds} s`, () => {
  let app: AppProcess;
  let slugs: string[] = [];

  beforeAll(async () => {
    app = await startApp();
    const list = await (await fetch(`${app.url}/api/drivers?limit=6`)).json();
    slugs = list.items.map((d: { slug: string }) => d.slug);
    expect(slugs.length).toBe(6);
  });
  afterAll(() => app?.kill());

  async function hammer(what: string, paths: string[]) {
    // A first pass builds the index and the cached bodies, as earlier visitors would have.
    for (const p of paths) expect((await fetch(`${app.url}${p}`)).status).toBe(200);
    const result = await autocannon({ url: app.url, connections: CONNECTIONS, duration: seconds, requests: paths.map((path) => ({ method: 'GET', path })) });
    recordFigure(`${what}: ${CONNECTIONS} connections for ${seconds} s`, `${Math.round(result.requests.average)} req/s, p99 ${result.latency.p99} ms, ${result.errors} errors, ${result.non2xx} non-2xx`);
    expect({ errors: result.errors, timeouts: result.timeouts, non2xx: result.non2xx }).toEqual({ errors: 0, timeouts: 0, non2xx: 0 });
    expect(result.requests.total).toBeGreaterThan(0);
  }

  it('serves search with no errors', async () => {
    await hammer('search', ['/api/drivers?q=mid', '/api/drivers?type=woofer&sort=fs&limit=24', '/api/drivers?q=silk&limit=10', '/api/drivers']);
  });

  it('serves a cached comparison with no errors', async () => {
    await hammer('cached comparison', [`/api/overlay?drivers=${slugs.slice(0, 2).join(',')}`, `/api/overlay?drivers=${slugs.slice(2, 5).join(',')}`]);
  });
});
