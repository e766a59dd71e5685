/**
 * Low-frequency box responses.
 *
 * Closed box: Small, "Closed-box loudspeaker systems, Part I: Analysis" (JAES 1972):
 *   α = Vas/Vb, fc = fs·√(1+α), Qtc = Qts·√(1+α),
 *   G(s) = s²Tc²/(s²Tc² + s·Tc/Qtc + 1),
 *   (f3/fc)² = [(1/Qtc² − 2) + √((1/Qtc² − 2)² + 4)]/2,
 *   peak (Qtc > 1/√2) = Qtc²/√(Qtc² − 1/4) at f = fc/√(1 − 1/(2·Qtc²)).
 * Vented box: Small, "Vented-box loudspeaker systems, Part I" (JAES 1973), with leakage loss QL only:
 *   G(s) = s⁴T0⁴/(s⁴T0⁴ + a1·s³T0³ + a2·s²T0² + a3·s·T0 + 1), T0 = 1/(2π·√(fs·fb)), h = fb/fs,
 *   a1 = (QL + h·Qt)/(√h·QL·Qt), a2 = (h + (α + 1 + h²)·QL·Qt)/(h·QL·Qt), a3 = (h·QL + Qt)/(√h·QL·Qt).
 *   Alignments after Thiele (JAES 1971): B4 sets all three inner coefficients of |D(jω)|² to zero;
 *   QB3 zeroes the ω⁶ and ω⁴ terms (a1² = 2·a2, a2² + 2 = 2·a1·a3) and leaves B = a3² − 2·a2 ≥ 0.
 * Infinite baffle: the driver's own second-order high-pass at fs, Qts.
 * Excursion-limited SPL (Beranek & Mellow; Small 1972/1973): a piston small against the wavelength
 * radiating into half space gives p_rms = ρ·ω²·Vd·|U0/UD|/(2π·r·√2) when its peak excursion is Xmax.
 */
import { cabs, cadd, cdiv, cmul, cpolyval, cx, type Complex } from './complex';
import { airProperties, P_REF } from './constants';
import { AcousticsInputError } from './errors';

const TWO_PI = 2 * Math.PI;

export function secondOrderHighPass(frequency: number, f0: number, q: number): Complex {
  const s = cx(0, frequency / f0);
  const s2 = cmul(s, s);
  return cdiv(s2, cadd(cadd(s2, cx(0, frequency / f0 / q)), cx(1)));
}

const toDb = (z: Complex): number => 20 * Math.log10(cabs(z));

/** Half-power level, −3.01 dB, the exact meaning of "−3 dB" in the closed-form F3 expressions. */
export const HALF_POWER_DB = -10 * Math.log10(2);

/** Lowest frequency where a high-pass response, rising to 0 dB, passes the half-power level; scan and bisection. */
export function findF3(response: (f: number) => number, fRef: number, levelDb = HALF_POWER_DB): number {
  let hi = fRef * 64;
  let lo = hi;
  while (response(lo) > levelDb) {
    hi = lo;
    lo /= 1.05;
    if (lo < fRef * 1e-3) return NaN;
  }
  for (let i = 0; i < 60; i++) {
    const mid = Math.sqrt(lo * hi);
    if (response(mid) > levelDb) hi = mid;
    else lo = mid;
  }
  return Math.sqrt(lo * hi);
}

export interface ClosedBoxInput {
  fs: number;
  qts: number;
  vas: number;
  vb?: number;
  qtc?: number;
}

export interface ClosedBoxResult {
  alpha: number;
  fc: number;
  qtc: number;
  f3: number;
  /** Height of the response peak, dB (0 when Qtc ≤ 1/√2). */
  peakDb: number;
  /** Frequency of the peak, Hz (null when there is none). */
  peakHz: number | null;
  vb: number;
}

export function closedBoxVolumeForQtc(qts: number, vas: number, qtc: number): number {
  if (!(qtc > qts)) throw new AcousticsInputError('qtc', `target Qtc must exceed the driver's Qts (${qts})`);
  return vas / ((qtc / qts) ** 2 - 1);
}

export function closedBoxF3Ratio(qtc: number): number {
  const k = 1 / (qtc * qtc) - 2;
  return Math.sqrt((k + Math.sqrt(k * k + 4)) / 2);
}

export function closedBox(input: ClosedBoxInput): ClosedBoxResult {
  const { fs, qts, vas } = input;
  let vb: number;
  if (input.vb !== undefined) vb = input.vb;
  else if (input.qtc !== undefined) vb = closedBoxVolumeForQtc(qts, vas, input.qtc);
  else throw new AcousticsInputError('vb', 'give either vb or a target qtc');
  const alpha = vas / vb;
  const fc = fs * Math.sqrt(1 + alpha);
  const qtc = qts * Math.sqrt(1 + alpha);
  const f3 = fc * closedBoxF3Ratio(qtc);
  let peakDb = 0;
  let peakHz: number | null = null;
  if (qtc > Math.SQRT1_2) {
    peakDb = 20 * Math.log10((qtc * qtc) / Math.sqrt(qtc * qtc - 0.25));
    peakHz = fc / Math.sqrt(1 - 1 / (2 * qtc * qtc));
  }
  return { alpha, fc, qtc, f3, peakDb, peakHz, vb };
}

export function closedBoxResponseDb(box: Pick<ClosedBoxResult, 'fc' | 'qtc'>, frequencies: readonly number[]): number[] {
  return frequencies.map((f) => toDb(secondOrderHighPass(f, box.fc, box.qtc)));
}

export function infiniteBaffleResponseDb(fs: number, qts: number, frequencies: readonly number[]): number[] {
  return frequencies.map((f) => toDb(secondOrderHighPass(f, fs, qts)));
}

export type VentedAlignment = 'QB3' | 'B4';

export interface VentedCoefficients {
  a1: number;
  a2: number;
  a3: number;
}

/** Small 1973 coefficients for leakage loss QL (Infinity for a lossless box). */
export function ventedCoefficients(alpha: number, h: number, qt: number, ql: number = Infinity): VentedCoefficients {
  const sh = Math.sqrt(h);
  if (!Number.isFinite(ql)) return { a1: 1 / (sh * qt), a2: (alpha + 1 + h * h) / h, a3: sh / qt };
  return {
    a1: (ql + h * qt) / (sh * ql * qt),
    a2: (h + (alpha + 1 + h * h) * ql * qt) / (h * ql * qt),
    a3: (h * ql + qt) / (sh * ql * qt),
  };
}

export interface VentedBoxParams {
  fs: number;
  qts: number;
  vas: number;
  vb: number;
  fb: number;
  ql?: number;
}

export function ventedBoxTransfer(p: VentedBoxParams, frequency: number): Complex {
  const alpha = p.vas / p.vb;
  const h = p.fb / p.fs;
  const { a1, a2, a3 } = ventedCoefficients(alpha, h, p.qts, p.ql ?? Infinity);
  const s = cx(0, frequency / Math.sqrt(p.fs * p.fb));
  const s2 = cmul(s, s);
  return cdiv(cmul(s2, s2), cpolyval([1, a1, a2, a3, 1], s));
}

export function ventedBoxResponseDb(p: VentedBoxParams, frequencies: readonly number[]): number[] {
  return frequencies.map((f) => toDb(ventedBoxTransfer(p, f)));
}

/** Ratio of total radiated volume velocity to cone volume velocity in a vented box (port and leak included). */
export function ventedOutputPerCone(fb: number, ql: number, frequency: number): Complex {
  const s = cx(0, frequency / fb);
  const s2 = cmul(s, s);
  const loss = Number.isFinite(ql) ? cx(0, frequency / fb / ql) : cx(0);
  return cdiv(s2, cadd(cadd(s2, loss), cx(1)));
}

export interface VentedBoxInput {
  fs: number;
  qts: number;
  vas: number;
  alignment: VentedAlignment;
  /** Leakage loss Q; omitted means lossless. */
  ql?: number;
  /** Accepted relative mismatch between the driver's Qts and the single Qts a B4 needs; default 5 %. */
  b4Tolerance?: number;
}

export interface VentedBoxResult extends VentedCoefficients {
  alignment: VentedAlignment;
  vb: number;
  fb: number;
  f3: number;
  alpha: number;
  h: number;
  ql: number | null;
  /** The Qts the B4 alignment needs for this QL (also the upper limit of the QB3 family). */
  qtsB4: number;
  /** QB3 ripple parameter B = a3² − 2·a2 (0 at B4). */
  b: number;
}

const B4_A1 = Math.sqrt(4 + 2 * Math.SQRT2);
const B4_A2 = 2 + Math.SQRT2;

export function b4RequiredQts(ql: number = Infinity): number {
  return 1 / (B4_A1 - (Number.isFinite(ql) ? 1 / ql : 0));
}

function solveQb3H(qt: number, ql: number): number {
  const h0 = 1 / Math.sqrt(8 * qt * qt * (1 - qt * qt));
  if (!Number.isFinite(ql)) return h0;
  const g = (h: number): number => {
    const { a1, a3 } = ventedCoefficients(0, h, qt, ql);
    return (a1 ** 4) / 4 + 2 - 2 * a1 * a3;
  };
  // Take the sign change nearest the lossless solution, then bisect.
  let best: [number, number] | null = null;
  const steps = 2000;
  let prevH = 0.1;
  let prevG = g(prevH);
  for (let i = 1; i <= steps; i++) {
    const h = 0.1 * Math.pow(200, i / steps);
    const gh = g(h);
    if (prevG === 0 || prevG * gh < 0) {
      if (!best || Math.abs(Math.log(h / h0)) < Math.abs(Math.log(best[1] / h0))) best = [prevH, h];
    }
    prevH = h;
    prevG = gh;
  }
  if (!best) return NaN;
  let [lo, hi] = best;
  const glo = g(lo);
  for (let i = 0; i < 80; i++) {
    const mid = Math.sqrt(lo * hi);
    if (g(mid) * glo > 0) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

export function ventedBox(input: VentedBoxInput): VentedBoxResult {
  const { fs, qts, vas, alignment } = input;
  const ql = input.ql ?? Infinity;
  if (!(ql > 0)) throw new AcousticsInputError('ql', 'ql must be positive');
  const qtsB4 = b4RequiredQts(ql);
  const lossTerm = Number.isFinite(ql) ? 1 / (ql * qts) : 0;
  let h: number;
  let alpha: number;
  if (alignment === 'B4') {
    const tol = input.b4Tolerance ?? 0.05;
    if (Math.abs(qts / qtsB4 - 1) > tol) {
      throw new AcousticsInputError(
        'qts',
        `a B4 alignment needs Qts ≈ ${qtsB4.toFixed(3)} for this QL (within ${(tol * 100).toFixed(0)} %); this driver has ${qts}. ` +
          (qts < qtsB4 ? 'Use QB3 instead.' : 'A Chebyshev (C4) alignment is needed.'),
      );
    }
    h = 1;
    alpha = h * (B4_A2 - lossTerm) - 1 - h * h;
  } else if (alignment === 'QB3') {
    if (!(qts < qtsB4)) {
      throw new AcousticsInputError('qts', `QB3 alignments need Qts below ${qtsB4.toFixed(3)} for this QL; this driver has ${qts}`);
    }
    h = solveQb3H(qts, ql);
    const { a1 } = ventedCoefficients(0, h, qts, ql);
    alpha = h * (a1 * a1 / 2 - lossTerm) - 1 - h * h;
  } else {
    throw new AcousticsInputError('alignment', `unknown alignment ${String(alignment)}`);
  }
  if (!Number.isFinite(h) || !(alpha > 0)) {
    throw new AcousticsInputError('qts', `no ${alignment} alignment exists for Qts = ${qts} with this QL`);
  }
  const vb = vas / alpha;
  const fb = h * fs;
  const coeffs = ventedCoefficients(alpha, h, qts, ql);
  const params: VentedBoxParams = { fs, qts, vas, vb, fb, ql };
  const f3 = findF3((f) => toDb(ventedBoxTransfer(params, f)), fb);
  return {
    alignment, vb, fb, f3, alpha, h, ql: Number.isFinite(ql) ? ql : null, qtsB4,
    b: coeffs.a3 ** 2 - 2 * coeffs.a2, ...coeffs,
  };
}

export type EnclosureForExcursion =
  | { kind: 'infinite-baffle' }
  | { kind: 'closed' }
  | { kind: 'vented'; fb: number; ql?: number };

export interface ExcursionLimitInput {
  sd: number;
  /** One-way peak linear excursion, m. */
  xmax: number;
  frequencies: readonly number[];
  enclosure: EnclosureForExcursion;
  /** Measuring distance, m; default 1. */
  distance?: number;
  temperatureC?: number;
}

/** SPL (dB re 20 µPa, half space) reached when the cone moves ±Xmax, per frequency. */
export function excursionLimitedSpl(input: ExcursionLimitInput): number[] {
  const air = airProperties(input.temperatureC);
  const r = input.distance ?? 1;
  const vd = input.sd * input.xmax;
  return input.frequencies.map((f) => {
    const w = TWO_PI * f;
    let ratio = 1;
    if (input.enclosure.kind === 'vented') ratio = cabs(ventedOutputPerCone(input.enclosure.fb, input.enclosure.ql ?? Infinity, f));
    const p = (air.rho * w * w * vd * ratio) / (TWO_PI * r * Math.SQRT2);
    return 20 * Math.log10(p / P_REF);
  });
}
