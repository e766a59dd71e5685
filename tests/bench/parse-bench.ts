// Parsing a 100,000-line measurement file against a bare split-and-parseFloat loop over the same
// bytes, in the same run. Prints figures; asserts nothing.
import { performance } from 'node:perf_hooks';
import { parseMeasurementFile } from '../../shared/uploads';

const lines = ['* invented sweep, 100,000 points', 'Freq(Hz)\tSPL(dB)\tPhase(deg)'];
for (let i = 0; i < 100_000; i++) lines.push(`${(20 * 2 ** (i / 10_000)).toFixed(4)}\t${(85 + Math.sin(i / 500)).toFixed(3)}\t${((i % 360) - 180).toFixed(1)}`);
const bytes = new TextEncoder().encode(lines.join('\r\n'));

function bare(): number {
  const text = new TextDecoder().decode(bytes);
  let n = 0;
  for (const line of text.split('\n')) {
    const parts = line.split('\t');
    const f = parseFloat(parts[0]);
    if (!Number.isNaN(f)) n += parseFloat(parts[1]) > 0 ? 1 : 0;
  }
  return n;
}

function time(fn: () => unknown, runs = 8): number[] {
  fn();
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    fn();
    out.push(performance.now() - t);
  }
  return out.sort((a, b) => a - b);
}

const parsed = time(() => parseMeasurementFile({ name: 'bench.txt', bytes, kind: 'spl' }));
const baseline = time(bare);
const median = (xs: number[]) => xs[Math.floor(xs.length / 2)];
console.log(`parse benchmark: ${lines.length} lines, ${(bytes.length / 1e6).toFixed(1)} MB`);
console.log(`parseMeasurementFile   median ${median(parsed).toFixed(1)} ms   best ${parsed[0].toFixed(1)} ms`);
console.log(`bare split+parseFloat  median ${median(baseline).toFixed(1)} ms   best ${baseline[0].toFixed(1)} ms`);
console.log(`ratio ${(median(parsed) / median(baseline)).toFixed(2)}x the bare loop (the parser also validates, detects format and keeps line numbers)`);
