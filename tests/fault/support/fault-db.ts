// The fault suite's own MariaDB: started, frozen, killed and restarted by the tests, so the
// shared test instance is never touched. The start logic is the one `npm start` uses.
import { execFile, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import type { DbSettings } from '../../../db/connection';

export const root = join(__dirname, '..', '..', '..');
const NAME = 'mariadb-fault';
const DATABASE = 'conestack_fault';

export interface FaultDbConfig {
  dir: string;
  cnf: string;
  port: number;
  database: string;
  user: string;
  password: string;
}

/** Starts (or finds running) the instance on `port`; resolves once it answers. */
export async function startFaultDb(port: number): Promise<FaultDbConfig> {
  // scripts/lib is plain ESM for Node; run it in its own process rather than through jest's loader.
  const script = `const m = await import('./scripts/lib/mariadb.mjs'); const r = await m.startMariadb({ name: '${NAME}', port: ${port}, database: '${DATABASE}' }); console.log(JSON.stringify(r.cfg));`;
  const { stdout } = await promisify(execFile)('node', ['--input-type=module', '-e', script], { cwd: root });
  const cfg = JSON.parse(stdout.trim().split('\n').pop() as string) as FaultDbConfig;
  return cfg;
}

export function faultDbConfig(): FaultDbConfig {
  const raw = process.env.FAULT_DB;
  if (!raw) throw new Error('the fault suite runs with its global setup: npx jest --selectProjects fault');
  return JSON.parse(raw) as FaultDbConfig;
}

export function faultDbSettings(cfg = faultDbConfig()): DbSettings {
  return { host: '127.0.0.1', port: cfg.port, user: cfg.user, password: cfg.password, database: cfg.database };
}

export function faultDbEnv(cfg = faultDbConfig()): Record<string, string> {
  return { DB_HOST: '127.0.0.1', DB_PORT: String(cfg.port), DB_USER: cfg.user, DB_PASSWORD: cfg.password, DB_NAME: cfg.database };
}

export function mariadbPid(cfg = faultDbConfig()): number {
  const file = join(cfg.dir, 'mysqld.pid');
  if (!existsSync(file)) throw new Error(`no pid file at ${file}: is the fault MariaDB running?`);
  return Number(readFileSync(file, 'utf8').trim());
}

export function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** SIGTERM, then waits until the process is gone (MariaDB shuts down cleanly on it). */
export async function killFaultDb(cfg = faultDbConfig()): Promise<void> {
  const pid = mariadbPid(cfg);
  process.kill(pid, 'SIGTERM');
  for (let i = 0; i < 300 && isAlive(pid); i++) await sleep(50);
  if (isAlive(pid)) throw new Error(`MariaDB ${pid} did not stop within 15 s of SIGTERM`);
}

export function shutdownFaultDb(cfg = faultDbConfig()): void {
  spawnSync('mariadb-admin', [`--defaults-file=${cfg.cnf}`, '--user=root', 'shutdown'], { stdio: 'ignore' });
}
