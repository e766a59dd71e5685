// `npm run bench`: speed figures on a private benchmark database (127.0.0.1:3309 unless
// BENCH_DB_PORT is set). Builds catalogues of 1k, 10k and 50k invented drivers on first use.
import { ensureDependencies } from './lib/deps.mjs';
import { ensureDebianPackages, runSync } from './lib/run.mjs';

ensureDependencies();
ensureDebianPackages(['chromium'], 'the cursor frame-rate benchmark');
const { ensureWebBuild } = await import('./lib/web.mjs');
ensureWebBuild();
const { startMariadb, dbEnv } = await import('./lib/mariadb.mjs');
// One database per catalogue size, kept between runs so only the first run pays for the inserts.
const sizes = [1000, 10000, 50000];
const maria = await startMariadb({
  name: 'mariadb-bench',
  port: Number(process.env.BENCH_DB_PORT ?? 3309),
  database: 'conestack_bench',
  extraDatabases: sizes.map((n) => `conestack_bench_${n}`),
});
const env = { ...process.env, ...dbEnv(maria.cfg), NODE_ENV: 'production', BENCH_SIZES: sizes.join(',') };
let code = 0;
try {
  for (const file of ['tests/bench/search-bench.ts', 'tests/bench/overlay-bench.ts', 'tests/bench/parse-bench.ts', 'tests/bench/cursor-bench.ts']) {
    code = runSync('node', ['--import', 'tsx', '--max-old-space-size=4096', file], { env }) || code;
  }
} finally {
  await maria.stop();
}
process.exit(code);
