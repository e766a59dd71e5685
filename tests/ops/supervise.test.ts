// Drives `npm start` (scripts/start.mjs) as a user would, with its own MariaDB data folder and
// free ports, and kills its children and itself the ways a crash would.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { processAlive as alive } from '../../scripts/lib/process-alive.mjs';
import { defaultBackoff, nextDelay } from '../../scripts/lib/backoff.mjs';
import { freePort } from '../support/free-port';

const root = join(__dirname, '..', '..');
const instance = 'mariadb-supervise-test';
const instanceDir = join(root, '.data', instance);
const cnf = join(instanceDir, 'my.cnf');

jest.setTimeout(240_000);

/** The live server processes started from this checkout's start script, by parent. */
function serverPid(supervisorPid: number): number | null {
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, 'utf8');
      const ppid = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
      const cmd = readFileSync(`/proc/${name}/cmdline`, 'utf8');
      if (ppid === supervisorPid && cmd.includes('server/index.ts') && alive(Number(name))) return Number(name);
    } catch {
      // the process ended while we looked
    }
  }
  return null;
}

const mariadbPid = () => (existsSync(join(instanceDir, 'mysqld.pid')) ? Number(readFileSync(join(instanceDir, 'mysqld.pid'), 'utf8').trim()) : null);

async function until<T>(what: string, probe: () => T | null | false | Promise<T | null | false>, ms = 60_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await probe();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function healthy(port: number): Promise<boolean> {
  try {
    const res = await fetch(`http://127.0.0.1:${port}/api/health`, { signal: AbortSignal.timeout(2000) });
    return res.status === 200;
  } catch {
    return false;
  }
}

type Started = { child: ChildProcess; port: number; output: () => string; exit: Promise<number | null> };

async function startSupervisor(): Promise<Started> {
  const port = await freePort();
  const dbPort = await freePort();
  // Own process group, as a terminal gives `npm start`, so the test can send Ctrl-C to the group.
  const child = spawn(process.execPath, ['scripts/start.mjs'], {
    cwd: root,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, PORT: String(port), DB_PORT: String(dbPort), CONESTACK_DB_INSTANCE: instance, CONESTACK_SKIP_WEB_BUILD: '1', NODE_ENV: 'development' },
  });
  let out = '';
  child.stdout?.on('data', (d) => (out += d));
  child.stderr?.on('data', (d) => (out += d));
  const exit = new Promise<number | null>((r) => child.once('exit', (code) => r(code)));
  await until('the server to answer', () => healthy(port), 180_000).catch((err) => {
    throw new Error(`${err.message}\n${out}`);
  });
  return { child, port, output: () => out, exit };
}

let current: Started | null = null;

afterAll(() => {
  // Whatever a failed test left running.
  if (current?.child.pid && alive(current.child.pid)) process.kill(current.child.pid, 'SIGKILL');
  const server = current?.child.pid ? serverPid(current.child.pid) : null;
  if (server) process.kill(server, 'SIGKILL');
  if (existsSync(cnf)) spawnSync('mariadb-admin', [`--defaults-file=${cnf}`, '--user=root', 'shutdown'], { stdio: 'ignore' });
});

describe('npm start supervises the server and MariaDB', () => {
  it('restarts a killed server and a killed MariaDB, and Ctrl-C stops both', async () => {
    current = await startSupervisor();
    const supervisor = current.child.pid as number;
    const firstServer = await until('the server process', () => serverPid(supervisor));

    process.kill(firstServer, 'SIGKILL');
    await until('the restart log line', () => /server was killed by SIGKILL after [\d.]+ s; restarting in 0\.5 s/.test(current!.output()));
    const secondServer = await until('a new server', () => {
      const pid = serverPid(supervisor);
      return pid !== null && pid !== firstServer ? pid : null;
    });
    await until('the restarted server to answer', () => healthy(current!.port));

    const firstDb = mariadbPid() as number;
    expect(alive(firstDb)).toBe(true);
    process.kill(firstDb, 'SIGKILL');
    await until('the MariaDB restart log line', () => /MariaDB was killed by SIGKILL after [\d.]+ s; restarting/.test(current!.output()));
    const secondDb = await until('a new mariadbd', () => {
      const pid = mariadbPid();
      return pid && pid !== firstDb && alive(pid) ? pid : null;
    });
    // The server stays up through the database's restart and reaches the new instance.
    await until('the server to see the database again', () => healthy(current!.port));
    expect(serverPid(supervisor)).toBe(secondServer);

    process.kill(-supervisor, 'SIGINT');
    expect(await current.exit).toBe(0);
    expect(alive(secondServer)).toBe(false);
    expect(alive(secondDb)).toBe(false);
    expect(current.output()).toContain('MariaDB stopped');
  });

  it('stops both within a few seconds when the supervisor itself is killed with SIGKILL', async () => {
    current = await startSupervisor();
    const supervisor = current.child.pid as number;
    const server = await until('the server process', () => serverPid(supervisor));
    const db = mariadbPid() as number;
    expect(alive(db)).toBe(true);

    process.kill(supervisor, 'SIGKILL');
    await current.exit;
    await until('the server and MariaDB to stop', () => !alive(server) && !alive(db), 15_000);
    // mariadb-admin shutdown, not a kill: the error log records a normal shutdown.
    expect(readFileSync(join(instanceDir, 'error.log'), 'utf8').split('\n').slice(-10).join('\n')).toMatch(/Shutdown complete/);
  });
});

describe('restart back-off', () => {
  // Doubling from a short first wait to a cap, reset after a stable run: common practice, no source.
  it('doubles from 0.5 s to at most 10 s while the child keeps dying, and starts over after a long run', () => {
    const waits: number[] = [];
    let last: number | null = null;
    for (let i = 0; i < 7; i++) waits.push((last = nextDelay(last, 100)));
    expect(waits).toEqual([500, 1000, 2000, 4000, 8000, 10_000, 10_000]);
    expect(nextDelay(10_000, defaultBackoff.stableMs)).toBe(500);
  });
});
