// The normalised curves as CSV on the shared grid: one row per frequency, one column per driver
// per curve, empty cells where a curve was not measured.
import type { StackCurves } from './curves';

export interface CsvDriver {
  /** A column prefix that stays unique and readable: the slug. */
  slug: string;
}

function cell(v: number | null | undefined, digits = 3): string {
  return v == null || !Number.isFinite(v) ? '' : String(Number(v.toFixed(digits)));
}

export function buildCsv(grid: readonly number[], curves: readonly StackCurves[], thdUnit: 'percent' | 'db'): string {
  const cols: { name: string; y: readonly (number | null)[] }[] = [];
  const unit = thdUnit === 'db' ? 'db' : 'percent';
  for (const c of curves) {
    cols.push({ name: `${c.slug}_spl_db`, y: c.spl });
    for (const o of c.offAxis) cols.push({ name: `${c.slug}_spl_${o.angleDeg}deg_db`, y: o.y });
    if (c.thd) {
      cols.push({ name: `${c.slug}_thd_${c.thd.driveLevelV}v_${unit}`, y: c.thd.thd });
      if (c.thd.h2) cols.push({ name: `${c.slug}_h2_${c.thd.driveLevelV}v_${unit}`, y: c.thd.h2 });
      if (c.thd.h3) cols.push({ name: `${c.slug}_h3_${c.thd.driveLevelV}v_${unit}`, y: c.thd.h3 });
    }
    if (c.impedance) cols.push({ name: `${c.slug}_impedance_ohm`, y: c.impedance });
  }
  const lines = [['frequency_hz', ...cols.map((c) => c.name)].join(',')];
  for (let i = 0; i < grid.length; i++) lines.push([cell(grid[i], 2), ...cols.map((c) => cell(c.y[i]))].join(','));
  return `${lines.join('\n')}\n`;
}
