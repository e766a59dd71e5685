// Figures the fault suite measures: printed as they come and gathered into README.md's
// "Fault figures" section at the end of the run.
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

/** Replaces the README's marked block with a table of this run's figures. */
export function writeFiguresToReadme(figures: Figure[], when: Date, cores: number): void {
  const readme = join(root, 'README.md');
  const text = readFileSync(readme, 'utf8');
  const from = text.indexOf(START);
  const to = text.indexOf(END);
  if (from < 0 || to < from || figures.length === 0) return;
  const table = [
    `Last run: ${when.toISOString().slice(0, 16).replace('T', ' ')} UTC, ${cores} CPU cores, server and MariaDB on the same machine.`,
    '',
    '| Figure | Value |',
    '| --- | --- |',
    ...figures.map((f) => `| ${f.what} | ${f.value} |`),
  ].join('\n');
  writeFileSync(readme, `${text.slice(0, from + START.length)}\n${table}\n${text.slice(to)}`);
}
