// Figures the fault suite measures: printed as they come and gathered into
// artifacts/fault-figures.md at the end of the run. README.md's "Fault figures" section is
// refreshed from them only on request (FAULT_FIGURES_TO_README=1), so a test run never edits a
// tracked file.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { root } from './fault-db';

const file = join(root, 'artifacts', 'fault-figures.json');

export interface Figure {
  what: string;
  value: string;
}

/** Starts a run: no figures yet, and an empty server log (artifacts/fault-server.log). */
export function resetFigures(): void {
  mkdirSync(join(root, 'artifacts'), { recursive: true });
  writeFileSync(file, '[]');
  writeFileSync(join(root, 'artifacts', 'fault-server.log'), '');
}

export function readFigures(): Figure[] {
  return existsSync(file) ? (JSON.parse(readFileSync(file, 'utf8')) as Figure[]) : [];
}

/** Prints the figure at once and keeps it for the README. */
export function recordFigure(what: string, value: string): void {
  process.stdout.write(`[fault] ${what}: ${value}\n`);
  const all = readFigures().filter((f) => f.what !== what);
  writeFileSync(file, JSON.stringify([...all, { what, value }], null, 2));
}

export const START = '<!-- fault-figures:start -->';
export const END = '<!-- fault-figures:end -->';

/** Writes this run's table to artifacts/, and into the README's marked block when asked to. */
export function writeFigures(figures: Figure[], when: Date, cores: number, intoReadme: boolean): void {
  if (figures.length === 0) return;
  const table = [
    `Last run: ${when.toISOString().slice(0, 16).replace('T', ' ')} UTC, ${cores} CPU cores, server and MariaDB on the same machine.`,
    '',
    '| Figure | Value |',
    '| --- | --- |',
    ...figures.map((f) => `| ${f.what} | ${f.value} |`),
  ].join('\n');
  writeFileSync(join(root, 'artifacts', 'fault-figures.md'), `${table}\n`);
  if (!intoReadme) return;
  const readme = join(root, 'README.md');
  const text = readFileSync(readme, 'utf8');
  const from = text.indexOf(START);
  const to = text.indexOf(END);
  if (from < 0 || to < from) return;
  writeFileSync(readme, `${text.slice(0, from + START.length)}\n${table}\n${text.slice(to)}`);
}
