import knex, { type Knex } from 'knex';
import { migrationSource } from './migrations';
import { guardedMySql2Client, LOCK_WAIT_SECONDS, type DbTimeouts } from './outage-guard';

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

// Knex warns on every failed acquire; during an outage the guard logs once instead.
const quietPoolLog = {
  warn: (message: string) => {
    if (!/^(Acquire connection error|Connection Error)/.test(message)) console.warn(message);
  },
};

/**
 * The server's connection: every query bounded in time and an outage answered at once (see
 * outage-guard.ts). Setup, migrations and scripts use createDb, where a long query is legitimate.
 */
export function guardedKnexConfig(settings: DbSettings, timeouts: DbTimeouts): Knex.Config {
  const connection = { ...settings, dateStrings: true, connectTimeout: timeouts.connectMs };
  return {
    ...knexConfig(settings),
    client: guardedMySql2Client(connection, timeouts) as unknown as typeof Knex.Client,
    connection,
    acquireConnectionTimeout: timeouts.acquireMs,
    pool: {
      min: 0,
      max: 10,
      createTimeoutMillis: timeouts.connectMs + timeouts.queryMs,
      // A lock wait then ends with its own error well inside the query timeout.
      afterCreate: (conn: { query: (sql: string, cb: (err: unknown) => void) => void }, done: (err: unknown, c: unknown) => void) =>
        conn.query(`SET SESSION innodb_lock_wait_timeout = ${LOCK_WAIT_SECONDS}`, (err) => done(err, conn)),
    },
    log: quietPoolLog,
  };
}

export function createDb(settings: DbSettings = dbSettingsFromEnv(), options: { timeouts?: DbTimeouts } = {}): Knex {
  return knex(options.timeouts ? guardedKnexConfig(settings, options.timeouts) : knexConfig(settings));
}
