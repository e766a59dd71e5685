import { calcInputs, calcNames, type CalcInputs, type CalcName } from '../schemas/calc';
import { runCalc, toJson } from './calc';
import { logFrequencyGrid } from './curves';
import { AcousticsInputError } from './errors';
import { impedanceCurve } from './impedance';

function parse<K extends CalcName>(name: K, body: unknown): CalcInputs[K] {
  return calcInputs[name].parse(body) as CalcInputs[K];
}
function issues(name: CalcName, body: unknown): { path: string; message: string }[] {
  const r = calcInputs[name].safeParse(body);
  if (r.success) return [];
  return r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}
const roundTripsJson = (v: unknown) => expect(JSON.parse(JSON.stringify(v))).toEqual(v);

describe('calc schemas', () => {
  it('has one schema per route', () => {
    expect(Object.keys(calcInputs).sort()).toEqual([...calcNames].sort());
  });

  it('rejects unknown keys and non-positive values with the field named', () => {
    expect(issues('thiele-small', { fs: 30, foo: 1 }).length).toBeGreaterThan(0);
    expect(issues('thiele-small', { fs: -30 })).toEqual([{ path: 'fs', message: 'fs must be positive' }]);
    expect(issues('thiele-small', {})[0].message).toMatch(/at least one/);
    expect(issues('closed-box', { fs: 30, qts: 0.4, vas: 0.05 })[0].path).toBe('vb');
    expect(issues('closed-box', { fs: 30, qts: 0.4, vas: 0.05, qtc: 0.3 })[0].path).toBe('qtc');
    expect(issues('vented-box', { fs: 30, qts: 0.4, vas: 0.05, alignment: 'C4' })[0].path).toBe('alignment');
  });

  it('checks array lengths and ordering per field', () => {
    const f = [10, 20, 30, 40, 50];
    expect(issues('impedance-fit', { frequencies: f, magnitude: [1, 2, 3, 4] }).map((i) => i.path)).toContain('magnitude');
    expect(issues('impedance-fit', { frequencies: [10, 30, 20, 40, 50], magnitude: [1, 2, 3, 4, 5] }).map((i) => i.path)).toContain('frequencies');
    expect(issues('excursion', { x: [-1, 0, 1], bl: [1, 1] }).map((i) => i.path)).toContain('bl');
    expect(issues('excursion', { x: [-1, 0, 1], cms: [1, 1, 1], kms: [1, 1, 1] }).map((i) => i.path)).toContain('kms');
    expect(issues('smooth', { frequencies: [10, 20], values: [1], fraction: 3 }).map((i) => i.path)).toContain('values');
    expect(issues('impedance-model', { re: 6, fs: 30, qms: 4, qes: 0.4, l2: 1e-3, frequencies: [100] }).map((i) => i.path)).toContain('r2');
    expect(issues('levels', { conversion: 'normalise-spl', spl: 90, distance: 1, power: 1 }).map((i) => i.path)).toContain('impedance');
  });
});

describe('runCalc', () => {
  it('thiele-small returns the completed set with provenance and warnings', () => {
    const out = runCalc('thiele-small', parse('thiele-small', { fs: 30, qms: 5, qes: 0.4, qts: 0.39, re: 6, sd: 0.0133, vas: 0.08, xmax: 0.005 })) as Record<string, unknown>;
    for (const k of ['bl', 'mms', 'cms', 'kms', 'rms', 'eta0', 'spl1w', 'spl283v', 'ebp', 'vd', 'res', 'lces', 'cmes']) expect(typeof out[k]).toBe('number');
    expect((out.warnings as unknown[]).length).toBe(1);
    expect((out.provenance as Record<string, { source: string }>).bl.source).toBe('derived');
    roundTripsJson(out);
  });

  it('closed-box returns alpha, fc, qtc, f3, peakDb, vb and curves', () => {
    // Small (JAES 1972): Qtc = 0.707 gives F3 = fc and no peak.
    const out = runCalc('closed-box', parse('closed-box', { fs: 30, qts: 0.35, vas: 0.08, qtc: Math.SQRT1_2, frequencies: [20, 40, 80], sd: 0.02, xmax: 0.005 })) as Record<string, number | number[]>;
    expect(out.qtc).toBeCloseTo(Math.SQRT1_2, 12);
    expect(out.f3).toBeCloseTo(out.fc as number, 9);
    expect(out.peakDb).toBe(0);
    expect(out.vb).toBeGreaterThan(0);
    expect(out.responseDb).toHaveLength(3);
    expect(out.maxSplDb).toHaveLength(3);
    roundTripsJson(out);
  });

  it('vented-box returns vb, fb, f3, or throws AcousticsInputError on qts', () => {
    const out = runCalc('vented-box', parse('vented-box', { fs: 30, qts: 0.3, vas: 0.08, alignment: 'QB3', ql: 7 })) as Record<string, number>;
    expect(out.vb).toBeGreaterThan(0);
    expect(out.fb).toBeGreaterThan(30);
    expect(out.f3).toBeGreaterThan(0);
    expect(() => runCalc('vented-box', parse('vented-box', { fs: 30, qts: 0.6, vas: 0.08, alignment: 'B4' }))).toThrow(AcousticsInputError);
  });

  it('piston returns halfWaveHz and ka1Hz', () => {
    // Common practice, no source: c/(2D) and c/(πD).
    const out = runCalc('piston', parse('piston', { diameter: 0.1 })) as Record<string, number>;
    expect(out.halfWaveHz).toBeCloseTo(343.2 / 0.2, 6);
    expect(out.ka1Hz).toBeCloseTo(343.2 / (Math.PI * 0.1), 6);
    const d = runCalc('piston', parse('piston', { diameter: 0.1, frequencies: [100, 5000], anglesDeg: [0, 60] })) as { directivity: { db: number[] }[] };
    expect(d.directivity[0].db).toEqual([0, 0]);
    expect(d.directivity[1].db[1]).toBeLessThan(-3);
  });

  it('excursion returns xBl, xC, xL and xmax', () => {
    const x = Array.from({ length: 201 }, (_, i) => -0.01 + i * 1e-4);
    const out = runCalc('excursion', parse('excursion', { x, bl: x.map((v) => 6 * (1 - (v / 0.01) ** 2) + 0.01), kms: x.map((v) => 1000 * (1 + (v / 0.008) ** 2)), le: x.map((v) => 1e-3 * (1 - v / 0.05)) })) as Record<string, number>;
    expect(out.xmax).toBe(Math.min(out.xBl, out.xC, out.xL));
    roundTripsJson(out);
  });

  it('impedance-model and impedance-fit agree', () => {
    const frequencies = logFrequencyGrid(12, 10, 20000);
    const p = { re: 6.1, fs: 33, qms: 3.3, qes: 0.38, le: 7e-4 };
    const model = runCalc('impedance-model', parse('impedance-model', { ...p, frequencies })) as { magnitude: number[]; phaseDeg: number[] };
    expect(model.magnitude).toEqual(impedanceCurve(p, frequencies).magnitude);
    const fit = runCalc('impedance-fit', parse('impedance-fit', { frequencies, magnitude: model.magnitude, phaseDeg: model.phaseDeg })) as {
      params: Record<string, number>;
      residual: { rmsMagnitudeDb: number };
      fitted: { magnitude: number[] };
    };
    expect(fit.params.fs).toBeCloseTo(33, 3);
    expect(fit.residual.rmsMagnitudeDb).toBeLessThan(1e-3);
    expect(fit.fitted.magnitude).toHaveLength(frequencies.length);
    roundTripsJson(fit);
  });

  it('levels converts voltage ratios, distance, drive and THD', () => {
    // Common practice, no source: 2.83 V → 9 V ≈ +10 dB, 1 % = −40 dB.
    expect((runCalc('levels', parse('levels', { conversion: 'voltage-ratio', voltage: 9, referenceVoltage: 2.83 })) as { db: number }).db).toBeCloseTo(10, 0);
    expect((runCalc('levels', parse('levels', { conversion: 'thd-to-db', percent: [1, 10] })) as { db: number[] }).db).toEqual([-40, -20]);
    expect((runCalc('levels', parse('levels', { conversion: 'db-to-thd', db: -40 })) as { percent: number }).percent).toBeCloseTo(1, 12);
    expect((runCalc('levels', parse('levels', { conversion: 'distance', spl: 90, distance: 2 })) as { spl: number }).spl).toBeCloseTo(96.02, 2);
    const n = runCalc('levels', parse('levels', { conversion: 'normalise-spl', spl: 80, distance: 1, voltage: 1.415 })) as { spl: number };
    expect(n.spl).toBeCloseTo(86.02, 2);
  });

  it('smooth returns smoothed values, optionally on the grid', () => {
    const frequencies = logFrequencyGrid(24, 20, 20000);
    const values = frequencies.map((f) => 80 + (Math.round(Math.log2(f) * 24) % 2 === 0 ? 1 : -1));
    const out = runCalc('smooth', parse('smooth', { frequencies, values, fraction: 3 })) as { values: number[] };
    expect(Math.max(...out.values.slice(10, -10).map((v) => Math.abs(v - 80)))).toBeLessThan(0.2);
    const grid = runCalc('smooth', parse('smooth', { frequencies, values, fraction: 3, resample: true })) as { frequencies: number[] };
    expect(grid.frequencies[0]).toBeGreaterThanOrEqual(20);
    expect(grid.frequencies[1] / grid.frequencies[0]).toBeCloseTo(Math.pow(2, 1 / 48), 12);
  });

  it('toJson turns non-finite numbers into null', () => {
    expect(toJson({ a: NaN, b: [Infinity, 1], c: undefined })).toEqual({ a: null, b: [null, 1] });
  });
});
