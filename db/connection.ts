import knex, { type Knex } from 'knex';
import { migrationSource } from './migrations';

export interface DbSettings {
  host: string;
  port: number;
  user: string;
  password: string;
  database: string;
}

export function dbSettingsFromEnv(env: NodeJS.ProcessEnv = process.env): DbSettings {
  return {
    host: env.DB_HOST ?? '127.0.0.1',
    port: Number(env.DB_PORT ?? 3307),
    user: env.DB_USER ?? 'conestack',
    password: env.DB_PASSWORD ?? 'conestack-local',
    database: env.DB_NAME ?? 'conestack',
  };
}

export function knexConfig(settings: DbSettings): Knex.Config {
  return {
    client: 'mysql2',
    // No charset here: it would override the database's collation on new tables.
    connection: { ...settings, dateStrings: true, connectTimeout: 2000 },
    pool: { min: 0, max: 10 },
    acquireConnectionTimeout: 3000,
    migrations: { migrationSource, tableName: 'knex_migrations' },
  };
}

export function createDb(settings: DbSettings = dbSettingsFromEnv()): Knex {
  return knex(knexConfig(settings));
}
