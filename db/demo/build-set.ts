// Turns a demo driver and one of its sets into the rows a reviewer's upload would have produced:
// normalised curves on the common grid, small- and large-signal parameters and the maker's sheet.
import { completeThieleSmall } from '../../shared/acoustics/thiele-small';
import { parameterUnit } from '../../shared/catalogue/parameter-units';
import { fitImpedance } from '../../shared/acoustics/impedance';
import { excursionLimits } from '../../shared/acoustics/large-signal';
import { synthesiseDriverCurves } from '../../shared/acoustics/synthesis';
import type { Curve } from '../../shared/schemas/drivers';
import type { DemoDriver, DemoSetSpec } from './catalogue';

export interface BuiltSet {
  curves: Curve[];
  parameters: { name: string; value: number; unit: string; signal: 'small' | 'large' }[];
  anglesDeg: number[];
}

const sig = (v: number, digits = 5) => Number(v.toPrecision(digits));
const fix = (v: number, digits: number) => Number(v.toFixed(digits));

export function basisFor(d: DemoDriver, tweak: DemoSetSpec['tweak'] = {}) {
  const fs = d.ts.fs * (tweak.fs ?? 1);
  const qms = d.ts.qms * (tweak.qms ?? 1);
  const mms = d.ts.mms * (tweak.mms ?? 1);
  // Bl from Qes = 2π·fs·Mms·Re / Bl² (Small 1972), scaled by the sample's motor strength.
  const bl = Math.sqrt((2 * Math.PI * d.ts.fs * d.ts.mms * d.ts.re) / d.ts.qes) * (tweak.bl ?? 1);
  return { fs, qms, mms, bl, re: d.ts.re, le: d.ts.le, sd: d.ts.sd, xmax: d.ts.xmax };
}

const ANGLES = [0, 15, 30, 45, 60, 75, 90];

export function buildSet(d: DemoDriver, set: DemoSetSpec): BuiltSet {
  const basis = basisFor(d, set.tweak);
  const result = synthesiseDriverCurves(basis, {
    anglesDeg: ANGLES,
    distortionVoltages: d.distortionVoltages,
    breakup: d.breakup,
    temperatureC: set.temperatureC,
    largeSignal: {
      xBl: d.ts.xmax * d.largeSignal.xBlFactor,
      xC: d.ts.xmax * d.largeSignal.xCFactor,
      xL: d.ts.xmax * d.largeSignal.xLFactor,
      blOffset: d.largeSignal.blOffsetM,
    },
  });
  const f = result.frequencies.map((x) => sig(x, 6));
  const curves: Curve[] = result.spl.map((c) => ({ kind: 'spl', angleDeg: c.angleDeg, driveLevelV: c.driveVoltage, x: f, y: c.spl.map((v) => fix(v, 2)), phase: null }));
  curves.push({ kind: 'impedance', angleDeg: null, driveLevelV: null, x: f, y: result.impedance.magnitude.map((v) => fix(v, 3)), phase: result.impedance.phaseDeg.map((v) => fix(v, 2)) });
  const fit = fitImpedance(result.frequencies, result.impedance.magnitude, result.impedance.phaseDeg, { re: basis.re });
  curves.push({ kind: 'impedance_fit', angleDeg: null, driveLevelV: null, x: f, y: fit.fitted.magnitude.map((v) => fix(v, 3)), phase: fit.fitted.phaseDeg.map((v) => fix(v, 2)) });
  for (const dist of result.distortion) {
    curves.push({ kind: 'thd', angleDeg: 0, driveLevelV: dist.driveVoltage, x: f, y: dist.thdPercent.map((v) => sig(v, 4)), phase: null });
    curves.push({ kind: 'h2', angleDeg: 0, driveLevelV: dist.driveVoltage, x: f, y: dist.h2Percent.map((v) => sig(v, 4)), phase: null });
    curves.push({ kind: 'h3', angleDeg: 0, driveLevelV: dist.driveVoltage, x: f, y: dist.h3Percent.map((v) => sig(v, 4)), phase: null });
  }
  // Two-tone IMD for the demo: a heuristic from the same excursion model (second- and third-order
  // products weighted 2 and 3 as in a two-tone test's sum and difference terms). Demo only.
  const mid = result.distortion[Math.min(1, result.distortion.length - 1)];
  curves.push({ kind: 'imd', angleDeg: 0, driveLevelV: mid.driveVoltage, x: f, y: mid.h2Percent.map((h2, i) => sig(Math.hypot(2 * h2, 3 * mid.h3Percent[i]), 4)), phase: null });
  const ls = result.largeSignal;
  const xs = ls.x.map((v) => sig(v, 5));
  curves.push({ kind: 'bl_x', angleDeg: null, driveLevelV: null, x: xs, y: ls.bl.map((v) => sig(v, 5)), phase: null });
  curves.push({ kind: 'kms_x', angleDeg: null, driveLevelV: null, x: xs, y: ls.kms.map((v) => sig(v, 5)), phase: null });
  curves.push({ kind: 'le_x', angleDeg: null, driveLevelV: null, x: xs, y: ls.le.map((v) => sig(v, 5)), phase: null });

  const ts = completeThieleSmall({ fs: fit.params.fs, qms: fit.params.qms, qes: fit.params.qes, re: fit.params.re, le: fit.params.le ?? basis.le, mms: basis.mms, sd: basis.sd, xmax: basis.xmax }, { temperatureC: set.temperatureC });
  const parameters: BuiltSet['parameters'] = [];
  for (const name of ['fs', 'qms', 'qes', 'qts', 're', 'le', 'bl', 'mms', 'cms', 'kms', 'rms', 'sd', 'vas', 'xmax', 'spl283v', 'spl1w', 'eta0', 'ebp', 'vd'] as const) {
    const v = ts.values[name];
    if (v !== undefined && Number.isFinite(v)) parameters.push({ name, value: sig(v, 5), unit: parameterUnit(name), signal: 'small' });
  }
  const exc = excursionLimits({ x: ls.x, bl: ls.bl, kms: ls.kms, le: ls.le });
  if (exc.xBl) parameters.push({ name: 'x_bl', value: sig(exc.xBl.limit, 4), unit: 'm', signal: 'large' });
  if (exc.xC) parameters.push({ name: 'x_c', value: sig(exc.xC.limit, 4), unit: 'm', signal: 'large' });
  if (exc.xL) parameters.push({ name: 'x_l', value: sig(exc.xL.limit, 4), unit: 'm', signal: 'large' });
  parameters.push({ name: 'xmax_ls', value: sig(exc.xmax, 4), unit: 'm', signal: 'large' });
  if (exc.xBl) parameters.push({ name: 'bl_offset', value: sig(exc.xBl.offset, 3), unit: 'm', signal: 'large' });
  parameters.push({ name: 'bl0', value: sig(ls.bl[Math.floor(ls.bl.length / 2)], 4), unit: 'T·m', signal: 'large' });
  parameters.push({ name: 'kms0', value: sig(ls.kms[Math.floor(ls.kms.length / 2)], 4), unit: 'N/m', signal: 'large' });
  return { curves, parameters, anglesDeg: ANGLES };
}

/** The maker's sheet: the measured truth bent by the driver's spec bias, rounded as sheets are. */
export function makerSheet(d: DemoDriver, measured: BuiltSet['parameters']): { name: string; value: number; unit: string }[] {
  const get = (n: string) => measured.find((p) => p.name === n)?.value;
  const out: { name: string; value: number; unit: string }[] = [];
  const add = (name: string, v: number | undefined, digits: number) => {
    if (v !== undefined) out.push({ name, value: Number(v.toPrecision(digits)), unit: parameterUnit(name) });
  };
  add('fs', (get('fs') ?? 0) * d.specBias.fs, 3);
  add('qts', get('qts'), 2);
  add('re', get('re'), 2);
  add('bl', get('bl'), 2);
  add('mms', get('mms'), 2);
  add('sd', get('sd'), 3);
  add('vas', (get('vas') ?? 0) * d.specBias.vas, 2);
  add('xmax', d.ts.xmax * d.specBias.xmax, 2);
  add('spl283v', (get('spl283v') ?? 0) + d.specBias.sensitivityDb, 3);
  return out;
}
