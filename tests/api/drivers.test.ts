import request from 'supertest';
import { createApp } from '../../server/app';
import { driverDetailSchema, driverListResponseSchema } from '../../shared/schemas/drivers';
import { cleanupFixture, insertDriverFixture } from '../support/fixtures';
import { createTestDb } from '../support/test-db';

const PREFIX = 'apitest-drivers';

describe('drivers API', () => {
  const db = createTestDb();
  const app = createApp({ db });
  beforeAll(() => insertDriverFixture(db, PREFIX));
  afterAll(async () => {
    await cleanupFixture(db, PREFIX);
    await db.destroy();
  });

  it('lists the fixture driver with its headline parameters', async () => {
    const res = await request(app).get('/api/drivers').query({ q: 'Fixture apitest-drivers', limit: 100 });
    expect(res.status).toBe(200);
    const body = driverListResponseSchema.parse(res.body);
    const item = body.items.find((d) => d.slug === `${PREFIX}-m3`);
    expect(item).toMatchObject({ type: 'mid-range', nominalSizeIn: 3, fsHz: 101.5, qts: 0.62 });
  });

  it('finds the driver despite a typo in the model name', async () => {
    const res = await request(app).get('/api/drivers').query({ q: 'Fixtrue apitest-drivres' });
    expect(res.body.items.map((d: { slug: string }) => d.slug)).toContain(`${PREFIX}-m3`);
  });

  it('returns one driver with its measurement set, parameters and curve', async () => {
    const res = await request(app).get(`/api/drivers/${PREFIX}-m3`);
    expect(res.status).toBe(200);
    const d = driverDetailSchema.parse(res.body);
    expect(d.measurementSets).toHaveLength(1);
    expect(d.measurementSets[0].curves[0]).toEqual({ kind: 'spl', angleDeg: 0, driveLevelV: 2.83, x: [100, 1000, 10000], y: [80, 86.5, 84], phase: null });
  });

  it('answers 404 in the envelope for an unknown slug', async () => {
    const res = await request(app).get('/api/drivers/no-such-driver');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
  });

  it('rejects a bad query naming the field', async () => {
    const res = await request(app).get('/api/drivers').query({ limit: 'many', colour: 'red' });
    expect(res.status).toBe(400);
    const fields = res.body.error.details.fields.map((f: { field: string }) => f.field);
    expect(fields).toEqual(expect.arrayContaining(['limit']));
    expect(res.body.error.message).toMatch(/limit/);
  });
});
