/**
 * Deterministic synthesis of plausible driver curves from Thiele/Small parameters, for demo data.
 * Physics: the lumped electro-mechanical model of Small (JAES 1972) in an infinite baffle, radiating
 * as a baffled piston (Beranek & Mellow), with a second-order low-pass resonance standing in for the
 * first cone breakup. Distortion is a heuristic, not a prediction: harmonic force ratios grow with
 * excursion (H2 ∝ x with curve asymmetry, H3 ∝ x², 10 % at the Bl limit, consistent with the
 * 82 % Bl criterion of large-signal practice) and reach the microphone through the driver's own
 * force-to-pressure transfer at the harmonic frequency. There is no randomness: all variation comes
 * in through the options.
 */
import { cabs, cadd, carg, cdiv, cinv, cmul, cx, type Complex } from './complex';
import { airProperties, DRIVE_2V83, P_REF } from './constants';
import { logFrequencyGrid } from './curves';
import { AcousticsInputError } from './errors';
import { pistonDirectivity } from './piston';
import { completeThieleSmall, type ThieleSmallInputs, type ThieleSmallValues } from './thiele-small';

export interface BreakupOptions {
  /** Frequency of the first breakup resonance, Hz. */
  frequency: number;
  /** Its Q; the peak is about 20·log10(Q) dB and the response falls 12 dB/octave above. */
  q: number;
}

export interface LargeSignalShape {
  /** Excursion where Bl falls to 82 % of Bl(0), m; default 1.1·xmax. */
  xBl?: number;
  /** Excursion where Cms falls to 75 % of Cms(0), m; default 1.4·xmax. */
  xC?: number;
  /** Excursion where Le changes by 10 %, m; default 1.8·xmax. */
  xL?: number;
  /** Offset of the Bl(x) centre (positive: towards the front), m; default 0. */
  blOffset?: number;
  /** Offset of the Kms(x) minimum, m; default 0. */
  kmsOffset?: number;
  /** Number of x points; default 81. */
  points?: number;
}

export interface SynthesisOptions {
  frequencies?: readonly number[];
  anglesDeg?: readonly number[];
  /** Distance of the SPL curves, m; default 1. */
  distance?: number;
  /** Drive voltage (RMS) of the SPL curves; default 2.83 V. */
  driveVoltage?: number;
  /** RMS drive voltages at which distortion curves are made; default [2.83, 8]. */
  distortionVoltages?: readonly number[];
  /** Breakup resonance; null for none. Default: none. */
  breakup?: BreakupOptions | null;
  /** Lossy inductance branch L2‖R2 (H, Ω) added in series with Le. */
  l2?: number;
  r2?: number;
  largeSignal?: LargeSignalShape;
  /** Residual H2 and H3 away from excursion effects, percent; defaults 0.1 and 0.05. */
  floorH2Percent?: number;
  floorH3Percent?: number;
  temperatureC?: number;
}

export interface SplCurve {
  angleDeg: number;
  driveVoltage: number;
  distance: number;
  spl: number[];
}

export interface DistortionCurve {
  driveVoltage: number;
  thdPercent: number[];
  h2Percent: number[];
  h3Percent: number[];
  /** Peak cone excursion, m. */
  excursion: number[];
}

export interface SynthesisResult {
  frequencies: number[];
  spl: SplCurve[];
  impedance: { magnitude: number[]; phaseDeg: number[] };
  distortion: DistortionCurve[];
  largeSignal: { x: number[]; bl: number[]; kms: number[]; le: number[] };
  parameters: ThieleSmallValues;
  /** The large-signal shape actually used, with defaults filled in. */
  largeSignalShape: Required<Omit<LargeSignalShape, 'points'>>;
}

const TWO_PI = 2 * Math.PI;

export function synthesiseDriverCurves(params: ThieleSmallInputs, options: SynthesisOptions = {}): SynthesisResult {
  const ts = completeThieleSmall(params, { temperatureC: options.temperatureC });
  const v = ts.values;
  const need = ['re', 'bl', 'mms', 'cms', 'rms', 'sd', 'xmax'] as const;
  for (const k of need) {
    if (v[k] === undefined) throw new AcousticsInputError(k, `cannot synthesise: ${k} is not given and cannot be derived from the parameters`);
  }
  const re = v.re as number;
  const bl = v.bl as number;
  const mms = v.mms as number;
  const cms = v.cms as number;
  const rms = v.rms as number;
  const sd = v.sd as number;
  const xmax = v.xmax as number;
  const le = v.le ?? 0;
  const diameter = 2 * Math.sqrt(sd / Math.PI);
  const air = airProperties(options.temperatureC);
  const frequencies = options.frequencies ? [...options.frequencies] : logFrequencyGrid();
  const angles = options.anglesDeg ? [...options.anglesDeg] : [0, 15, 30, 45, 60, 75, 90];
  const distance = options.distance ?? 1;
  const drive = options.driveVoltage ?? DRIVE_2V83;
  const distortionVoltages = options.distortionVoltages ? [...options.distortionVoltages] : [DRIVE_2V83, 8];
  const breakup = options.breakup ?? null;
  const shape = {
    xBl: options.largeSignal?.xBl ?? 1.1 * xmax,
    xC: options.largeSignal?.xC ?? 1.4 * xmax,
    xL: options.largeSignal?.xL ?? 1.8 * xmax,
    blOffset: options.largeSignal?.blOffset ?? 0,
    kmsOffset: options.largeSignal?.kmsOffset ?? 0,
  };

  const zElectrical = (w: number): Complex => {
    let z = cx(re, w * le);
    if (options.l2 && options.r2) z = cadd(z, cdiv(cx(0, w * options.l2 * options.r2), cx(options.r2, w * options.l2)));
    return z;
  };
  const zMechanical = (w: number): Complex => cx(rms, w * mms - 1 / (w * cms));
  const breakupGain = (f: number): number => {
    if (!breakup) return 1;
    const s = cx(0, f / breakup.frequency);
    return 1 / cabs(cadd(cadd(cmul(s, s), cx(0, f / breakup.frequency / breakup.q)), cx(1)));
  };
  // Cone velocity per volt, and force-to-pressure transfer (for harmonics), both at angular frequency w.
  const velocityPerVolt = (w: number): Complex => {
    const ze = zElectrical(w);
    const zm = zMechanical(w);
    const current = cinv(cadd(ze, cdiv(cx(bl * bl), zm)));
    return cdiv(cmul(current, cx(bl)), zm);
  };
  const forceToPressure = (f: number): number => {
    const w = TWO_PI * f;
    const zmTotal = cadd(zMechanical(w), cdiv(cx(bl * bl), zElectrical(w)));
    return (w / cabs(zmTotal)) * breakupGain(f);
  };

  const spl: SplCurve[] = angles.map((angleDeg) => ({
    angleDeg,
    driveVoltage: drive,
    distance,
    spl: frequencies.map((f) => {
      const w = TWO_PI * f;
      const u = cabs(velocityPerVolt(w)) * drive * sd;
      const ka = (w * diameter) / 2 / air.c;
      const d = Math.abs(pistonDirectivity(ka, angleDeg));
      const p = ((w * air.rho * u) / (TWO_PI * distance)) * d * breakupGain(f);
      return 20 * Math.log10(Math.max(p, 1e-12) / P_REF);
    }),
  }));

  const impedance = { magnitude: [] as number[], phaseDeg: [] as number[] };
  for (const f of frequencies) {
    const w = TWO_PI * f;
    const z = cadd(zElectrical(w), cdiv(cx(bl * bl), zMechanical(w)));
    impedance.magnitude.push(cabs(z));
    impedance.phaseDeg.push((carg(z) * 180) / Math.PI);
  }

  const asym = Math.min(1, (4 * Math.abs(shape.blOffset)) / shape.xBl);
  const floor2 = (options.floorH2Percent ?? 0.1) / 100;
  const floor3 = (options.floorH3Percent ?? 0.05) / 100;
  const distortion: DistortionCurve[] = distortionVoltages.map((vd) => {
    const curve: DistortionCurve = { driveVoltage: vd, thdPercent: [], h2Percent: [], h3Percent: [], excursion: [] };
    for (const f of frequencies) {
      const w = TWO_PI * f;
      const xPeak = (cabs(velocityPerVolt(w)) * vd * Math.SQRT2) / w;
      const r = xPeak / shape.xBl;
      const t1 = forceToPressure(f);
      const h2 = Math.min(1, (floor2 + 0.1 * (0.2 + asym) * r) * (forceToPressure(2 * f) / t1));
      const h3 = Math.min(1, (floor3 + 0.1 * r * r) * (forceToPressure(3 * f) / t1));
      curve.excursion.push(xPeak);
      curve.h2Percent.push(100 * h2);
      curve.h3Percent.push(100 * h3);
      curve.thdPercent.push(100 * Math.sqrt(h2 * h2 + h3 * h3));
    }
    return curve;
  });

  const points = Math.max(3, Math.round(options.largeSignal?.points ?? 81));
  const span = 1.5 * Math.max(shape.xBl, shape.xC, shape.xL) + Math.abs(shape.blOffset) + Math.abs(shape.kmsOffset);
  const x: number[] = [];
  for (let i = 0; i < points; i++) x.push(-span + (2 * span * i) / (points - 1));
  // Shapes chosen so the criteria of large-signal practice land exactly on xBl, xC, xL when offsets are 0.
  const wBl = shape.xBl / Math.sqrt(1 / 0.82 - 1);
  const wK = shape.xC * Math.sqrt(3);
  const blShape = (xi: number): number => 1 / (1 + ((xi - shape.blOffset) / wBl) ** 2);
  const kShape = (xi: number): number => 1 + ((xi - shape.kmsOffset) / wK) ** 2;
  const largeSignal = {
    x,
    bl: x.map((xi) => (bl * blShape(xi)) / blShape(0)),
    kms: x.map((xi) => ((1 / cms) * kShape(xi)) / kShape(0)),
    le: x.map((xi) => Math.max(0, le * (1 - (0.1 * xi) / shape.xL))),
  };

  return { frequencies, spl, impedance, distortion, largeSignal, parameters: v, largeSignalShape: shape };
}
