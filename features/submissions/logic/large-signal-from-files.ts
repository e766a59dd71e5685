import { excursionLimits } from '../../../shared/acoustics/large-signal';
import type { DisplayUnit } from '../../tools';
import type { DraftFile } from './draft';

/** The large-signal figures a reviewer gives, as the catalogue stores them. */
export const LARGE_FIELDS: { key: 'x_bl' | 'x_c' | 'x_l' | 'bl0' | 'kms0'; label: string; unit: DisplayUnit; hint: string }[] = [
  { key: 'x_bl', label: 'X at Bl 82 %', unit: 'mm', hint: 'one-way excursion where Bl falls to 82 % of rest' },
  { key: 'x_c', label: 'X at compliance 75 %', unit: 'mm', hint: 'where compliance falls to 75 %' },
  { key: 'x_l', label: 'X at Le ±10 %', unit: 'mm', hint: 'where inductance varies by 10 %' },
  { key: 'bl0', label: 'Bl at rest', unit: 'tesla', hint: '' },
  { key: 'kms0', label: 'Kms at rest', unit: 'nPerMm', hint: '' },
];
export type LargeKey = (typeof LARGE_FIELDS)[number]['key'];

export interface FileLimits {
  /** SI, under the parameter names the catalogue stores. */
  values: Partial<Record<LargeKey, number>>;
  /** The smallest of the limits found, m, and which curve set it. */
  xmax: { value: number; governedBy: 'Bl' | 'compliance' | 'Le' } | null;
  /** Why a file gave no limit (too narrow a range, no rest point). */
  notes: string[];
}

/**
 * The excursion limits the acoustics core finds in the reviewer's own Bl(x), Kms(x) and Le(x)
 * files, each read on its own x points, so typed large-signal values can be checked against them.
 */
export function limitsFromFiles(files: readonly DraftFile[]): FileLimits {
  const out: FileLimits = { values: {}, xmax: null, notes: [] };
  const take = (kind: DraftFile['kind']) => files.find((f) => f.kind === kind && f.status === 'read' && f.points);
  const consider = (value: number, governedBy: NonNullable<FileLimits['xmax']>['governedBy']) => {
    if (!out.xmax || value < out.xmax.value) out.xmax = { value, governedBy };
  };
  const run = (file: DraftFile | undefined, key: 'bl' | 'kms' | 'le', apply: (r: ReturnType<typeof excursionLimits>) => void) => {
    if (!file?.points) return;
    try {
      apply(excursionLimits({ x: file.points.x, [key]: file.points.y }));
    } catch (err) {
      out.notes.push(`${file.name}: ${err instanceof Error ? err.message : 'no limit found'}`);
    }
  };
  run(take('bl_x'), 'bl', (r) => {
    if (!r.xBl) return;
    out.values.x_bl = r.xBl.limit;
    out.values.bl0 = r.xBl.reference;
    consider(r.xBl.limit, 'Bl');
  });
  run(take('kms_x'), 'kms', (r) => {
    if (!r.xC) return;
    out.values.x_c = r.xC.limit;
    // The reference is the compliance at rest; stiffness at rest is its inverse.
    out.values.kms0 = 1 / r.xC.reference;
    consider(r.xC.limit, 'compliance');
  });
  run(take('le_x'), 'le', (r) => {
    if (!r.xL) return;
    out.values.x_l = r.xL.limit;
    consider(r.xL.limit, 'Le');
  });
  return out;
}

/** Typed values more than `tolerance` away from what the files give, as messages for the form. */
export function disagreements(typed: FileLimits['values'], fromFiles: FileLimits['values'], tolerance = 0.1): string[] {
  const out: string[] = [];
  for (const { key, label } of LARGE_FIELDS) {
    const a = typed[key];
    const b = fromFiles[key];
    if (a === undefined || b === undefined || b === 0) continue;
    const off = a / b - 1;
    if (Math.abs(off) > tolerance) out.push(`${label} typed is ${off > 0 ? '+' : ''}${(off * 100).toFixed(0)} % from the value in your curve file`);
  }
  return out;
}
