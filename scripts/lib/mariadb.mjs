// A private MariaDB for this checkout: data in .data/, bound to 127.0.0.1 on its own port.
// Always pass --defaults-file so nothing is read from /etc/mysql and the system instance is never touched.
import { spawn, spawnSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDebianPackages, isRoot, log, root } from './run.mjs';

const APP_USER = 'conestack';
const APP_PASSWORD = 'conestack-local';

export function mariadbConfig({ name, port, database, durable = false }) {
  const dir = join(root, '.data', name);
  return {
    dir,
    dataDir: join(dir, 'data'),
    cnf: join(dir, 'my.cnf'),
    socket: join(dir, 'mysqld.sock'),
    port,
    database,
    durable,
    user: APP_USER,
    password: APP_PASSWORD,
  };
}

function writeCnf(cfg) {
  mkdirSync(cfg.dataDir, { recursive: true });
  const lines = [
    '[mysqld]',
    `datadir=${cfg.dataDir}`,
    `socket=${cfg.socket}`,
    `pid-file=${join(cfg.dir, 'mysqld.pid')}`,
    `log-error=${join(cfg.dir, 'error.log')}`,
    `port=${cfg.port}`,
    'bind-address=127.0.0.1',
    'skip-name-resolve',
    'character-set-server=utf8mb4',
    'collation-server=utf8mb4_unicode_ci',
    'innodb_buffer_pool_size=256M',
    // 1 writes and syncs the redo log at every commit, so a committed write survives a power cut.
    // 2 (test instances) syncs about once a second: an OS crash or power cut can lose the last
    // second of commits, a crash of mariadbd alone loses nothing; test data is thrown away anyway.
    `innodb_flush_log_at_trx_commit=${cfg.durable ? 1 : 2}`,
    'max_connections=300',
    'group_concat_max_len=67108864',
    ...(isRoot() ? ['user=root'] : []),
    '[client]',
    `socket=${cfg.socket}`,
    `port=${cfg.port}`,
    '',
  ];
  writeFileSync(cfg.cnf, lines.join('\n'));
}

function admin(cfg, args) {
  return spawnSync('mariadb-admin', [`--defaults-file=${cfg.cnf}`, '--user=root', ...args], { encoding: 'utf8' });
}

export function ping(cfg) {
  return admin(cfg, ['--connect-timeout=1', 'ping']).status === 0;
}

function sql(cfg, statement) {
  const r = spawnSync('mariadb', [`--defaults-file=${cfg.cnf}`, '--user=root', '-e', statement], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`MariaDB statement failed: ${r.stderr}`);
}

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** `mariadb-admin shutdown` for this instance: a clean stop that flushes InnoDB. */
export function shutdownCommand(cfg) {
  return ['mariadb-admin', `--defaults-file=${cfg.cnf}`, '--user=root', 'shutdown'];
}

/**
 * Spawns mariadbd for an initialised data directory and resolves with its child process once it
 * answers; throws with the last lines of its error log when it does not come up.
 */
export async function launchMariadbd(cfg) {
  const out = openSync(join(cfg.dir, 'mariadbd.out'), 'a');
  // Own process group: a Ctrl-C in the terminal must not kill it mid-write; we shut it down ourselves.
  const child = spawn('mariadbd', [`--defaults-file=${cfg.cnf}`], { detached: true, stdio: ['ignore', out, out] });
  closeSync(out);
  // InnoDB crash recovery after a kill can take a while on a slow disk.
  for (let i = 0; i < 300; i++) {
    if (ping(cfg)) {
      log(`MariaDB up on 127.0.0.1:${cfg.port}`);
      return child;
    }
    if (child.exitCode !== null || child.signalCode !== null) break;
    await sleep(100);
  }
  if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
  const logFile = join(cfg.dir, 'error.log');
  const lastError = existsSync(logFile) ? readFileSync(logFile, 'utf8').split('\n').filter((l) => l.includes('[ERROR]')).slice(-2).join('\n') : '';
  const hint = /Address already in use/.test(lastError) ? `\nPort ${cfg.port} is taken by another program; choose another with DB_PORT (npm start) or TEST_DB_PORT (npm test).` : '';
  throw new Error(`MariaDB did not start on 127.0.0.1:${cfg.port}; see ${logFile}\n${lastError}${hint}`);
}

/** Stops the instance cleanly and waits until it no longer answers. */
export async function shutdownMariadb(cfg) {
  const r = admin(cfg, ['shutdown']);
  if (r.status !== 0) process.stderr.write(`[conestack] MariaDB shutdown: ${r.stderr}\n`);
  for (let i = 0; i < 100 && ping(cfg); i++) await sleep(100);
  log('MariaDB stopped');
}

/**
 * Starts the instance (installing the Debian package if needed) and makes sure the database and
 * the app user exist. Resolves with `{ cfg, stop, startedHere, child }`; `child` is the mariadbd
 * process when it was started here.
 */
export async function startMariadb(options) {
  ensureDebianPackages(['mariadb-server', 'mariadb-client'], 'the local database');
  const cfg = mariadbConfig(options);
  writeCnf(cfg);
  let child = null;
  if (!ping(cfg)) {
    if (!existsSync(join(cfg.dataDir, 'mysql'))) {
      log(`initialising MariaDB data in ${cfg.dataDir}`);
      const init = spawnSync(
        'mariadb-install-db',
        [`--defaults-file=${cfg.cnf}`, '--skip-test-db', '--auth-root-authentication-method=socket', ...(isRoot() ? ['--user=root'] : [])],
        { encoding: 'utf8' },
      );
      if (init.status !== 0) throw new Error(`mariadb-install-db failed:\n${init.stdout}\n${init.stderr}`);
    }
    child = await launchMariadbd(cfg);
    // Whoever started it stops it with stop(); it must not keep a finished script alive.
    child.unref();
  } else {
    log(`MariaDB already running on 127.0.0.1:${cfg.port}`);
  }
  const startedHere = child !== null;
  const databases = [cfg.database, ...(options.extraDatabases ?? [])];
  sql(
    cfg,
    [
      `CREATE USER IF NOT EXISTS '${cfg.user}'@'127.0.0.1' IDENTIFIED BY '${cfg.password}';`,
      ...databases.flatMap((name) => [
        `CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
        `GRANT ALL PRIVILEGES ON \`${name}\`.* TO '${cfg.user}'@'127.0.0.1';`,
      ]),
      'FLUSH PRIVILEGES;',
    ].join(' '),
  );
  const stop = async () => {
    if (startedHere) await shutdownMariadb(cfg);
  };
  return { cfg, stop, startedHere, child };
}

export function dbEnv(cfg) {
  return {
    DB_HOST: '127.0.0.1',
    DB_PORT: String(cfg.port),
    DB_USER: cfg.user,
    DB_PASSWORD: cfg.password,
    DB_NAME: cfg.database,
  };
}
