import Complex from 'complex.js';
import fc from 'fast-check';
import { nelderMead } from 'fmin';
import { AcousticsInputError } from './errors';
import {
  classicParameters,
  fitImpedance,
  impedanceAt,
  impedanceCurve,
  motionalElements,
  vasByAddedMass,
  vasByKnownVolume,
  type ImpedanceModelParams,
} from './impedance';
import { airProperties } from './constants';

const grid = (n: number, f0 = 5, f1 = 20000): number[] => Array.from({ length: n }, (_, i) => f0 * Math.pow(f1 / f0, i / (n - 1)));
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

/** Reference model built with complex.js from the element values (Beranek & Mellow, impedance analogy). */
function referenceZ(p: ImpedanceModelParams, f: number): Complex {
  const w = 2 * Math.PI * f;
  const j = new Complex(0, 1);
  const { res, lces, cmes } = motionalElements(p);
  const ymot = new Complex(1 / res).add(j.mul(w * lces).inverse()).add(j.mul(w * cmes));
  let z = new Complex(p.re).add(j.mul(w * (p.le ?? 0))).add(ymot.inverse());
  if (p.l2 && p.r2) {
    const zl2 = j.mul(w * p.l2);
    z = z.add(zl2.mul(p.r2).div(zl2.add(p.r2)));
  }
  return z;
}

const paramsArb = fc.record({
  re: fc.double({ min: 2, max: 16, noNaN: true }),
  fs: fc.double({ min: 20, max: 400, noNaN: true }),
  qms: fc.double({ min: 1.5, max: 12, noNaN: true }),
  qes: fc.double({ min: 0.25, max: 1.5, noNaN: true }),
  le: fc.double({ min: 5e-5, max: 2e-3, noNaN: true }),
});

describe('impedance model', () => {
  it('agrees with an independent complex.js evaluation', () => {
    fc.assert(
      fc.property(paramsArb, fc.double({ min: 1e-4, max: 5e-3, noNaN: true }), fc.double({ min: 1, max: 50, noNaN: true }), fc.double({ min: 5, max: 20000, noNaN: true }), (p, l2, r2, f) => {
        const params = { ...p, l2, r2 };
        const ours = impedanceAt(params, f);
        const ref = referenceZ(params, f);
        expect(Math.abs(ours.re - ref.re)).toBeLessThan(1e-9 * ref.abs());
        expect(Math.abs(ours.im - ref.im)).toBeLessThan(1e-9 * ref.abs());
      }),
      { numRuns: 500 },
    );
  });

  it('is purely resistive at fs with value Re·(1 + Qms/Qes) when Le = 0', () => {
    // Small (JAES 1972): at resonance the motional impedance is Res = Re·Qms/Qes, resistive.
    const p = { re: 6, fs: 40, qms: 4, qes: 0.5 };
    const c = impedanceCurve(p, [40]);
    expect(c.magnitude[0]).toBeCloseTo(6 * (1 + 4 / 0.5), 9);
    expect(c.phaseDeg[0]).toBeCloseTo(0, 9);
  });

  it('tends to Re at low frequency and to jωLe at high frequency', () => {
    const p = { re: 6, fs: 40, qms: 4, qes: 0.5, le: 1e-3 };
    expect(impedanceAt(p, 1e-3).re).toBeCloseTo(6, 3);
    const hi = impedanceAt(p, 1e6);
    expect(hi.im / (2 * Math.PI * 1e6 * 1e-3)).toBeCloseTo(1, 3);
  });
});

describe('classic (Small 1972) parameter extraction', () => {
  it('recovers fs, Qms, Qes from a lossless-inductance model sweep', () => {
    // Small, "Simplified loudspeaker measurements at low frequencies" (JAES 1972): for the parallel
    // RLC motional impedance the √(Re·Zmax) method is exact, so only grid error remains.
    fc.assert(
      fc.property(paramsArb, (p) => {
        const f = grid(800);
        const c = impedanceCurve({ ...p, le: 0 }, f);
        const r = classicParameters(f, c.magnitude, { re: p.re });
        expect(rel(r.fs, p.fs)).toBeLessThan(2e-3);
        expect(rel(r.qms, p.qms)).toBeLessThan(5e-3);
        expect(rel(r.qes, p.qes)).toBeLessThan(5e-3);
        expect(rel(r.fsGeometric, p.fs)).toBeLessThan(2e-3);
      }),
      { numRuns: 200 },
    );
  });

  it('rejects a sweep without a peak', () => {
    const f = grid(50, 500, 20000);
    const mag = f.map((x) => 6 + x * 1e-3);
    expect(() => classicParameters(f, mag)).toThrow(AcousticsInputError);
  });
});

describe('Vas methods', () => {
  it('added mass: Mms = M/((fs/fs′)² − 1)', () => {
    // Small (JAES 1972). Worked numbers: fs 50 Hz → 40 Hz with 10 g gives Mms = 10 g/0.5625 = 17.78 g.
    const r = vasByAddedMass({ fs: 50, fsAdded: 40, addedMass: 0.01, sd: 0.02 });
    expect(r.mms).toBeCloseTo(0.01 / 0.5625, 10);
    // Physics check: the loaded resonance with that Cms comes back at 40 Hz.
    expect(1 / (2 * Math.PI * Math.sqrt((r.mms + 0.01) * r.cms))).toBeCloseTo(40, 8);
    const air = airProperties(20);
    expect(r.vas).toBeCloseTo(air.rho * air.c ** 2 * 0.02 ** 2 * r.cms, 12);
  });

  it('known volume: recovers Vas from fc of a closed test box', () => {
    // Small (JAES 1972): fc = fs·√(1 + Vas/Vb) and Qec = Qes·√(1 + Vas/Vb).
    const vas = 0.05;
    const vb = 0.02;
    const k = Math.sqrt(1 + vas / vb);
    expect(vasByKnownVolume({ fs: 30, fc: 30 * k, vb })).toBeCloseTo(vas, 12);
    expect(vasByKnownVolume({ fs: 30, fc: 30 * k, vb, qes: 0.4, qec: 0.4 * k })).toBeCloseTo(vas, 12);
    expect(() => vasByKnownVolume({ fs: 30, fc: 25, vb })).toThrow(AcousticsInputError);
  });
});

describe('fitImpedance (least squares)', () => {
  it('round-trips: fit(model(p)) = p, with and without phase', () => {
    fc.assert(
      fc.property(paramsArb, fc.boolean(), (p, withPhase) => {
        const f = grid(160, 5, 20000);
        const c = impedanceCurve(p, f);
        const r = fitImpedance(f, c.magnitude, withPhase ? c.phaseDeg : null);
        for (const k of ['re', 'fs', 'qms', 'qes', 'le'] as const) expect(rel(r.params[k]!, p[k])).toBeLessThan(1e-3);
        expect(r.residual.rmsMagnitudeDb).toBeLessThan(1e-3);
        expect(r.fitted.magnitude).toHaveLength(f.length);
      }),
      { numRuns: 40 },
    );
  });

  it('fits the lossy second inductance', () => {
    const p = { re: 5.6, fs: 42, qms: 4.1, qes: 0.45, le: 3e-4, l2: 1e-3, r2: 8 };
    const f = grid(240, 10, 20000);
    const c = impedanceCurve(p, f);
    const r = fitImpedance(f, c.magnitude, c.phaseDeg, { model: 'le-l2' });
    for (const k of ['re', 'fs', 'qms', 'qes', 'le', 'l2', 'r2'] as const) expect(rel(r.params[k]!, p[k])).toBeLessThan(1e-3);
    expect(r.residual.rmsPhaseDeg).toBeLessThan(0.01);
  });

  it('reaches the same least-squares minimum as Nelder–Mead (fmin) on perturbed data', () => {
    // Cross-check with the general-purpose optimiser of the npm "fmin" package on the same objective.
    const truth = { re: 6.2, fs: 35, qms: 3.5, qes: 0.42, le: 6e-4 };
    const f = grid(120, 10, 10000);
    const c = impedanceCurve(truth, f);
    // Deterministic ±1 % ripple so the minimum is not the generating point.
    const mag = c.magnitude.map((m, i) => m * (1 + 0.01 * Math.sin(i * 1.7)));
    const lm = fitImpedance(f, mag, null);
    const names = ['re', 'fs', 'qms', 'qes', 'le'] as const;
    const objective = (v: number[]): number => {
      const p = { re: Math.exp(v[0]), fs: Math.exp(v[1]), qms: Math.exp(v[2]), qes: Math.exp(v[3]), le: Math.exp(v[4]) };
      let s = 0;
      for (let i = 0; i < f.length; i++) s += (Math.log(referenceZ(p, f[i]).abs()) - Math.log(mag[i])) ** 2;
      return s;
    };
    // fmin 0.0.4's shrink step assigns an undeclared loop variable `i`, which throws in strict mode;
    // a global of that name lets the library run unchanged.
    (globalThis as { i?: number }).i = 0;
    const nm = nelderMead(objective, names.map((k) => Math.log(lm.initial[k]!)), { maxIterations: 20000, minErrorDelta: 1e-14, minTolerance: 1e-12 });
    expect(objective(names.map((k) => Math.log(lm.params[k]!)))).toBeLessThanOrEqual(nm.fx * (1 + 1e-6) + 1e-12);
    names.forEach((k, i) => expect(rel(lm.params[k]!, Math.exp(nm.x[i]))).toBeLessThan(5e-3));
    expect(lm.residual.rmsMagnitudeDb).toBeGreaterThan(0.01);
    expect(lm.residual.rmsMagnitudeDb).toBeLessThan(0.1);
  });

  it('rejects mismatched arrays', () => {
    expect(() => fitImpedance([1, 2, 3, 4, 5], [1, 2, 3], null)).toThrow(AcousticsInputError);
  });
});
