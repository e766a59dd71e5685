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

/** Removes the makers, drivers (with everything hanging off them) and users a suite created under its prefix. */
export async function removePrefixed(db: Knex, prefix: string): Promise<void> {
  const makers = await db('makers').where('slug', 'like', `${prefix}%`).select('id');
  await db('drivers').whereIn('maker_id', makers.map((m: { id: number }) => m.id)).delete();
  await db('makers').where('slug', 'like', `${prefix}%`).delete();
  await db('users').where('login', 'like', `${prefix}-%`).delete();
}
