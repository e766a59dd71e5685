import request from 'supertest';
import { createApp } from '../../server/app';
import { createTestDb } from '../support/test-db';

// HSTS is defined for secure transport only (RFC 6797 §7.2: a host must not send it over plain http).
describe('Strict-Transport-Security', () => {
  const db = createTestDb();
  afterAll(() => db.destroy());

  it('is not sent over plain http, even when a client claims https through a proxy header it is not trusted for', async () => {
    const app = createApp({ db, auth: { publicUrl: 'http://127.0.0.1:8080' } });
    for (const path of ['/api/health', '/o/abcd/embed', '/api/no-such-route']) {
      const plain = await request(app).get(path);
      expect(plain.headers['strict-transport-security']).toBeUndefined();
      expect(plain.headers['x-content-type-options']).toBe('nosniff');
      const forged = await request(app).get(path).set('X-Forwarded-Proto', 'https');
      expect(forged.headers['strict-transport-security']).toBeUndefined();
    }
  });

  it('is sent on https requests behind the trusted proxy of an https site', async () => {
    const app = createApp({ db, auth: { publicUrl: 'https://conestack.example.invalid' } });
    for (const path of ['/api/health', '/o/abcd/embed']) {
      const secure = await request(app).get(path).set('X-Forwarded-Proto', 'https');
      expect(secure.headers['strict-transport-security']).toMatch(/^max-age=\d+; includeSubDomains$/);
      // The same site answering an http request (before its redirect to https) leaves it out.
      const plain = await request(app).get(path).set('X-Forwarded-Proto', 'http');
      expect(plain.headers['strict-transport-security']).toBeUndefined();
    }
  });
});
