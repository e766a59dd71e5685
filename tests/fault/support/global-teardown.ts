import { cpus } from 'node:os';
import { shutdownFaultDb } from './fault-db';
import { readFigures, writeFigures } from './figures';

export default async function globalTeardown(): Promise<void> {
  shutdownFaultDb();
  const figures = readFigures();
  if (figures.length) {
    process.stdout.write(`\n[fault] figures of this run:\n${figures.map((f) => `  ${f.what}: ${f.value}`).join('\n')}\n`);
    writeFigures(figures, new Date(), cpus().length, process.env.FAULT_FIGURES_TO_README === '1');
  }
}
