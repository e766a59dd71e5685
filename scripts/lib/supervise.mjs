// Keeps `npm start`'s long-running children alive. A child that ends for any reason, an exit code
// or a signal, is started again after a back-off; stopping always takes every child down, and a
// watchdog process does the same if the supervisor itself dies without the chance to.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { defaultBackoff, nextDelay } from './backoff.mjs';
import { log, root } from './run.mjs';

/** Why a child ended, in words for the log. */
export function describeExit(code, signal) {
  return signal ? `was killed by ${signal}` : `exited with code ${code}`;
}

const seconds = (ms) => `${(ms / 1000).toFixed(1)} s`;

/**
 * Starts the watchdog: a detached process that reads, over a pipe, which children are running
 * and stops them when the pipe closes, which happens however the supervisor ends (even SIGKILL).
 */
export function startWatchdog() {
  const child = spawn(process.execPath, [join(root, 'scripts', 'lib', 'watchdog.mjs')], { detached: true, stdio: ['pipe', 'inherit', 'inherit'] });
  child.unref();
  child.stdin.unref?.();
  // A watchdog that is gone only loses the SIGKILL safety net; the supervisor keeps working.
  child.stdin.on('error', () => {});
  const send = (message) => {
    if (child.stdin.writable) child.stdin.write(`${JSON.stringify(message)}\n`);
  };
  return {
    track: (name, info) => send({ name, ...info }),
    untrack: (name) => send({ name, pid: null }),
    release: () => child.stdin.end(),
  };
}

/**
 * A service is `{ name, start(): Promise<ChildProcess>, stop(child): Promise<void>, watchInfo?(child) }`;
 * `watchInfo` tells the watchdog how to stop it (`{ pid, shutdown?: argv }`).
 */
export function createSupervisor({ backoff = defaultBackoff, watchdog = null } = {}) {
  const services = [];
  const timers = new Set();
  let stopping = false;

  function watch(entry, child) {
    entry.child = child;
    entry.startedAt = Date.now();
    watchdog?.track(entry.service.name, entry.service.watchInfo?.(child) ?? { pid: child.pid });
    child.once('exit', (code, signal) => {
      entry.child = null;
      watchdog?.untrack(entry.service.name);
      if (stopping) return;
      restartLater(entry, Date.now() - entry.startedAt, `${describeExit(code, signal)} after ${seconds(Date.now() - entry.startedAt)}`);
    });
  }

  function restartLater(entry, uptimeMs, why) {
    entry.delay = nextDelay(entry.delay, uptimeMs, backoff);
    log(`${entry.service.name} ${why}; restarting in ${seconds(entry.delay)}`);
    const timer = setTimeout(() => {
      timers.delete(timer);
      void relaunch(entry);
    }, entry.delay);
    timers.add(timer);
  }

  async function relaunch(entry) {
    if (stopping) return;
    // stop() waits for a start under way, so a child that comes up during Ctrl-C is stopped too.
    entry.starting = entry.service.start();
    let child;
    try {
      child = await entry.starting;
    } catch (err) {
      if (!stopping) restartLater(entry, 0, `could not start (${err instanceof Error ? err.message.split('\n')[0] : err})`);
      return;
    } finally {
      entry.starting = null;
    }
    watch(entry, child);
  }

  return {
    /** Watches `child` if given (already started), else starts the service; a first start that fails throws. */
    async add(service, child = null) {
      const entry = { service, child: null, starting: null, startedAt: 0, delay: null };
      services.push(entry);
      watch(entry, child ?? (await service.start()));
    },
    /** Stops every child, the last added first (the server before the database it uses). */
    async stop() {
      stopping = true;
      for (const t of timers) clearTimeout(t);
      timers.clear();
      for (const entry of [...services].reverse()) {
        const started = entry.starting ? await entry.starting.catch(() => null) : null;
        const child = entry.child ?? started;
        if (child) await entry.service.stop(child);
      }
      watchdog?.release();
    },
  };
}

/** Resolves once `child` has ended (at once if it already has). */
export function exited(child) {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => child.once('exit', resolve));
}

/** SIGTERM, then SIGKILL if the child is still there after `graceMs`. */
export async function terminate(child, graceMs = 10_000) {
  if (child.exitCode !== null || child.signalCode !== null) return;
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), graceMs);
  await exited(child);
  clearTimeout(timer);
}
