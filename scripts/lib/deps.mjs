// `npm ci` only when the lockfile changed since the last install, so repeat starts are quick.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { log, mustRun, root } from './run.mjs';

const stampFile = join(root, 'node_modules', '.conestack-lock-hash');

export function ensureDependencies() {
  const lock = readFileSync(join(root, 'package-lock.json'));
  const hash = createHash('sha256').update(lock).digest('hex');
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8') === hash) return;
  log('installing npm dependencies (npm ci)');
  mustRun('npm', ['ci', '--no-audit', '--no-fund']);
  writeFileSync(stampFile, hash);
}
