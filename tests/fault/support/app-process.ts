// The real server (node --import tsx server/index.ts) as a child process, so it can be killed.
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { freePort } from '../../support/free-port';
import { faultDbEnv, root } from './fault-db';

export const FAULT_ADMINS = ['fault-admin', 'fault-admin-a', 'fault-admin-b'];

export interface AppProcess {
  url: string;
  port: number;
  child: ChildProcess;
  /** Ends the process with `signal` and waits for it to exit. */
  kill(signal?: NodeJS.Signals): Promise<void>;
}

/** Starts the server on `port` (a free one by default); its output goes to artifacts/fault-server.log. */
export async function startApp(port?: number): Promise<AppProcess> {
  const p = port ?? (await freePort());
  mkdirSync(join(root, 'artifacts'), { recursive: true });
  const logFile = createWriteStream(join(root, 'artifacts', 'fault-server.log'), { flags: 'a' });
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...faultDbEnv(),
    PORT: String(p),
    HOST: '127.0.0.1',
    WEB_DIR: join(root, 'artifacts', 'no-web-export'),
    CONESTACK_ADMINS: FAULT_ADMINS.join(','),
    // The suite makes hundreds of changes a minute from one address.
    WRITES_PER_MINUTE: '1000000',
    NODE_ENV: 'production',
  };
  const child = spawn('node', ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
  child.stdout?.pipe(logFile, { end: false });
  child.stderr?.pipe(logFile, { end: false });
  const url = `http://127.0.0.1:${p}`;
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the server did not start within 30 s')), 30_000);
    const onExit = (code: number | null) => reject(new Error(`the server exited with ${code} before serving`));
    child.once('exit', onExit);
    child.stdout?.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('serving on')) {
        clearTimeout(timer);
        child.off('exit', onExit);
        resolve();
      }
    });
  });
  return {
    url,
    port: p,
    child,
    kill: async (signal = 'SIGTERM') => {
      if (child.exitCode !== null || child.signalCode !== null) return;
      const exited = new Promise((r) => child.once('exit', r));
      child.kill(signal);
      await exited;
    },
  };
}
