import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { freePort } from '../../tests/support/free-port';

const root = join(__dirname, '..', '..');

/** Starts the real server (API + exported web app) against the test database. */
export async function startAppServer(): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const env = { DB_PORT: '3308', DB_NAME: 'conestack_test', ...process.env, PORT: String(port), WEB_DIR: join(root, 'dist') };
  const child = spawn('node', ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: ['ignore', 'pipe', 'inherit'] });
  const url = `http://127.0.0.1:${port}`;
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('app server did not start within 30 s')), 30_000);
    child.stdout?.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('serving on')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.once('exit', (code) => reject(new Error(`app server exited with ${code}`)));
  });
  return { url, child };
}
