import request from 'supertest';
import { createApp } from '../../server/app';
import { overlayResponseSchema, savedOverlaySchema } from '../../shared/schemas/overlay';
import { cleanupFixture, insertFixtureCatalogue } from '../support/fixtures';
import { createTestDb } from '../support/test-db';

const P = 'apitest-overlay';

describe('overlay API', () => {
  const db = createTestDb();
  // Anonymous saving is switched on here to test the links themselves; who may save is the role matrix's job.
  const app = createApp({ db, searchStaleAfterMs: 0, allowAnonymousSave: true });
  let made: Awaited<ReturnType<typeof insertFixtureCatalogue>>;

  beforeAll(async () => {
    made = await insertFixtureCatalogue(db, P, [
      { model: 'Overlay A', level: 88 },
      { model: 'Overlay B', level: 84, thd: 0.8 },
      { model: 'Overlay C', level: 86, aliases: [{ kind: 'old-slug', alias: `${P}-c-old`, slug: `${P}-c-old` }] },
    ]);
  });
  afterAll(async () => {
    await db('saved_overlays').where('title', 'like', `${P}%`).delete();
    await cleanupFixture(db, P);
    await db.destroy();
  });

  const slugs = () => made.drivers.map((d) => d.slug);

  it('returns every driver on one shared 1/48-octave grid from 20 Hz to 20 kHz', async () => {
    const res = await request(app).get('/api/overlay').query({ drivers: slugs().join(','), bandLo: 300, bandHi: 3000 });
    expect(res.status).toBe(200);
    const body = overlayResponseSchema.parse(res.body);
    // 48 points per octave over log2(1000) = 9.97 octaves: floor(48 · 9.9658) + 1 = 479 points.
    expect(body.grid).toHaveLength(Math.floor(48 * Math.log2(1000)) + 1);
    expect(body.grid[0]).toBe(20);
    expect(body.grid[48]).toBeCloseTo(40, 6);
    expect(body.drivers.map((d) => d.model)).toEqual(['Overlay A', 'Overlay B', 'Overlay C']);
    const a = body.drivers[0];
    // The fixture's flat 88 dB on-axis curve stays 88 dB wherever it was measured (no extrapolation beyond 20 kHz).
    expect(a.spl[0].y.every((v) => v === 88)).toBe(true);
    expect(a.spl.map((s) => s.angleDeg)).toEqual([0, 60]);
    expect(a.thd[0].driveLevelV).toBe(2.83);
    expect(a.figures.band).toEqual({ lo: 300, hi: 3000 });
    expect(a.figures.sensitivityDb).toBeCloseTo(88, 6);
  });

  it('serves a cached comparison only until the catalogue changes', async () => {
    const a = made.drivers[0];
    const first = await request(app).get('/api/overlay').query({ drivers: a.slug });
    expect(first.body.drivers[0].model).toBe('Overlay A');
    await db('drivers').where({ id: a.id }).update({ model: 'Overlay A renamed' });
    try {
      const second = await request(app).get('/api/overlay').query({ drivers: a.slug });
      expect(second.body.drivers[0].model).toBe('Overlay A renamed');
    } finally {
      await db('drivers').where({ id: a.id }).update({ model: 'Overlay A' });
    }
  });

  it('follows an old slug and picks the requested set', async () => {
    const c = made.drivers[2];
    const res = await request(app).get('/api/overlay').query({ drivers: `${P}-c-old`, sets: String(c.setId) });
    expect(res.status).toBe(200);
    expect(res.body.drivers[0]).toMatchObject({ slug: c.slug, requestedSlug: `${P}-c-old`, set: { id: c.setId } });
  });

  it('rejects more than four drivers, unknown drivers and foreign sets, naming the place', async () => {
    const five = await request(app).get('/api/overlay').query({ drivers: 'a,b,c,d,e' });
    expect(five.status).toBe(400);
    expect(five.body.error.details.fields[0].field).toBe('drivers');
    const unknown = await request(app).get('/api/overlay').query({ drivers: `${slugs()[0]},no-such-driver` });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.details.fields[0].field).toBe('drivers.1');
    const foreign = await request(app).get('/api/overlay').query({ drivers: slugs()[0], sets: String(made.drivers[1].setId) });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details.fields[0].field).toBe('sets.0');
  });

  it('saves a short link that survives a rename and a merge', async () => {
    const [a, b] = made.drivers;
    const save = await request(app)
      .post('/api/overlays')
      .send({ title: `${P} door pod mids`, note: 'For the write-up', entries: [{ slug: a.slug, setId: a.setId }, { slug: b.slug }], options: { smoothing: '1/6', level: 'band', bandLo: 300, bandHi: 3000 } });
    expect(save.status).toBe(201);
    expect(save.body.url).toBe(`/o/${save.body.code}`);
    const code = save.body.code as string;

    await db('drivers').where({ id: a.id }).update({ slug: `${P}-renamed-a` });
    // Merge B into C: B's set moves to C, and B points at C.
    const c = made.drivers[2];
    await db('measurement_sets').where({ driver_id: b.id }).update({ driver_id: c.id });
    await db('drivers').where({ id: b.id }).update({ canonical_id: c.id });
    try {
      const res = await request(app).get(`/api/overlays/${code}`);
      expect(res.status).toBe(200);
      const saved = savedOverlaySchema.parse(res.body);
      expect(saved.entries).toEqual([
        { slug: `${P}-renamed-a`, setId: a.setId },
        { slug: c.slug, setId: null },
      ]);
      expect(saved.options).toMatchObject({ smoothing: '1/6', level: 'band', bandLo: 300, bandHi: 3000 });
      expect(saved.title).toBe(`${P} door pod mids`);
    } finally {
      await db('drivers').where({ id: b.id }).update({ canonical_id: null });
      await db('measurement_sets').where({ id: b.setId }).update({ driver_id: b.id });
      await db('drivers').where({ id: a.id }).update({ slug: a.slug });
    }
  });

  it('validates the save body field by field and can require sign-in', async () => {
    const bad = await request(app).post('/api/overlays').send({ title: '', entries: [] });
    expect(bad.status).toBe(400);
    const fields = bad.body.error.details.fields.map((f: { field: string }) => f.field);
    expect(fields).toEqual(expect.arrayContaining(['title', 'entries']));
    const closed = createApp({ db, allowAnonymousSave: false });
    const denied = await request(closed).post('/api/overlays').send({ title: `${P} x`, entries: [{ slug: made.drivers[0].slug }] });
    expect(denied.status).toBe(401);
    expect(denied.body.error.code).toBe('unauthenticated');
  });

  it('answers 404 for an unknown code', async () => {
    const res = await request(app).get('/api/overlays/zzzzzzzz');
    expect(res.status).toBe(404);
  });
});
