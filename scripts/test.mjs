// `npm test`: sets up what the suites need (dependencies, a private test MariaDB, Chromium, the
// web export), runs typecheck, lint, the jest suites (the fault suite after the main ones) and the browser flows, and ends with one
// "N passed, N failed" line. Exits non-zero on any failure.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';
import { ensureDebianPackages, log, root, runAsync, runSync } from './lib/run.mjs';

ensureDependencies();
ensureDebianPackages(['chromium'], 'the browser tests');
const { startMariadb, dbEnv } = await import('./lib/mariadb.mjs');
const { ensureWebBuild } = await import('./lib/web.mjs');

const dbPort = Number(process.env.TEST_DB_PORT ?? 3308);
const maria = await startMariadb({ name: 'mariadb-test', port: dbPort, database: 'conestack_test' });
const env = { ...process.env, ...dbEnv(maria.cfg), NODE_ENV: 'test', CONESTACK_TEST: '1' };
const results = { passed: 0, failed: 0 };
const outDir = join(root, 'artifacts');
mkdirSync(outDir, { recursive: true });

function check(name, code) {
  if (code === 0) results.passed += 1;
  else {
    results.failed += 1;
    log(`FAILED: ${name}`);
  }
}

async function jest(name, args) {
  const file = join(outDir, `jest-${name}.json`);
  rmSync(file, { force: true });
  const code = await runAsync('npx', ['jest', ...args, '--json', `--outputFile=${file}`], { env });
  if (!existsSync(file)) {
    check(`jest ${name} (no report)`, 1);
    return;
  }
  const report = JSON.parse(readFileSync(file, 'utf8'));
  results.passed += report.numPassedTests;
  results.failed += report.numFailedTests;
  // A suite that fails to load has no failed tests but must still fail the run.
  const brokenSuites = report.testResults.filter((r) => r.status === 'failed' && r.assertionResults.every((a) => a.status !== 'failed'));
  for (const s of brokenSuites) check(`suite ${s.name}: ${s.message.split('\n')[0]}`, 1);
  if (code !== 0 && report.numFailedTests === 0 && brokenSuites.length === 0) check(`jest ${name} exited ${code}`, 1);
}

let exitCode = 1;
try {
  check('database setup', runSync('node', ['--import', 'tsx', 'db/setup.ts', '--demo'], { env }));
  log('typecheck');
  check('typecheck', runSync('npx', ['tsc', '--noEmit', '-p', 'tsconfig.json']));
  log('lint');
  check('lint', runSync('npx', ['eslint', '.', '--max-warnings=0']));
  log('unit, API and client suites');
  await jest('main', ['--selectProjects', 'unit', 'api', 'client', '--maxWorkers=2']);
  log('fault suite (its own MariaDB and server; about two minutes)');
  await jest('fault', ['--selectProjects', 'fault', '--runInBand']);
  let built = true;
  try {
    ensureWebBuild();
  } catch (err) {
    built = false;
    check(`web build: ${err instanceof Error ? err.message : err}`, 1);
  }
  if (built) {
    log('browser flows');
    await jest('e2e', ['--selectProjects', 'e2e', '--runInBand']);
  }
  exitCode = results.failed === 0 ? 0 : 1;
} catch (err) {
  process.stderr.write(`[conestack] ${err instanceof Error ? err.stack : err}\n`);
  results.failed += 1;
} finally {
  await maria.stop();
}
process.stdout.write(`\n${results.passed} passed, ${results.failed} failed\n`);
process.exit(exitCode);
