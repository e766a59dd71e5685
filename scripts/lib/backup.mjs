// Dumps and loads one database of a private MariaDB instance through its own --defaults-file, so
// the system instance is never touched. Dumps are gzip-compressed SQL.
import { spawn } from 'node:child_process';
import { createReadStream, createWriteStream, existsSync, mkdirSync, renameSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createGunzip, createGzip } from 'node:zlib';
import { mariadbConfig, ping } from './mariadb.mjs';
import { ensureDebianPackages, root } from './run.mjs';

/** The instance and database the backup scripts act on: `npm start`'s, or the ones the env names. */
export function backupTarget(env = process.env) {
  const cfg = mariadbConfig({ name: env.CONESTACK_DB_INSTANCE ?? 'mariadb', port: Number(env.DB_PORT ?? 3307), database: env.DB_NAME ?? 'conestack' });
  return { cfg, database: cfg.database, dir: env.BACKUP_DIR ?? join(root, 'backups') };
}

function requireRunning(cfg) {
  ensureDebianPackages(['mariadb-client'], 'backups');
  if (!existsSync(cfg.cnf) || !ping(cfg)) {
    throw new Error(`MariaDB in ${cfg.dir} is not running; start it with \`npm start\` first`);
  }
}

const client = (cfg, command, args) => [command, [`--defaults-file=${cfg.cnf}`, '--user=root', '--default-character-set=utf8mb4', ...args]];

/** Runs a client with stdin/stdout wired to streams; rejects with its stderr when it fails. */
async function runClient([command, args], { input, output }) {
  const child = spawn(command, args, { stdio: [input ? 'pipe' : 'ignore', output ? 'pipe' : 'ignore', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  const done = new Promise((resolve, reject) => {
    child.on('error', reject);
    child.on('exit', (code, signal) => (code === 0 ? resolve() : reject(new Error(`${command} failed (${signal ?? code}): ${stderr.trim()}`))));
  });
  await Promise.all([input ? pipeline(...input, child.stdin) : null, output ? pipeline(child.stdout, ...output) : null, done]);
}

const stamp = (d = new Date()) => d.toISOString().replace(/[-:]/g, '').replace('T', '-').slice(0, 15);

/**
 * A consistent dump of `database` (one transaction, so no locks and no writes half in), with
 * routines, triggers and events, blobs as hex. Written to a temporary name and renamed, so a
 * file under its final name is always complete. Resolves with the path.
 */
export async function backupDatabase({ cfg, database, dir }, label = '') {
  requireRunning(cfg);
  mkdirSync(dir, { recursive: true });
  const file = join(dir, `${database}-${stamp()}${label}.sql.gz`);
  const partial = `${file}.partial`;
  const args = ['--single-transaction', '--quick', '--routines', '--triggers', '--events', '--hex-blob', '--add-drop-table', '--skip-dump-date', database];
  try {
    await runClient(client(cfg, 'mariadb-dump', args), { output: [createGzip(), createWriteStream(partial)] });
  } catch (err) {
    rmSync(partial, { force: true });
    throw err;
  }
  renameSync(partial, file);
  return file;
}

/**
 * Replaces `database` with the dump in `file`: the database is dropped and created again first,
 * so tables the dump does not have are gone too.
 */
export async function restoreDatabase({ cfg, database }, file) {
  requireRunning(cfg);
  if (!existsSync(file)) throw new Error(`${file} does not exist`);
  const name = `\`${database.replace(/`/g, '``')}\``;
  await runClient(client(cfg, 'mariadb', ['-e', `DROP DATABASE IF EXISTS ${name}; CREATE DATABASE ${name} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`]), {});
  const read = file.endsWith('.gz') ? [createReadStream(file), createGunzip()] : [createReadStream(file)];
  await runClient(client(cfg, 'mariadb', [database]), { input: read });
}
