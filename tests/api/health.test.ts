import request from 'supertest';
import { createApp } from '../../server/app';
import { createDb } from '../../db/connection';
import { errorEnvelopeSchema } from '../../shared/api/errors';
import { createTestDb, testDbSettings } from '../support/test-db';

describe('GET /api/health', () => {
  const db = createTestDb();
  afterAll(() => db.destroy());

  it('reports the database up', async () => {
    const res = await request(createApp({ db })).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, db: 'up' });
  });

  it('answers 503 with the error envelope when MariaDB cannot be reached', async () => {
    // A real connection to a port nothing listens on: no mock stands in for the database.
    const down = createDb({ ...testDbSettings(), port: 1 });
    try {
      const res = await request(createApp({ db: down })).get('/api/health');
      expect(res.status).toBe(503);
      expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('db_unavailable');
      expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    } finally {
      await down.destroy();
    }
  });

  it('sends the envelope for an unknown API route', async () => {
    const res = await request(createApp({ db })).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
