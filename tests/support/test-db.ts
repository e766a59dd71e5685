import type { Knex } from 'knex';
import { createDb, dbSettingsFromEnv } from '../../db/connection';

/** The private test instance that `npm test` starts (127.0.0.1:3308, database conestack_test). */
export function testDbSettings() {
  const env = { DB_PORT: '3308', DB_NAME: 'conestack_test', ...process.env };
  return dbSettingsFromEnv(env);
}

export function createTestDb(): Knex {
  return createDb(testDbSettings());
}
