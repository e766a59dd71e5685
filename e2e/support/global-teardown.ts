export default async function globalTeardown(): Promise<void> {
  const child = globalThis.__conestackServer;
  if (child && child.exitCode === null) {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
  }
}
