// The side-by-side table: one row per figure, every driver's value, the best one marked and each
// other value's distance from it. "Better" follows common practice for a mid-range role (no
// source); rows where neither direction is better in general (Q, Vas, Re, Fb) mark no best.
import type { OverlayDriver } from '../../../shared/schemas/overlay';

export type Better = 'higher' | 'lower' | 'nearZero' | null;

export interface RowDef {
  key: string;
  label: string;
  unit: string;
  group: 'small' | 'large' | 'derived';
  better: Better;
  digits: number;
  /** SI value from the driver, before display scaling. */
  get: (d: OverlayDriver) => number | null;
  scale?: number;
}

export interface TableCell {
  value: number | null;
  text: string;
  best: boolean;
  /** Difference from the best value, in display units; null for the best itself or no best. */
  delta: number | null;
}

export interface TableRow {
  key: string;
  label: string;
  unit: string;
  group: RowDef['group'];
  better: Better;
  cells: TableCell[];
}

const param = (name: string) => (d: OverlayDriver) => d.parameters.find((p) => p.name === name)?.value ?? null;

const p = (key: string, label: string, unit: string, scale: number, digits: number, better: Better, group: 'small' | 'large' = 'small'): RowDef => ({
  key, label, unit, scale, digits, better, group, get: param(key),
});

export const rowDefs: RowDef[] = [
  p('fs', 'Fs', 'Hz', 1, 1, 'lower'),
  p('qts', 'Qts', '', 1, 2, null),
  p('qes', 'Qes', '', 1, 2, null),
  p('qms', 'Qms', '', 1, 2, null),
  p('vas', 'Vas', 'L', 1e3, 2, null),
  p('re', 'Re', 'Ω', 1, 2, null),
  p('le', 'Le', 'mH', 1e3, 3, 'lower'),
  p('bl', 'Bl', 'T·m', 1, 2, 'higher'),
  p('mms', 'Mms', 'g', 1e3, 2, 'lower'),
  p('sd', 'Sd', 'cm²', 1e4, 1, 'higher'),
  p('xmax', 'Xmax', 'mm', 1e3, 2, 'higher'),
  p('x_bl', 'X(Bl)', 'mm', 1e3, 2, 'higher', 'large'),
  p('x_c', 'X(C)', 'mm', 1e3, 2, 'higher', 'large'),
  p('x_l', 'X(L)', 'mm', 1e3, 2, 'higher', 'large'),
  p('xmax_ls', 'Xmax (large signal)', 'mm', 1e3, 2, 'higher', 'large'),
  p('bl_offset', 'Coil rest offset', 'mm', 1e3, 2, 'nearZero', 'large'),
  { key: 'sensitivity', label: 'Sensitivity in band', unit: 'dB', group: 'derived', better: 'higher', digits: 1, get: (d) => d.figures.sensitivityDb },
  { key: 'linearity', label: 'Linearity ±', unit: 'dB', group: 'derived', better: 'lower', digits: 1, get: (d) => (d.figures.linearity ? d.figures.linearity.spanDb / 2 : null) },
  { key: 'beamingMeasured', label: 'Beaming onset, measured', unit: 'Hz', group: 'derived', better: 'higher', digits: 0, get: (d) => d.figures.beaming.measuredHz },
  { key: 'beamingKa1', label: 'Beaming onset, ka = 1', unit: 'Hz', group: 'derived', better: 'higher', digits: 0, get: (d) => d.figures.beaming.ka1Hz },
  { key: 'vd', label: 'Vd', unit: 'cm³', group: 'derived', better: 'higher', digits: 1, get: (d) => d.figures.vdCm3 },
  { key: 'usableLow', label: 'Usable band, low edge', unit: 'Hz', group: 'derived', better: 'lower', digits: 0, get: (d) => d.figures.usableBand?.lowHz ?? null },
  { key: 'usableHigh', label: 'Usable band, high edge', unit: 'Hz', group: 'derived', better: 'higher', digits: 0, get: (d) => d.figures.usableBand?.highHz ?? null },
  { key: 'closedVb', label: 'Closed box Vb', unit: 'L', group: 'derived', better: 'lower', digits: 2, get: (d) => d.figures.closedBox?.vbL ?? null },
  { key: 'closedF3', label: 'Closed box F3', unit: 'Hz', group: 'derived', better: 'lower', digits: 0, get: (d) => d.figures.closedBox?.f3 ?? null },
  { key: 'ventedVb', label: 'Vented box Vb', unit: 'L', group: 'derived', better: 'lower', digits: 2, get: (d) => d.figures.ventedBox?.vbL ?? null },
  { key: 'ventedFb', label: 'Vented box Fb', unit: 'Hz', group: 'derived', better: null, digits: 0, get: (d) => d.figures.ventedBox?.fb ?? null },
  { key: 'ventedF3', label: 'Vented box F3', unit: 'Hz', group: 'derived', better: 'lower', digits: 0, get: (d) => d.figures.ventedBox?.f3 ?? null },
];

/** Index of the best value, or -1 with no direction, fewer than two values, or a tie for all. */
export function bestIndex(values: readonly (number | null)[], better: Better): number {
  const present = values.map((v, i) => ({ v, i })).filter((x): x is { v: number; i: number } => x.v != null && Number.isFinite(x.v));
  if (!better || present.length < 2) return -1;
  const score = (v: number) => (better === 'higher' ? v : better === 'lower' ? -v : -Math.abs(v));
  let best = present[0];
  for (const x of present) if (score(x.v) > score(best.v)) best = x;
  if (present.every((x) => score(x.v) === score(best.v))) return -1;
  return best.i;
}

export function buildRow(def: RowDef, drivers: readonly OverlayDriver[]): TableRow {
  const scale = def.scale ?? 1;
  const values = drivers.map((d) => {
    const v = def.get(d);
    return v == null ? null : v * scale;
  });
  // Compare the values as shown, so two cells that read the same are not told apart.
  const shown = values.map((v) => (v == null ? null : Number(v.toFixed(def.digits))));
  const b = bestIndex(shown, def.better);
  return {
    key: def.key, label: def.label, unit: def.unit, group: def.group, better: def.better,
    cells: shown.map((v, i) => ({
      value: v,
      text: v == null ? '—' : v.toFixed(def.digits),
      best: i === b,
      delta: b >= 0 && i !== b && v != null ? Number((v - (shown[b] as number)).toFixed(def.digits)) : null,
    })),
  };
}

/** Rows with at least one value; a row nobody measured says nothing. */
export function buildTable(drivers: readonly OverlayDriver[]): TableRow[] {
  return rowDefs.map((d) => buildRow(d, drivers)).filter((r) => r.cells.some((c) => c.value != null));
}

export function formatDelta(delta: number, digits: number): string {
  const s = Math.abs(delta).toFixed(digits);
  return `Δ ${delta > 0 ? '+' : '−'}${s}`;
}
