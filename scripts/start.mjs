// `npm start`: everything needed to use Conestack locally, from a fresh clone, then serve it.
// The server and the private MariaDB are restarted when they die; Ctrl-C, SIGTERM or a crash of
// this script stops both.
import { spawn } from 'node:child_process';
import { ensureDependencies } from './lib/deps.mjs';
import { log, mustRun, root } from './lib/run.mjs';

ensureDependencies();
const { startMariadb, dbEnv, launchMariadbd, shutdownMariadb, shutdownCommand } = await import('./lib/mariadb.mjs');
const { ensureWebBuild } = await import('./lib/web.mjs');
const { createSupervisor, exited, startWatchdog, terminate } = await import('./lib/supervise.mjs');

const port = Number(process.env.PORT ?? 8080);
const dbPort = Number(process.env.DB_PORT ?? 3307);
// Another data folder under .data/ (default `mariadb`), so a second instance can run beside the first.
const instance = process.env.CONESTACK_DB_INSTANCE ?? 'mariadb';
const watchdog = startWatchdog();
const supervisor = createSupervisor({ watchdog });

let stopping = false;
async function stopAll(code) {
  if (stopping) return;
  stopping = true;
  log('stopping the server and MariaDB');
  await supervisor.stop();
  process.exit(code);
}
process.on('SIGINT', () => void stopAll(0));
process.on('SIGTERM', () => void stopAll(0));
process.on('SIGHUP', () => void stopAll(0));
process.on('uncaughtException', (err) => {
  process.stderr.write(`[conestack] start script crashed: ${err.stack ?? err}\n`);
  void stopAll(1);
});
process.on('unhandledRejection', (err) => {
  process.stderr.write(`[conestack] start script crashed: ${err instanceof Error ? err.stack : err}\n`);
  void stopAll(1);
});

let maria;
try {
  maria = await startMariadb({ name: instance, port: dbPort, database: 'conestack', durable: true });
} catch (err) {
  process.stderr.write(`[conestack] ${err instanceof Error ? err.message : err}\n`);
  await stopAll(1);
}
const env = { ...process.env, ...dbEnv(maria.cfg), PORT: String(port) };
if (maria.child) {
  await supervisor.add(
    {
      name: 'MariaDB',
      start: () => launchMariadbd(maria.cfg),
      stop: async (child) => {
        await shutdownMariadb(maria.cfg);
        await exited(child);
      },
      watchInfo: (child) => ({ pid: child.pid, shutdown: shutdownCommand(maria.cfg) }),
    },
    maria.child,
  );
} else {
  log('MariaDB was already running, so it is neither watched nor stopped here');
}

try {
  mustRun('node', ['--import', 'tsx', 'db/setup.ts', '--demo'], { env });
  // For the supervision test, which needs only the API.
  if (process.env.CONESTACK_SKIP_WEB_BUILD !== '1') ensureWebBuild();
} catch (err) {
  process.stderr.write(`[conestack] ${err instanceof Error ? err.message : err}\n`);
  await stopAll(1);
}

await supervisor.add({
  name: 'server',
  // Own process group like MariaDB's: Ctrl-C reaches only this script, which then stops both in order.
  start: async () => spawn('node', ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: 'inherit', detached: true }),
  stop: (child) => terminate(child),
});
log(`open http://127.0.0.1:${port} (Ctrl-C stops the server and MariaDB)`);
