/**
 * Frequency grids, log-frequency resampling, fractional-octave smoothing and IEC 61260-1 bands.
 *
 * IEC 61260-1:2014 (base-ten system): G = 10^(3/10), reference fr = 1000 Hz,
 *   mid-band fm = fr·G^(x/b) for odd b, fr·G^((2x+1)/(2b)) for even b,
 *   band edges f1,2 = fm·G^(∓1/(2b)).
 * Nominal labels for octave and one-third-octave bands follow the R10 preferred numbers of ISO 266.
 */
import { AcousticsInputError } from './errors';

export const DEFAULT_GRID = { pointsPerOctave: 48, fMin: 10, fMax: 40000 } as const;

export interface Curve {
  frequencies: number[];
  values: number[];
}

/** Log-spaced grid fMin·2^(k/N), k = 0, 1, … while ≤ fMax (1e-9 relative slack for rounding). */
export function logFrequencyGrid(
  pointsPerOctave: number = DEFAULT_GRID.pointsPerOctave,
  fMin: number = DEFAULT_GRID.fMin,
  fMax: number = DEFAULT_GRID.fMax,
): number[] {
  if (!(pointsPerOctave > 0) || !(fMin > 0) || !(fMax > fMin)) throw new AcousticsInputError('grid', 'need pointsPerOctave > 0 and 0 < fMin < fMax');
  const count = Math.floor(pointsPerOctave * Math.log2(fMax / fMin) + 1e-9);
  const out: number[] = [];
  for (let k = 0; k <= count; k++) out.push(fMin * Math.pow(2, k / pointsPerOctave));
  return out;
}

export function validateCurve(frequencies: readonly number[], values: readonly number[], field = 'values'): void {
  if (frequencies.length !== values.length) throw new AcousticsInputError(field, `${field} must have one value per frequency`);
  if (frequencies.length < 2) throw new AcousticsInputError('frequencies', 'at least 2 points are needed');
  for (let i = 0; i < frequencies.length; i++) {
    if (!(frequencies[i] > 0)) throw new AcousticsInputError('frequencies', 'frequencies must be positive');
    if (i > 0 && !(frequencies[i] > frequencies[i - 1])) throw new AcousticsInputError('frequencies', 'frequencies must be strictly increasing');
    if (!Number.isFinite(values[i])) throw new AcousticsInputError(field, `${field} must be finite numbers`);
  }
}

/** Value at f by linear interpolation in log frequency; null outside the measured span. */
export function interpolateLog(frequencies: readonly number[], values: readonly number[], f: number): number | null {
  const n = frequencies.length;
  if (!(f >= frequencies[0] && f <= frequencies[n - 1])) return null;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (frequencies[mid] <= f) lo = mid;
    else hi = mid;
  }
  if (f === frequencies[lo]) return values[lo];
  const t = Math.log(f / frequencies[lo]) / Math.log(frequencies[hi] / frequencies[lo]);
  return values[lo] + t * (values[hi] - values[lo]);
}

/**
 * Resamples measured points onto a grid. Grid points outside the measured span are dropped,
 * never extrapolated, so the result may be shorter than the grid.
 */
export function resampleLog(frequencies: readonly number[], values: readonly number[], grid: readonly number[] = logFrequencyGrid()): Curve {
  validateCurve(frequencies, values);
  const out: Curve = { frequencies: [], values: [] };
  for (const f of grid) {
    const v = interpolateLog(frequencies, values, f);
    if (v !== null) {
      out.frequencies.push(f);
      out.values.push(v);
    }
  }
  return out;
}

export type SmoothingMode = 'db' | 'power';

/**
 * 1/N-octave smoothing: at each frequency, the mean over the window f·2^(±1/(2N)) of the
 * piecewise-linear (in log f) curve, integrated exactly. Near the ends the window is cut at the
 * data, not padded. 'power' averages 10^(L/10) and returns dB; 'db' averages the values as given
 * (use it for impedance, phase or anything that is not a level).
 */
export function smoothFractionalOctave(
  frequencies: readonly number[],
  values: readonly number[],
  fraction: number,
  mode: SmoothingMode = 'db',
): number[] {
  validateCurve(frequencies, values);
  if (!(fraction > 0)) throw new AcousticsInputError('fraction', 'fraction must be positive (N in 1/N octave)');
  const u = frequencies.map((f) => Math.log2(f));
  const y = mode === 'power' ? values.map((v) => Math.pow(10, v / 10)) : [...values];
  const n = u.length;
  // Cumulative trapezoid integral in log2 f makes each window an O(log n) lookup.
  const cum = new Float64Array(n);
  for (let i = 1; i < n; i++) cum[i] = cum[i - 1] + ((y[i] + y[i - 1]) / 2) * (u[i] - u[i - 1]);
  const integralTo = (x: number): number => {
    if (x <= u[0]) return 0;
    if (x >= u[n - 1]) return cum[n - 1];
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (u[mid] <= x) lo = mid;
      else hi = mid;
    }
    const t = (x - u[lo]) / (u[hi] - u[lo]);
    const yx = y[lo] + t * (y[hi] - y[lo]);
    return cum[lo] + ((y[lo] + yx) / 2) * (x - u[lo]);
  };
  const half = 1 / (2 * fraction);
  return u.map((ui, i) => {
    const a = Math.max(u[0], ui - half);
    const b = Math.min(u[n - 1], ui + half);
    const mean = b > a ? (integralTo(b) - integralTo(a)) / (b - a) : y[i];
    return mode === 'power' ? 10 * Math.log10(mean) : mean;
  });
}

export const IEC61260_G = Math.pow(10, 3 / 10);
export const IEC61260_FR = 1000;

export interface FractionalOctaveBand {
  /** Band index x of IEC 61260-1 (0 is the band at or next above 1 kHz). */
  index: number;
  midband: number;
  lower: number;
  upper: number;
  /** Rounded label for b = 1 or 3 (ISO 266 R10 series), else the midband to 3 significant figures. */
  nominal: number;
}

const R10 = [1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8];

function nominalLabel(fm: number, b: number): number {
  if (b === 1 || b === 3) {
    const decade = Math.floor(Math.log10(fm) + 1e-9);
    const mant = fm / Math.pow(10, decade);
    let best = R10[0];
    for (const r of [...R10, 10]) if (Math.abs(Math.log(r / mant)) < Math.abs(Math.log(best / mant))) best = r;
    return Number((best * Math.pow(10, decade)).toPrecision(3));
  }
  return Number(fm.toPrecision(3));
}

export function bandMidband(index: number, bandsPerOctave: number): number {
  const b = bandsPerOctave;
  const exponent = b % 2 === 1 ? index / b : (2 * index + 1) / (2 * b);
  return IEC61260_FR * Math.pow(IEC61260_G, exponent);
}

export function fractionalOctaveBand(index: number, bandsPerOctave: number): FractionalOctaveBand {
  if (!Number.isInteger(bandsPerOctave) || bandsPerOctave < 1) throw new AcousticsInputError('bandsPerOctave', 'bandsPerOctave must be a positive integer');
  const fm = bandMidband(index, bandsPerOctave);
  const k = Math.pow(IEC61260_G, 1 / (2 * bandsPerOctave));
  return { index, midband: fm, lower: fm / k, upper: fm * k, nominal: nominalLabel(fm, bandsPerOctave) };
}

/** All 1/b-octave bands whose mid-band frequency lies in [fMin, fMax]. */
export function fractionalOctaveBands(bandsPerOctave: number, fMin = 20, fMax = 20000): FractionalOctaveBand[] {
  const b = bandsPerOctave;
  const toIndex = (f: number): number => {
    const e = Math.log(f / IEC61260_FR) / Math.log(IEC61260_G);
    return b % 2 === 1 ? e * b : (e * 2 * b - 1) / 2;
  };
  const out: FractionalOctaveBand[] = [];
  for (let x = Math.ceil(toIndex(fMin) - 1e-9); x <= Math.floor(toIndex(fMax) + 1e-9); x++) out.push(fractionalOctaveBand(x, b));
  return out;
}

/** Mean of a curve over [fLo, fHi] weighted evenly in log frequency (trapezoids on the interpolated curve). */
export function logFrequencyMean(frequencies: readonly number[], values: readonly number[], fLo: number, fHi: number): number {
  validateCurve(frequencies, values);
  const lo = Math.max(fLo, frequencies[0]);
  const hi = Math.min(fHi, frequencies[frequencies.length - 1]);
  if (!(hi > lo)) throw new AcousticsInputError('band', 'the band does not overlap the measured span');
  const xs = [lo, ...frequencies.filter((f) => f > lo && f < hi), hi];
  const ys = xs.map((f) => interpolateLog(frequencies, values, f) as number);
  let acc = 0;
  for (let i = 1; i < xs.length; i++) acc += ((ys[i] + ys[i - 1]) / 2) * Math.log(xs[i] / xs[i - 1]);
  return acc / Math.log(hi / lo);
}
