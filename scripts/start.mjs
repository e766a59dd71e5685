// `npm start`: everything needed to use Conestack locally, from a fresh clone, then serve it.
// Ctrl-C stops the server and the private MariaDB this script started.
import { spawn } from 'node:child_process';
import { ensureDependencies } from './lib/deps.mjs';
import { log, mustRun, root } from './lib/run.mjs';

ensureDependencies();
const { startMariadb, dbEnv } = await import('./lib/mariadb.mjs');
const { ensureWebBuild } = await import('./lib/web.mjs');

const port = Number(process.env.PORT ?? 8080);
const dbPort = Number(process.env.DB_PORT ?? 3307);
const maria = await startMariadb({ name: 'mariadb', port: dbPort, database: 'conestack' });
const env = { ...process.env, ...dbEnv(maria.cfg), PORT: String(port) };

let server;
let stopping = false;
async function stopAll(code) {
  if (stopping) return;
  stopping = true;
  if (server && server.exitCode === null) {
    server.kill('SIGTERM');
    await new Promise((r) => server.once('exit', r));
  }
  await maria.stop();
  process.exit(code);
}
process.on('SIGINT', () => void stopAll(0));
process.on('SIGTERM', () => void stopAll(0));

try {
  mustRun('node', ['--import', 'tsx', 'db/setup.ts', '--demo'], { env });
  ensureWebBuild();
} catch (err) {
  process.stderr.write(`[conestack] ${err instanceof Error ? err.message : err}\n`);
  await stopAll(1);
}

server = spawn('node', ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: 'inherit' });
server.on('exit', (code) => {
  if (!stopping) {
    log(`server exited (${code}); stopping`);
    void stopAll(code ?? 1);
  }
});
log(`open http://127.0.0.1:${port} (Ctrl-C stops the server and MariaDB)`);
