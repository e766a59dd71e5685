// Small process helpers shared by the start, test and bench scripts. Node built-ins only:
// these run before `npm ci` has installed anything.
import { spawn, spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

export function log(message) {
  process.stdout.write(`[conestack] ${message}\n`);
}

/** Runs a command to completion, inheriting stdio; returns the exit code. */
export function runSync(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', cwd: root, ...options });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

export function mustRun(cmd, args, options = {}) {
  const code = runSync(cmd, args, options);
  if (code !== 0) {
    throw new Error(`${cmd} ${args.join(' ')} exited with ${code}`);
  }
}

/** Runs a command asynchronously and resolves with its exit code. */
export function runAsync(cmd, args, options = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: 'inherit', cwd: root, ...options });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

export function commandExists(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

export function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

/** Installs Debian packages when running as root; otherwise explains the exact command and exits. */
export function ensureDebianPackages(packages, why) {
  const missing = packages.filter(
    (p) => spawnSync('dpkg-query', ['-W', '-f=${Status}', p], { encoding: 'utf8' }).stdout?.includes('install ok installed') !== true,
  );
  if (missing.length === 0) return;
  const command = `apt-get update && apt-get install -y ${missing.join(' ')}`;
  if (!isRoot()) {
    process.stderr.write(`[conestack] ${why} needs Debian packages: ${missing.join(', ')}.\n`);
    process.stderr.write(`[conestack] Install them, then run again:\n\n    sudo sh -c '${command}'\n\n`);
    process.exit(2);
  }
  log(`installing ${missing.join(', ')} (${why})`);
  mustRun('sh', ['-c', command], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
}
