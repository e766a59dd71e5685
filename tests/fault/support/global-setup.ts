import { execFile, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { freePort } from '../../support/free-port';
import { faultDbEnv, root, startFaultDb } from './fault-db';
import { resetFigures } from './figures';

/** Starts the suite's own MariaDB on a free port and loads the schema and demo catalogue into it. */
export default async function globalSetup(): Promise<void> {
  // A run that was cut short may have left its instance up on another port.
  const leftover = join(root, '.data', 'mariadb-fault', 'my.cnf');
  if (existsSync(leftover)) spawnSync('mariadb-admin', [`--defaults-file=${leftover}`, '--user=root', '--connect-timeout=2', 'shutdown'], { stdio: 'ignore' });
  const cfg = await startFaultDb(await freePort());
  process.env.FAULT_DB = JSON.stringify(cfg);
  await promisify(execFile)('node', ['--import', 'tsx', 'db/setup.ts', '--demo'], { cwd: root, env: { ...process.env, ...faultDbEnv(cfg) } });
  resetFigures();
}
