// Pure transforms of the overlay curves: smoothing over gaps, level alignment, THD units and the
// cursor readout. Everything works on the response's shared grid, one y array per curve.
import { smoothFractionalOctave } from '../../../shared/acoustics/curves';
// The pure chart maths directly, not the charts index: that pulls in Skia and React Native, which
// these node-run tests must not load.
import { nearestIndex } from '../../charts/chart-math';
import type { OverlayDriver, OverlayOptions } from '../../../shared/schemas/overlay';
import { bandOf, DEFAULT_ALIGN_HZ, smoothingFraction, type ThdUnit } from './stack-options';

export type Nullable = readonly (number | null)[];

/** Maximal runs [start, end) of non-null values. */
export function nonNullRuns(y: Nullable): [number, number][] {
  const runs: [number, number][] = [];
  let start = -1;
  for (let i = 0; i <= y.length; i++) {
    const ok = i < y.length && y[i] != null && Number.isFinite(y[i] as number);
    if (ok && start < 0) start = i;
    if (!ok && start >= 0) {
      runs.push([start, i]);
      start = -1;
    }
  }
  return runs;
}

/**
 * Fractional-octave smoothing of each measured run on its own, so a gap is never bridged and the
 * unmeasured points stay null. A run of one point is kept as it is.
 */
export function smoothNullable(grid: readonly number[], y: Nullable, fraction: number | null, mode: 'db' | 'power' = 'power'): (number | null)[] {
  if (!fraction) return [...y];
  const out: (number | null)[] = y.map(() => null);
  for (const [a, b] of nonNullRuns(y)) {
    if (b - a < 2) {
      out[a] = y[a];
      continue;
    }
    const sm = smoothFractionalOctave(grid.slice(a, b), y.slice(a, b) as number[], fraction, mode);
    for (let i = a; i < b; i++) out[i] = sm[i - a];
  }
  return out;
}

/** The value at the grid point nearest f, or null when that point was not measured. */
export function valueAt(grid: readonly number[], y: Nullable, f: number): number | null {
  const i = nearestIndex(grid, f);
  return i < 0 ? null : (y[i] ?? null);
}

/** Mean of the measured points inside [lo, hi]; the grid is log-spaced, so this is a log-frequency mean. */
export function bandMean(grid: readonly number[], y: Nullable, lo: number, hi: number): number | null {
  let sum = 0;
  let n = 0;
  for (let i = 0; i < grid.length; i++) {
    const v = y[i];
    if (grid[i] >= lo && grid[i] <= hi && v != null && Number.isFinite(v)) {
      sum += v;
      n++;
    }
  }
  return n ? sum / n : null;
}

export const shift = (y: Nullable, dB: number): (number | null)[] => y.map((v) => (v == null ? null : v + dB));

/**
 * The dB offset per curve that brings each curve's reference level to the first curve's.
 * A curve with no reference level (not measured there) is left unshifted.
 */
export function alignmentOffsets(grid: readonly number[], onAxis: readonly Nullable[], o: Pick<OverlayOptions, 'level' | 'alignHz' | 'bandLo' | 'bandHi'>): number[] {
  if (o.level === 'raw' || onAxis.length === 0) return onAxis.map(() => 0);
  const band = bandOf(o as OverlayOptions);
  const ref = (y: Nullable) => (o.level === 'frequency' ? valueAt(grid, y, o.alignHz ?? DEFAULT_ALIGN_HZ) : bandMean(grid, y, band.lo, band.hi));
  const levels = onAxis.map(ref);
  const target = levels[0];
  return levels.map((l) => (l == null || target == null ? 0 : target - l));
}

/** Percent to dB relative to the fundamental: 20·log10(%/100) (definition of the ratio in dB). */
export function percentToDb(p: number | null): number | null {
  return p == null || !(p > 0) ? null : 20 * Math.log10(p / 100);
}

export const thdInUnit = (y: Nullable, unit: ThdUnit): (number | null)[] => (unit === 'db' ? y.map(percentToDb) : [...y]);

/** Every drive level measured by any driver, ascending. */
export function thdLevels(drivers: readonly Pick<OverlayDriver, 'thd'>[]): number[] {
  const all = new Set<number>();
  for (const d of drivers) for (const t of d.thd) all.add(t.driveLevelV);
  return [...all].sort((a, b) => a - b);
}

/** The driver's measurement nearest the chosen drive level (log distance), or its highest level. */
export function thdAtLevel<T extends { driveLevelV: number }>(thd: readonly T[], levelV: number | undefined): T | null {
  if (thd.length === 0) return null;
  if (levelV == null) return thd.reduce((a, b) => (b.driveLevelV > a.driveLevelV ? b : a));
  return thd.reduce((a, b) => (Math.abs(Math.log(b.driveLevelV / levelV)) < Math.abs(Math.log(a.driveLevelV / levelV)) ? b : a));
}

export interface StackCurves {
  slug: string;
  /** Smoothed and aligned on-axis level. */
  spl: (number | null)[];
  offAxis: { angleDeg: number; y: (number | null)[] }[];
  offsetDb: number;
  thd: { driveLevelV: number; thd: (number | null)[]; h2: (number | null)[] | null; h3: (number | null)[] | null } | null;
  impedance: (number | null)[] | null;
}

/** Smoothing first, then alignment, so the alignment is read off the curve that is drawn. */
export function normaliseDrivers(grid: readonly number[], drivers: readonly OverlayDriver[], o: OverlayOptions): StackCurves[] {
  const fraction = smoothingFraction(o.smoothing);
  const smoothed = drivers.map((d) => {
    const sorted = [...d.spl].sort((a, b) => Math.abs(a.angleDeg) - Math.abs(b.angleDeg));
    const on = sorted.find((c) => c.angleDeg === 0) ?? sorted[0];
    return {
      on: on ? smoothNullable(grid, on.y, fraction) : grid.map(() => null),
      off: sorted.filter((c) => c !== on).map((c) => ({ angleDeg: c.angleDeg, y: smoothNullable(grid, c.y, fraction) })),
    };
  });
  const offsets = alignmentOffsets(grid, smoothed.map((s) => s.on), o);
  return drivers.map((d, i) => {
    const t = thdAtLevel(d.thd, o.thdLevelV);
    return {
      slug: d.slug,
      spl: shift(smoothed[i].on, offsets[i]),
      offAxis: smoothed[i].off.map((c) => ({ angleDeg: c.angleDeg, y: shift(c.y, offsets[i]) })),
      offsetDb: offsets[i],
      thd: t
        ? { driveLevelV: t.driveLevelV, thd: thdInUnit(t.thd, o.thdUnit), h2: t.h2 ? thdInUnit(t.h2, o.thdUnit) : null, h3: t.h3 ? thdInUnit(t.h3, o.thdUnit) : null }
        : null,
      impedance: d.impedance ? [...d.impedance.magnitude] : null,
    };
  });
}

export interface ReadoutRow {
  slug: string;
  spl: number | null;
  thd: number | null;
  impedance: number | null;
}

/** What the cursor readout lists: every driver's value on every chart at the grid point nearest f. */
export function readoutAt(grid: readonly number[], curves: readonly StackCurves[], f: number): { frequency: number; rows: ReadoutRow[] } {
  const i = nearestIndex(grid, f);
  const at = (y: Nullable | null | undefined) => (y && i >= 0 ? (y[i] ?? null) : null);
  return {
    frequency: i >= 0 ? grid[i] : f,
    rows: curves.map((c) => ({ slug: c.slug, spl: at(c.spl), thd: at(c.thd?.thd), impedance: at(c.impedance) })),
  };
}

/** "1.00 kHz", "312 Hz": three significant figures, as the readout shows them. */
export function formatCursorHz(f: number): string {
  return f >= 1000 ? `${(f / 1000).toFixed(f >= 10000 ? 1 : 2)} kHz` : `${f >= 100 ? f.toFixed(0) : f.toFixed(1)} Hz`;
}
