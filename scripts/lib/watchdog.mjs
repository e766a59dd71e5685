// Runs beside `npm start`'s supervisor with a pipe from it on stdin, one JSON line per change:
// `{ name, pid, shutdown? }` when a child starts, `{ name, pid: null }` when it ends. The pipe
// closes however the supervisor ends, even by SIGKILL, which it cannot catch; whatever is still
// listed then is stopped: with its shutdown command if it has one (mariadb-admin), else SIGTERM.
import { spawnSync } from 'node:child_process';
import { processAlive as alive } from './process-alive.mjs';

const tracked = new Map();
let pending = '';

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

async function waitGone(pid, ms) {
  for (let waited = 0; waited < ms && alive(pid); waited += 100) await sleep(100);
  return !alive(pid);
}

function signal(pid, name) {
  try {
    process.kill(pid, name);
  } catch {
    // already gone
  }
}

async function stopOne({ name, pid, shutdown }) {
  if (!alive(pid)) return;
  process.stderr.write(`[conestack] supervisor gone; stopping ${name} (pid ${pid})\n`);
  if (shutdown) {
    spawnSync(shutdown[0], shutdown.slice(1), { stdio: 'ignore', timeout: 30_000 });
    if (await waitGone(pid, 30_000)) return;
  }
  signal(pid, 'SIGTERM');
  if (!(await waitGone(pid, 10_000))) signal(pid, 'SIGKILL');
}

let cleaning = false;
async function cleanUp() {
  if (cleaning) return;
  cleaning = true;
  // The last started first: the server before the database it writes to.
  for (const entry of [...tracked.values()].reverse()) if (entry.pid) await stopOne(entry);
  process.exit(0);
}

process.stdin.setEncoding('utf8');
process.stdin.on('data', (chunk) => {
  pending += chunk;
  const lines = pending.split('\n');
  pending = lines.pop() ?? '';
  for (const line of lines) {
    if (!line.trim()) continue;
    const message = JSON.parse(line);
    // A restarted child keeps its first place in the order.
    tracked.set(message.name, message);
  }
});
process.stdin.on('end', () => void cleanUp());
process.stdin.on('close', () => void cleanUp());
process.stdin.on('error', () => void cleanUp());
