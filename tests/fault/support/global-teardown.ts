import { cpus } from 'node:os';
import { shutdownFaultDb } from './fault-db';
import { readFigures, writeFiguresToReadme } from './figures';

export default async function globalTeardown(): Promise<void> {
  shutdownFaultDb();
  const figures = readFigures();
  if (figures.length) {
    process.stdout.write(`\n[fault] figures of this run:\n${figures.map((f) => `  ${f.what}: ${f.value}`).join('\n')}\n`);
    writeFiguresToReadme(figures, new Date(), cpus().length);
  }
}
