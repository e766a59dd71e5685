import request from 'supertest';
import { createApp } from '../../server/app';
import { cleanupFixture, insertFixtureCatalogue } from '../support/fixtures';
import { createTestDb } from '../support/test-db';

const P = 'apitest-bands';

describe('one band check for search, the driver page and the comparison', () => {
  const db = createTestDb();
  const app = createApp({ db, searchStaleAfterMs: 0, allowAnonymousSave: true });
  let slug = '';

  beforeAll(async () => {
    slug = (await insertFixtureCatalogue(db, P, [{ model: 'Band Probe', level: 87 }])).drivers[0].slug;
  });
  afterAll(async () => {
    await db('saved_overlays').where('title', 'like', `${P}%`).delete();
    await cleanupFixture(db, P);
    await db.destroy();
  });

  const routes = () => [
    { name: 'search', get: (q: Record<string, unknown>) => request(app).get('/api/drivers').query(q) },
    { name: 'driver page', get: (q: Record<string, unknown>) => request(app).get(`/api/drivers/${slug}`).query(q) },
    { name: 'comparison', get: (q: Record<string, unknown>) => request(app).get('/api/overlay').query({ drivers: slug, ...q }) },
  ];
  const fields = (res: request.Response) => (res.body.error?.details?.fields ?? []).map((f: { field: string }) => f.field);

  it.each([
    ['upside down', { bandLo: 3000, bandHi: 300 }],
    ['equal edges', { bandLo: 1000, bandHi: 1000 }],
    ['under 5 % wide', { bandLo: 1000, bandHi: 1040 }],
    ['the high edge alone', { bandHi: 3000 }],
    ['the low edge alone', { bandLo: 300 }],
  ])('refuses a band with %s on every route, naming bandHi or the missing edge', async (_what, band: { bandLo?: number; bandHi?: number }) => {
    for (const r of routes()) {
      const res = await r.get(band);
      expect({ route: r.name, status: res.status }).toEqual({ route: r.name, status: 400 });
      expect(fields(res)).toEqual([band.bandLo === undefined ? 'bandLo' : 'bandHi']);
    }
  });

  it('refuses an edge outside 10 Hz to 40 kHz on every route, naming that edge', async () => {
    for (const r of routes()) {
      const res = await r.get({ bandLo: 5, bandHi: 3000 });
      expect(res.status).toBe(400);
      expect(fields(res)).toEqual(['bandLo']);
    }
  });

  it('uses a good band for the figures on the driver page and in the comparison', async () => {
    const page = await request(app).get(`/api/drivers/${slug}`).query({ bandLo: 500, bandHi: 5000 });
    expect(page.status).toBe(200);
    expect(page.body.figures[0].band).toEqual({ lo: 500, hi: 5000 });
    const overlay = await request(app).get('/api/overlay').query({ drivers: slug, bandLo: 500, bandHi: 5000 });
    expect(overlay.status).toBe(200);
    expect(overlay.body.band).toEqual({ lo: 500, hi: 5000 });
  });

  it('refuses a saved comparison whose options hold a bad band, naming options.bandHi', async () => {
    const res = await request(app)
      .post('/api/overlays')
      .send({ title: `${P} link`, entries: [{ slug }], options: { bandLo: 3000, bandHi: 300 } });
    expect(res.status).toBe(400);
    expect(fields(res)).toEqual(['options.bandHi']);
  });

  it('opens a link saved with a band today’s rule refuses, without the band', async () => {
    const ok = await request(app).post('/api/overlays').send({ title: `${P} old link`, entries: [{ slug }], options: { bandLo: 300, bandHi: 3000, highlight: true } });
    expect(ok.status).toBe(201);
    await db('saved_overlays').where({ code: ok.body.code }).update({ options: JSON.stringify({ level: 'band', bandLo: 3000, bandHi: 300, highlight: true }) });
    const res = await request(app).get(`/api/overlays/${ok.body.code}`);
    expect(res.status).toBe(200);
    expect(res.body.options).toMatchObject({ level: 'band', highlight: true });
    expect(res.body.options.bandLo).toBeUndefined();
    expect(res.body.options.bandHi).toBeUndefined();
  });
});
