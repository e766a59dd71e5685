// Rebuilds the web export only when its inputs changed: a cold export takes minutes, a check milliseconds.
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { log, mustRun, root } from './run.mjs';

const inputs = ['app', 'features', 'shared', 'assets', 'app.json', 'babel.config.js', 'package-lock.json', 'tsconfig.json', 'metro.config.js'];
const stamp = join(root, 'dist', '.source-hash');

function walk(path, files) {
  if (!existsSync(path)) return;
  const st = statSync(path);
  if (st.isDirectory()) {
    for (const name of readdirSync(path).sort()) {
      if (name.endsWith('.test.ts') || name.endsWith('.test.tsx')) continue;
      walk(join(path, name), files);
    }
  } else files.push(path);
}

export function sourceHash() {
  const files = [];
  for (const i of inputs) walk(join(root, i), files);
  const h = createHash('sha256');
  for (const f of files) h.update(relative(root, f)).update('\0').update(readFileSync(f));
  return h.digest('hex');
}

export function ensureWebBuild() {
  const hash = sourceHash();
  if (existsSync(stamp) && readFileSync(stamp, 'utf8') === hash && existsSync(join(root, 'dist', 'index.html'))) {
    return;
  }
  log('building the web app (expo export); the first build takes a few minutes');
  mustRun('node', ['scripts/copy-canvaskit.mjs']);
  mustRun('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist', '--clear'], {
    env: { ...process.env, EXPO_NO_TELEMETRY: '1', CI: '1', NODE_ENV: 'production' },
  });
  writeFileSync(stamp, hash);
}
