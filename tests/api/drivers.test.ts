import request from 'supertest';
import { createApp } from '../../server/app';
import { driverDetailSchema, driverListResponseSchema } from '../../shared/schemas/drivers';
import { cleanupFixture, insertFixtureCatalogue } from '../support/fixtures';
import { createTestDb } from '../support/test-db';

const P = 'apitest-search';

describe('drivers API', () => {
  const db = createTestDb();
  const app = createApp({ db, searchStaleAfterMs: 0 });
  let ids: { id: number; slug: string }[] = [];

  beforeAll(async () => {
    const made = await insertFixtureCatalogue(db, P, [
      { model: 'Quartzline 80 Loud', level: 89, thd: 0.3 },
      { model: 'Quartzline 80 Quiet', level: 83, thd: 0.3 },
      { model: 'Quartzline 80 Beamy', level: 89, offLevel: 80, thd: 0.3 },
      { model: 'Quartzline 165 Woofer', type: 'mid-woofer', sizeIn: 6.5, impedance: 8, level: 87 },
      { model: 'Quartzline Old Entry', level: 85, aliases: [{ kind: 'old-slug', alias: `${P}-old-name`, slug: `${P}-old-name` }, { kind: 'model-code', alias: 'QZL80X' }] },
    ]);
    ids = made.drivers;
  });
  afterAll(async () => {
    await cleanupFixture(db, P);
    await db.destroy();
  });

  const search = (q: Record<string, string | number>) => request(app).get('/api/drivers').query({ q: 'Quartzline', limit: 100, ...q });

  it('returns items, total and facet counts in the published shape', async () => {
    const res = await search({});
    expect(res.status).toBe(200);
    const body = driverListResponseSchema.parse(res.body);
    expect(body.total).toBe(5);
    expect(body.facets.type).toEqual([
      { value: 'mid-range', count: 4 },
      { value: 'mid-woofer', count: 1 },
    ]);
    expect(body.facets.size).toEqual([
      { value: '3', count: 4 },
      { value: '6.5', count: 1 },
    ]);
  });

  it('finds a driver through a typo in the model name and through an alias code', async () => {
    const typo = await search({ q: 'Quartzlin 165 Wofer' });
    expect(typo.body.items[0].slug).toBe(`${P}-quartzline-165-woofer`);
    const code = await search({ q: 'QZL80X' });
    expect(code.body.items.map((d: { slug: string }) => d.slug)).toContain(`${P}-quartzline-old-entry`);
  });

  it('filters by facets and keeps each facet counting what the other filters allow', async () => {
    const res = await search({ type: 'mid-woofer' });
    expect(res.body.total).toBe(1);
    // The type facet ignores the type filter itself, so the other type stays selectable with its count.
    expect(res.body.facets.type).toEqual([
      { value: 'mid-range', count: 4 },
      { value: 'mid-woofer', count: 1 },
    ]);
    const sens = await search({ sensMin: 86, sizeMin: 3, sizeMax: 3 });
    expect(sens.body.items.map((d: { model: string }) => d.model).sort()).toEqual(['Quartzline 80 Beamy', 'Quartzline 80 Loud']);
  });

  it('ranks a role by sensitivity, linearity, THD and beaming, with the reasons', async () => {
    const res = await search({ type: 'mid-range', bandLo: 300, bandHi: 3000, level: 90 });
    const body = driverListResponseSchema.parse(res.body);
    expect(body.role).toEqual({ bandLo: 300, bandHi: 3000, level: 90 });
    const order = body.items.map((d) => d.model);
    // Scores by the documented weighting (shared/catalogue/role-index.ts). 90 dB needs
    // V = 2.83·10^((90 − S)/20) volts; above the one measured level THD scales with V, so the charge is
    // 6·log2(V/2.83). Beamy also has 89 dB but its 60° curve is 9 dB down from the 200 Hz band up,
    // which costs 4·log2(3000/200) more.
    const thdCharge = (s: number) => 6 * Math.log2(10 ** ((90 - s) / 20));
    const expected = [89 - 85 - thdCharge(89), 85 - 85 - thdCharge(85), 83 - 85 - thdCharge(83), 89 - 85 - thdCharge(89) - 4 * Math.log2(3000 / 200)];
    expect(order).toEqual(['Quartzline 80 Loud', 'Quartzline Old Entry', 'Quartzline 80 Quiet', 'Quartzline 80 Beamy']);
    body.items.forEach((d, i) => expect(d.role!.score).toBeCloseTo(expected[i], 1));
    const loud = body.items[0].role!;
    expect(loud.rank).toBe(1);
    expect(loud.sensitivityDb).toBeCloseTo(89, 6);
    expect(loud.reasons.join(' | ')).toMatch(/89.0 dB mean sensitivity in 300 Hz–3 kHz/);
    expect(body.items[3].role!.reasons.join(' | ')).toMatch(/beams from 200 Hz/);
  });

  it('sorts and pages', async () => {
    const first = await search({ sort: 'sensitivity', order: 'desc', limit: 2 });
    const second = await search({ sort: 'sensitivity', order: 'desc', limit: 2, offset: 2 });
    const levels = [...first.body.items, ...second.body.items].map((d: { sensitivityDb: number }) => d.sensitivityDb);
    expect(levels).toEqual([...levels].sort((a, b) => b - a));
    expect(first.body.total).toBe(5);
    expect(new Set([...first.body.items, ...second.body.items].map((d: { slug: string }) => d.slug)).size).toBe(4);
  });

  it('rejects bad queries naming each field', async () => {
    const res = await request(app).get('/api/drivers').query({ limit: 'many', bandLo: 300, sizeMin: 8, sizeMax: 3, type: 'horn' });
    expect(res.status).toBe(400);
    const fields = res.body.error.details.fields.map((f: { field: string }) => f.field);
    expect(fields).toEqual(expect.arrayContaining(['limit', 'type']));
    const pairs = await request(app).get('/api/drivers').query({ bandLo: 300, sizeMin: 8, sizeMax: 3 });
    expect(pairs.body.error.details.fields.map((f: { field: string }) => f.field)).toEqual(expect.arrayContaining(['bandHi', 'sizeMax']));
  });

  it('returns a driver with its set, figures and the band it was judged over', async () => {
    const res = await request(app).get(`/api/drivers/${P}-quartzline-80-loud`).query({ bandLo: 500, bandHi: 2000 });
    expect(res.status).toBe(200);
    const d = driverDetailSchema.parse(res.body);
    expect(d.measurementSets).toHaveLength(1);
    expect(d.figures[0].band).toEqual({ lo: 500, hi: 2000 });
    expect(d.figures[0].sensitivityDb).toBeCloseTo(89, 6);
    expect(d.figures[0].linearity?.spanDb).toBeCloseTo(0, 6);
  });

  it('follows an old slug and a merge to the canonical driver', async () => {
    const old = await request(app).get(`/api/drivers/${P}-old-name`);
    expect(old.status).toBe(200);
    expect(old.body).toMatchObject({ slug: `${P}-quartzline-old-entry`, requestedSlug: `${P}-old-name` });
    const beamy = ids.find((d) => d.slug.endsWith('beamy'))!;
    const loud = ids.find((d) => d.slug.endsWith('loud'))!;
    await db('drivers').where({ id: beamy.id }).update({ canonical_id: loud.id });
    try {
      const merged = await request(app).get(`/api/drivers/${beamy.slug}`);
      expect(merged.body.slug).toBe(loud.slug);
      // A merged entry no longer shows up on its own in search.
      const list = await search({});
      expect(list.body.items.map((d: { slug: string }) => d.slug)).not.toContain(beamy.slug);
    } finally {
      await db('drivers').where({ id: beamy.id }).update({ canonical_id: null });
    }
  });

  it('answers 404 in the envelope for an unknown slug', async () => {
    const res = await request(app).get('/api/drivers/no-such-driver');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
  });
});
