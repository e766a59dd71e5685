/**
 * Electrical input impedance of a moving-coil driver: lumped model, classic parameter
 * extraction and least-squares fit.
 *
 * Model (Small, "Direct-radiator loudspeaker system analysis", JAES 1972; Beranek & Mellow ch. 3):
 *   Z(jω) = Re + jωLe [+ (jωL2·R2)/(R2 + jωL2)] + Zmot,
 *   Zmot = 1/(1/Res + 1/(jωLces) + jωCmes), Res = Re·Qms/Qes, Cmes = Qes/(ωs·Re), Lces = 1/(ωs²·Cmes).
 * The optional L2‖R2 branch is the usual lumped stand-in for eddy-current losses in the pole piece.
 *
 * Classic extraction: Small, "Simplified loudspeaker measurements at low frequencies" (JAES 1972):
 *   r0 = Zmax/Re, f1·f2 at |Z| = √(Re·Zmax), Qms = fs·√r0/(f2 − f1), Qes = Qms/(r0 − 1).
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { cabs, cadd, carg, cdiv, cinv, cx, type Complex } from './complex';
import { airProperties } from './constants';
import { AcousticsInputError } from './errors';

export interface ImpedanceModelParams {
  /** DC resistance, Ω. */
  re: number;
  /** Resonance, Hz. */
  fs: number;
  qms: number;
  qes: number;
  /** Lossless voice-coil inductance, H (0 or omitted: none). */
  le?: number;
  /** Lossy second inductance, H, in parallel with r2. */
  l2?: number;
  /** Loss resistance of the second inductance, Ω. */
  r2?: number;
}

export interface MotionalElements {
  /** Ω */
  res: number;
  /** H */
  lces: number;
  /** F */
  cmes: number;
}

export interface ImpedanceCurve {
  frequencies: number[];
  magnitude: number[];
  /** Degrees, positive when inductive. */
  phaseDeg: number[];
  re: number[];
  im: number[];
}

const TWO_PI = 2 * Math.PI;
const RAD = 180 / Math.PI;

export function motionalElements(p: Pick<ImpedanceModelParams, 're' | 'fs' | 'qms' | 'qes'>): MotionalElements {
  const ws = TWO_PI * p.fs;
  const cmes = p.qes / (ws * p.re);
  return { res: (p.re * p.qms) / p.qes, lces: 1 / (ws * ws * cmes), cmes };
}

export function impedanceAt(p: ImpedanceModelParams, frequency: number): Complex {
  const w = TWO_PI * frequency;
  const { res, lces, cmes } = motionalElements(p);
  const ymot = cadd(cadd(cx(1 / res), cinv(cx(0, w * lces))), cx(0, w * cmes));
  let z = cadd(cx(p.re, w * (p.le ?? 0)), cinv(ymot));
  if (p.l2 && p.l2 > 0 && p.r2 && p.r2 > 0) {
    z = cadd(z, cdiv(cx(0, w * p.l2 * p.r2), cx(p.r2, w * p.l2)));
  }
  return z;
}

export function impedanceCurve(p: ImpedanceModelParams, frequencies: readonly number[]): ImpedanceCurve {
  const out: ImpedanceCurve = { frequencies: [...frequencies], magnitude: [], phaseDeg: [], re: [], im: [] };
  for (const f of frequencies) {
    const z = impedanceAt(p, f);
    out.magnitude.push(cabs(z));
    out.phaseDeg.push(carg(z) * RAD);
    out.re.push(z.re);
    out.im.push(z.im);
  }
  return out;
}

export interface ClassicParameters {
  re: number;
  /** True when Re was not given and was taken as the curve minimum. */
  reEstimated: boolean;
  /** True when one of f1, f2 was not reached and was mirrored from the other about fs. */
  mirrored: boolean;
  /** Frequency of Zmax (refined by a parabola in log frequency), Hz. */
  fs: number;
  /** √(f1·f2), which Small uses as a check on fs, Hz. */
  fsGeometric: number;
  zmax: number;
  r0: number;
  f1: number;
  f2: number;
  qms: number;
  qes: number;
  qts: number;
  res: number;
}

function validateSweep(frequencies: readonly number[], magnitude: readonly number[]): void {
  if (frequencies.length !== magnitude.length) throw new AcousticsInputError('magnitude', 'magnitude must have one value per frequency');
  if (frequencies.length < 5) throw new AcousticsInputError('frequencies', 'at least 5 points are needed');
  for (let i = 0; i < frequencies.length; i++) {
    if (!(frequencies[i] > 0)) throw new AcousticsInputError('frequencies', 'frequencies must be positive');
    if (i > 0 && !(frequencies[i] > frequencies[i - 1])) throw new AcousticsInputError('frequencies', 'frequencies must be strictly increasing');
    if (!(magnitude[i] > 0)) throw new AcousticsInputError('magnitude', 'magnitudes must be positive');
  }
}

/** Log-frequency crossing between two samples, as a frequency. */
function crossing(f0: number, y0: number, f1: number, y1: number, level: number): number {
  const t = (level - y0) / (y1 - y0);
  return Math.exp(Math.log(f0) + t * (Math.log(f1) - Math.log(f0)));
}

export function classicParameters(
  frequencies: readonly number[],
  magnitude: readonly number[],
  options: { re?: number } = {},
): ClassicParameters {
  validateSweep(frequencies, magnitude);
  const n = frequencies.length;
  // The resonance is the largest interior local maximum: the inductive rise makes the last point large.
  let ipk = -1;
  for (let i = 1; i < n - 1; i++) {
    if (magnitude[i] >= magnitude[i - 1] && magnitude[i] >= magnitude[i + 1] && (ipk < 0 || magnitude[i] > magnitude[ipk])) ipk = i;
  }
  if (ipk < 0) throw new AcousticsInputError('magnitude', 'no impedance peak inside the sweep; the sweep must span the resonance');
  const re = options.re ?? Math.min(...magnitude);
  const reEstimated = options.re === undefined;
  // Parabolic refinement in (log f, |Z|) so coarse sweeps still give a usable fs.
  const x0 = Math.log(frequencies[ipk - 1]);
  const x1 = Math.log(frequencies[ipk]);
  const x2 = Math.log(frequencies[ipk + 1]);
  const y0 = magnitude[ipk - 1];
  const y1 = magnitude[ipk];
  const y2 = magnitude[ipk + 1];
  const denom = (x0 - x1) * (x0 - x2) * (x1 - x2);
  let fsPeak = frequencies[ipk];
  let zmax = y1;
  if (denom !== 0) {
    const A = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / denom;
    const B = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / denom;
    const C = (x1 * x2 * (x1 - x2) * y0 + x2 * x0 * (x2 - x0) * y1 + x0 * x1 * (x0 - x1) * y2) / denom;
    if (A < 0) {
      const xv = -B / (2 * A);
      if (xv > x0 && xv < x2) {
        fsPeak = Math.exp(xv);
        zmax = Math.max(y1, C - (B * B) / (4 * A));
      }
    }
  }
  if (!(zmax > re)) throw new AcousticsInputError('re', 're must be below the impedance peak');
  const level = Math.sqrt(re * zmax);
  let f1 = NaN;
  for (let i = ipk; i > 0; i--) {
    if (magnitude[i - 1] <= level && magnitude[i] >= level) {
      f1 = crossing(frequencies[i - 1], magnitude[i - 1], frequencies[i], magnitude[i], level);
      break;
    }
  }
  let f2 = NaN;
  for (let i = ipk; i < n - 1; i++) {
    if (magnitude[i] >= level && magnitude[i + 1] <= level) {
      f2 = crossing(frequencies[i], magnitude[i], frequencies[i + 1], magnitude[i + 1], level);
      break;
    }
  }
  // A strong inductive rise can keep |Z| above √(Re·Zmax) past the peak (or the sweep may stop
  // short); the motional peak is geometrically symmetric, so the missing side is mirrored.
  let mirrored = false;
  if (!Number.isFinite(f1) && Number.isFinite(f2)) {
    f1 = (fsPeak * fsPeak) / f2;
    mirrored = true;
  } else if (!Number.isFinite(f2) && Number.isFinite(f1)) {
    f2 = (fsPeak * fsPeak) / f1;
    mirrored = true;
  }
  if (!Number.isFinite(f1) || !Number.isFinite(f2)) {
    throw new AcousticsInputError('frequencies', 'the sweep does not reach √(Re·Zmax) on either side of the peak');
  }
  const r0 = zmax / re;
  const fs = fsPeak;
  const qms = (fs * Math.sqrt(r0)) / (f2 - f1);
  const qes = qms / (r0 - 1);
  return { re, reEstimated, mirrored, fs, fsGeometric: Math.sqrt(f1 * f2), zmax, r0, f1, f2, qms, qes, qts: (qms * qes) / (qms + qes), res: zmax - re };
}

export interface VasResult {
  mms: number;
  cms: number;
  vas: number;
}

/**
 * Added-mass method (Small, JAES 1972, "Simplified loudspeaker measurements"):
 * Mms = M / ((fs/fs')² − 1), Cms = 1/((2π·fs)²·Mms), Vas = ρc²·Sd²·Cms.
 */
export function vasByAddedMass(input: { fs: number; fsAdded: number; addedMass: number; sd: number; temperatureC?: number }): VasResult {
  const { fs, fsAdded, addedMass, sd } = input;
  if (!(fsAdded < fs)) throw new AcousticsInputError('fsAdded', 'the resonance with added mass must be below fs');
  const air = airProperties(input.temperatureC);
  const mms = addedMass / ((fs / fsAdded) ** 2 - 1);
  const cms = 1 / ((TWO_PI * fs) ** 2 * mms);
  return { mms, cms, vas: air.rho * air.c ** 2 * sd ** 2 * cms };
}

/**
 * Known-volume (closed test box) method (Small, JAES 1972):
 * Vas = Vb·(fc·Qec/(fs·Qes) − 1); without Qec the simpler Vas = Vb·((fc/fs)² − 1).
 */
export function vasByKnownVolume(input: { fs: number; fc: number; vb: number; qes?: number; qec?: number }): number {
  const { fs, fc, vb, qes, qec } = input;
  if (!(fc > fs)) throw new AcousticsInputError('fc', 'the resonance in the test box must be above fs');
  if (qes !== undefined && qec !== undefined) return vb * ((fc * qec) / (fs * qes) - 1);
  return vb * ((fc / fs) ** 2 - 1);
}

export type ImpedanceFitModel = 'le' | 'le-l2';

export interface ImpedanceFitOptions {
  model?: ImpedanceFitModel;
  /** Measured DC resistance; when given with fixRe it is held, otherwise it seeds the fit. */
  re?: number;
  fixRe?: boolean;
  maxIterations?: number;
}

export interface ImpedanceFitResidual {
  /** RMS of 20·log10(|Zfit|/|Zmeas|), dB. */
  rmsMagnitudeDb: number;
  /** RMS phase error, degrees (null when no phase was given). */
  rmsPhaseDeg: number | null;
  /** Per-point magnitude error, dB, fitted minus measured. */
  magnitudeDb: number[];
  /** Per-point phase error, degrees, fitted minus measured (null when no phase was given). */
  phaseDeg: number[] | null;
}

export interface ImpedanceFitResult {
  params: ImpedanceModelParams;
  initial: ImpedanceModelParams;
  classic: ClassicParameters;
  fitted: ImpedanceCurve;
  residual: ImpedanceFitResidual;
  iterations: number;
}

type ParamName = 're' | 'fs' | 'qms' | 'qes' | 'le' | 'l2' | 'r2';

/**
 * Least-squares fit of the lumped model to a measured sweep. Residuals are taken on ln Z
 * (ln|Z| and phase in radians), so a 1 % magnitude error weighs as much as a 0.01 rad phase
 * error and the peak does not dominate the troughs. Parameters are fitted as logarithms to keep
 * them positive.
 */
export function fitImpedance(
  frequencies: readonly number[],
  magnitude: readonly number[],
  phaseDeg?: readonly number[] | null,
  options: ImpedanceFitOptions = {},
): ImpedanceFitResult {
  validateSweep(frequencies, magnitude);
  const hasPhase = phaseDeg !== undefined && phaseDeg !== null;
  if (hasPhase && phaseDeg.length !== frequencies.length) throw new AcousticsInputError('phase', 'phase must have one value per frequency');
  const model = options.model ?? 'le';
  const classic = classicParameters(frequencies, magnitude, { re: options.re });
  const n = frequencies.length;
  const fHi = frequencies[n - 1];
  const wHi = TWO_PI * fHi;
  const base: ImpedanceModelParams = { re: classic.re, fs: classic.fs, qms: classic.qms, qes: classic.qes };
  // Motional part alone at the top of the sweep, so the remainder is the inductive rise.
  const zHi = impedanceAt(base, fHi);
  const motHi = { re: zHi.re - classic.re, im: zHi.im };
  let imHi: number;
  if (hasPhase) {
    imHi = magnitude[n - 1] * Math.sin(phaseDeg[n - 1] / RAD) - motHi.im;
  } else {
    imHi = Math.sqrt(Math.max(magnitude[n - 1] ** 2 - (classic.re + motHi.re) ** 2, 0));
  }
  const leSeed = Math.max(imHi / wHi, 1e-7);

  const targets: number[] = [];
  for (let i = 0; i < n; i++) targets.push(Math.log(magnitude[i]));
  if (hasPhase) for (let i = 0; i < n; i++) targets.push(phaseDeg[i] / RAD);
  const xs = targets.map((_, i) => i);

  const fixRe = options.fixRe === true && options.re !== undefined;
  const run = (names: ParamName[], seed: ImpedanceModelParams): { p: ImpedanceModelParams; iterations: number; error: number } => {
    const fixed: ImpedanceModelParams = { ...seed };
    const toParams = (v: number[]): ImpedanceModelParams => {
      const p: ImpedanceModelParams = { ...fixed };
      names.forEach((k, j) => {
        p[k] = Math.exp(v[j]);
      });
      return p;
    };
    const evaluate = (v: number[]): ((x: number) => number) => {
      const p = toParams(v);
      const vals = new Float64Array(targets.length);
      for (let i = 0; i < n; i++) {
        const z = impedanceAt(p, frequencies[i]);
        vals[i] = Math.log(cabs(z));
        if (hasPhase) vals[n + i] = carg(z);
      }
      return (x: number) => vals[x];
    };
    const initialValues = names.map((k) => Math.log(seed[k] as number));
    // The library keeps the best point but never rejects a bad step, so it is run in short chunks,
    // each restarted from the best point so far, with heavier damping after a chunk that did not
    // improve; a chunk that improves by less than 1e-12 relative ends the fit early.
    const maxIterations = options.maxIterations ?? 300;
    const chunk = 10;
    let current = initialValues;
    let error = Infinity;
    let damping = 1e-2;
    let stalls = 0;
    let used = 0;
    while (used < maxIterations) {
      const result = levenbergMarquardt({ x: xs, y: targets }, evaluate, {
        initialValues: current,
        damping,
        gradientDifference: 1e-6,
        centralDifference: true,
        maxIterations: Math.min(chunk, maxIterations - used),
        errorTolerance: 1e-15,
        // ±~20 natural-log units keeps a diverging step from overflowing exp().
        minValues: initialValues.map((v) => v - 20),
        maxValues: initialValues.map((v) => v + 20),
      });
      used += Math.max(result.iterations, 1);
      const improved = result.parameterError < error * (1 - 1e-12);
      if (improved) {
        const gain = (error - result.parameterError) / result.parameterError;
        current = result.parameterValues;
        error = result.parameterError;
        damping = 1e-2;
        stalls = 0;
        if (error < 1e-20 * targets.length || gain < 1e-9) break;
      } else {
        damping *= 100;
        if (++stalls >= 3) break;
      }
    }
    const result = { parameterValues: current, iterations: used, parameterError: error };
    return { p: toParams(result.parameterValues), iterations: result.iterations, error: result.parameterError };
  };

  const first = run(fixRe ? ['fs', 'qms', 'qes', 'le'] : ['re', 'fs', 'qms', 'qes', 'le'], { ...base, le: leSeed });
  let best = first.p;
  let iterations = first.iterations;
  const initial: ImpedanceModelParams = { ...base, le: leSeed };
  if (model === 'le-l2') {
    // The lossy branch has local minima; start from a few splits of the inductance and corner
    // frequencies around the top of the sweep, from the classic estimate (the simple fit is biased
    // by the missing branch), and keep the best.
    const names: ParamName[] = fixRe ? ['fs', 'qms', 'qes', 'le', 'l2', 'r2'] : ['re', 'fs', 'qms', 'qes', 'le', 'l2', 'r2'];
    let bestError = Infinity;
    for (const split of [0.5, 0.2]) {
      for (const corner of [0.25, 0.05, 1]) {
        const l2 = 2 * leSeed * (1 - split);
        const attempt = run(names, { ...base, le: leSeed * split, l2, r2: wHi * corner * l2 });
        iterations += attempt.iterations;
        if (attempt.error < bestError) {
          bestError = attempt.error;
          best = attempt.p;
        }
      }
      if (bestError < 1e-10 * targets.length) break;
    }
  }

  const fitted = impedanceCurve(best, frequencies);
  const magDb = fitted.magnitude.map((m, i) => 20 * Math.log10(m / magnitude[i]));
  const phErr = hasPhase ? fitted.phaseDeg.map((p, i) => p - phaseDeg[i]) : null;
  const rms = (a: number[]): number => Math.sqrt(a.reduce((s, x) => s + x * x, 0) / a.length);
  return {
    params: best,
    initial,
    classic,
    fitted,
    residual: { rmsMagnitudeDb: rms(magDb), rmsPhaseDeg: phErr ? rms(phErr) : null, magnitudeDb: magDb, phaseDeg: phErr },
    iterations,
  };
}
