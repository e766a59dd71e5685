/**
 * One pure function per calculator route. Inputs are the zod-parsed bodies of shared/schemas/calc.ts;
 * outputs are plain JSON (non-finite numbers become null). Impossible requests throw
 * AcousticsInputError with the offending field.
 */
import type {
  CalcInputs,
  CalcName,
  ClosedBoxCalcInput,
  ExcursionCalcInput,
  ImpedanceFitCalcInput,
  ImpedanceModelCalcInput,
  LevelsCalcInput,
  PistonCalcInput,
  SmoothCalcInput,
  ThieleSmallCalcInput,
  VentedBoxCalcInput,
} from '../schemas/calc';
import { DRIVE_2V83 } from './constants';
import { logFrequencyGrid, resampleLog, smoothFractionalOctave } from './curves';
import {
  closedBox,
  closedBoxResponseDb,
  excursionLimitedSpl,
  ventedBox,
  ventedBoxResponseDb,
  type EnclosureForExcursion,
} from './enclosures';
import { AcousticsInputError } from './errors';
import { fitImpedance, impedanceCurve, motionalElements } from './impedance';
import { excursionLimits } from './large-signal';
import { dbToPercent, normaliseSpl, percentToDb, splAtDistance, voltageRatioDb, type DriveLevel } from './levels';
import { beamingFrequencies, pistonDirectivityDb } from './piston';
import { completeThieleSmall } from './thiele-small';
import { airProperties } from './constants';

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Replaces NaN and ±Infinity by null and drops undefined, recursively. */
export function toJson(value: unknown): Json {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  if (typeof value === 'string' || typeof value === 'boolean') return value;
  if (Array.isArray(value)) return value.map(toJson);
  if (typeof value === 'object') {
    const out: { [key: string]: Json } = {};
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) if (v !== undefined) out[k] = toJson(v);
    return out;
  }
  return null;
}

export function calcThieleSmall(input: ThieleSmallCalcInput): Json {
  const { temperatureC, tolerance, ...params } = input;
  const r = completeThieleSmall(params, { temperatureC, tolerance });
  return toJson({ ...r.values, provenance: r.provenance, warnings: r.warnings, missing: r.missing, air: { c: r.air.c, rho: r.air.rho, temperatureC: r.air.temperatureC } });
}

function boxCurves(frequencies: number[] | undefined, response: (f: readonly number[]) => number[], enclosure: EnclosureForExcursion, input: { sd?: number; xmax?: number; temperatureC?: number }) {
  if (!frequencies) return {};
  const out: { frequencies: number[]; responseDb: number[]; maxSplDb?: number[] } = { frequencies, responseDb: response(frequencies) };
  if (input.sd !== undefined && input.xmax !== undefined) {
    out.maxSplDb = excursionLimitedSpl({ sd: input.sd, xmax: input.xmax, frequencies, enclosure, temperatureC: input.temperatureC });
  }
  return out;
}

export function calcClosedBox(input: ClosedBoxCalcInput): Json {
  const box = closedBox(input);
  return toJson({ ...box, ...boxCurves(input.frequencies, (f) => closedBoxResponseDb(box, f), { kind: 'closed' }, input) });
}

export function calcVentedBox(input: VentedBoxCalcInput): Json {
  const box = ventedBox(input);
  const params = { fs: input.fs, qts: input.qts, vas: input.vas, vb: box.vb, fb: box.fb, ql: input.ql };
  return toJson({ ...box, ...boxCurves(input.frequencies, (f) => ventedBoxResponseDb(params, f), { kind: 'vented', fb: box.fb, ql: input.ql }, input) });
}

export function calcPiston(input: PistonCalcInput): Json {
  const b = beamingFrequencies(input.diameter, input.temperatureC);
  let directivity: { angleDeg: number; db: number[] }[] | undefined;
  if (input.frequencies && input.anglesDeg) {
    const air = airProperties(input.temperatureC);
    const freqs = input.frequencies;
    directivity = input.anglesDeg.map((angleDeg) => ({ angleDeg, db: freqs.map((f) => pistonDirectivityDb(f, input.diameter, angleDeg, air)) }));
  }
  return toJson({ ...b, frequencies: input.frequencies, directivity });
}

export function calcExcursion(input: ExcursionCalcInput): Json {
  const r = excursionLimits(input);
  return toJson({
    xBl: r.xBl?.limit ?? null,
    xC: r.xC?.limit ?? null,
    xL: r.xL?.limit ?? null,
    xmax: r.xmax,
    governedBy: r.governedBy,
    details: { bl: r.xBl, c: r.xC, le: r.xL },
    thresholds: r.thresholds,
    thresholdSource: r.thresholdSource,
  });
}

export function calcImpedanceModel(input: ImpedanceModelCalcInput): Json {
  const { frequencies, ...p } = input;
  const c = impedanceCurve(p, frequencies);
  return toJson({ ...c, motional: motionalElements(p) });
}

export function calcImpedanceFit(input: ImpedanceFitCalcInput): Json {
  const r = fitImpedance(input.frequencies, input.magnitude, input.phaseDeg ?? null, { model: input.model, re: input.re, fixRe: input.fixRe });
  return toJson({
    params: r.params,
    motional: motionalElements(r.params),
    initial: r.initial,
    classic: r.classic,
    fitted: r.fitted,
    residual: r.residual,
    iterations: r.iterations,
  });
}

const mapValue = (v: number | number[], f: (x: number) => number): number | number[] => (Array.isArray(v) ? v.map(f) : f(v));

export function calcLevels(input: LevelsCalcInput): Json {
  switch (input.conversion) {
    case 'voltage-ratio':
      return toJson({ db: mapValue(input.voltage, (v) => voltageRatioDb(v, input.referenceVoltage)) });
    case 'distance':
      return toJson({ spl: mapValue(input.spl, (s) => splAtDistance(s, input.distance, input.targetDistance ?? 1)), distance: input.targetDistance ?? 1 });
    case 'normalise-spl': {
      const drive: DriveLevel =
        input.voltage !== undefined ? { voltage: input.voltage } : { power: input.power as number, impedance: input.impedance as number };
      const to = { drive: { voltage: input.targetVoltage ?? DRIVE_2V83 }, distance: input.targetDistance ?? 1 };
      return toJson({
        spl: mapValue(input.spl, (s) => normaliseSpl(s, { drive, distance: input.distance }, to)),
        voltage: to.drive.voltage,
        distance: to.distance,
      });
    }
    case 'thd-to-db':
      return toJson({ db: mapValue(input.percent, percentToDb) });
    case 'db-to-thd':
      return toJson({ percent: mapValue(input.db, dbToPercent) });
  }
}

export function calcSmooth(input: SmoothCalcInput): Json {
  const smoothed = smoothFractionalOctave(input.frequencies, input.values, input.fraction, input.mode ?? 'db');
  if (!input.resample) return toJson({ frequencies: input.frequencies, values: smoothed, fraction: input.fraction });
  const g = input.resample === true ? {} : input.resample;
  const grid = logFrequencyGrid(g.pointsPerOctave, g.fMin, g.fMax);
  const r = resampleLog(input.frequencies, smoothed, grid);
  return toJson({ frequencies: r.frequencies, values: r.values, fraction: input.fraction });
}

export const calcFunctions: { [K in CalcName]: (input: CalcInputs[K]) => Json } = {
  'thiele-small': calcThieleSmall,
  'impedance-model': calcImpedanceModel,
  'impedance-fit': calcImpedanceFit,
  'closed-box': calcClosedBox,
  'vented-box': calcVentedBox,
  excursion: calcExcursion,
  piston: calcPiston,
  levels: calcLevels,
  smooth: calcSmooth,
};

/** Runs a calculator on an input already parsed by calcInputs[name]. */
export function runCalc<K extends CalcName>(name: K, input: CalcInputs[K]): Json {
  const fn = calcFunctions[name] as ((i: CalcInputs[K]) => Json) | undefined;
  if (!fn) throw new AcousticsInputError('name', `unknown calculator ${String(name)}`);
  return fn(input);
}
