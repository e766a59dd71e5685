import Complex from 'complex.js';
import fc from 'fast-check';
import { airProperties } from './constants';
import {
  b4RequiredQts,
  closedBox,
  closedBoxResponseDb,
  excursionLimitedSpl,
  findF3,
  infiniteBaffleResponseDb,
  ventedBox,
  ventedBoxResponseDb,
  ventedOutputPerCone,
} from './enclosures';
import { AcousticsInputError } from './errors';

const logGrid = (n: number, f0: number, f1: number): number[] => Array.from({ length: n }, (_, i) => f0 * Math.pow(f1 / f0, i / (n - 1)));

/**
 * Independent reference: the acoustic impedance-analogy circuit of Small (JAES 1972, 1973), solved
 * with complex.js. Normalised driver (Mas = 1, source pressure 1); Cas from fs, total Ras from Qts;
 * box compliance Cab = Cas/α; port mass for fb; leak Ral = QL/(ωb·Cab).
 */
function circuit(fs: number, qts: number, alpha: number, box: 'ib' | 'closed' | { fb: number; ql: number }, f: number) {
  const j = new Complex(0, 1);
  const w = 2 * Math.PI * f;
  const ws = 2 * Math.PI * fs;
  const mas = 1;
  const cas = 1 / (ws * ws * mas);
  const ras = (ws * mas) / qts;
  const cab = cas / alpha;
  let zbox = new Complex(0);
  let outPerCone = new Complex(1);
  if (box === 'closed') zbox = j.mul(w * cab).inverse();
  if (typeof box === 'object') {
    const wb = 2 * Math.PI * box.fb;
    const map = 1 / (wb * wb * cab);
    const ral = box.ql / (wb * cab);
    const ybox = j.mul(w * cab).add(j.mul(w * map).inverse()).add(Number.isFinite(box.ql) ? 1 / ral : 0);
    zbox = ybox.inverse();
    outPerCone = j.mul(w * cab).mul(zbox);
  }
  const zs = new Complex(ras).add(j.mul(w * mas)).add(j.mul(w * cas).inverse());
  const ud = new Complex(1).div(zs.add(zbox));
  const g = j.mul(w * mas).mul(ud).mul(outPerCone);
  return { g, outPerCone };
}

describe('closed box (Small, JAES 1972)', () => {
  it('matches the acoustic circuit for any driver and volume', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 15, max: 200, noNaN: true }),
        fc.double({ min: 0.2, max: 1.2, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.double({ min: 0.05, max: 20, noNaN: true }),
        (fs, qts, alpha, k) => {
          const box = closedBox({ fs, qts, vas: alpha, vb: 1 });
          const f = fs * k;
          const ours = closedBoxResponseDb(box, [f])[0];
          const ref = 20 * Math.log10(circuit(fs, qts, alpha, 'closed', f).g.abs());
          expect(ours).toBeCloseTo(ref, 8);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('gives f3/fc of 1.554, 1.000 and 0.786 for Qtc of 0.5, 0.707 and 1.0', () => {
    // Small (JAES 1972), closed-box F3 table (values from memory).
    const f3 = (qtc: number) => {
      const b = closedBox({ fs: 30, qts: qtc / Math.sqrt(2), vas: 1, vb: 1 });
      return b.f3 / b.fc;
    };
    expect(f3(0.5)).toBeCloseTo(1.554, 3);
    expect(f3(Math.SQRT1_2)).toBeCloseTo(1.0, 6);
    expect(f3(1.0)).toBeCloseTo(0.786, 3);
  });

  it('has a 1.25 dB peak at Qtc = 1 and none at Qtc ≤ 0.707', () => {
    // Small (JAES 1972): Gmax = Qtc²/√(Qtc² − 1/4) → 1.25 dB at Qtc = 1 (value from memory).
    const b = closedBox({ fs: 30, qts: 1 / Math.sqrt(2), vas: 1, vb: 1 });
    expect(b.qtc).toBeCloseTo(1, 12);
    expect(b.peakDb).toBeCloseTo(1.25, 2);
    // Numerical check on a dense response curve.
    const curve = closedBoxResponseDb(b, logGrid(20000, 10, 400));
    expect(Math.max(...curve)).toBeCloseTo(b.peakDb, 4);
    expect(closedBox({ fs: 30, qts: 0.5, vas: 1, vb: 1 }).peakDb).toBe(0);
  });

  it('finds the volume for a target Qtc and gives that Qtc back', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 0.6, noNaN: true }), fc.double({ min: 1.05, max: 4, noNaN: true }), (qts, ratio) => {
        const b = closedBox({ fs: 40, qts, vas: 0.05, qtc: qts * ratio });
        expect(b.qtc).toBeCloseTo(qts * ratio, 10);
        // Small (1972): α = (Qtc/Qts)² − 1.
        expect(b.alpha).toBeCloseTo(ratio * ratio - 1, 10);
        const f3 = findF3((f) => closedBoxResponseDb(b, [f])[0], b.fc);
        expect(b.f3 / f3).toBeCloseTo(1, 6);
      }),
      { numRuns: 200 },
    );
  });

  it('rejects a target Qtc at or below Qts', () => {
    expect(() => closedBox({ fs: 40, qts: 0.5, vas: 0.05, qtc: 0.4 })).toThrow(AcousticsInputError);
  });
});

describe('infinite baffle', () => {
  it('is the driver alone: the circuit with no box', () => {
    const fs = 35;
    const qts = 0.45;
    const f = logGrid(40, 5, 500);
    const ours = infiniteBaffleResponseDb(fs, qts, f);
    f.forEach((x, i) => expect(ours[i]).toBeCloseTo(20 * Math.log10(circuit(fs, qts, 1, 'ib', x).g.abs()), 8));
  });
});

describe('vented box (Small, JAES 1973)', () => {
  it('matches the acoustic circuit with leakage for any tuning', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 0.6, noNaN: true }),
        fc.double({ min: 0.3, max: 6, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        fc.oneof(fc.constant(Infinity), fc.double({ min: 3, max: 30, noNaN: true })),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        (qts, alpha, h, ql, k) => {
          const fs = 30;
          const p = { fs, qts, vas: alpha, vb: 1, fb: h * fs, ql };
          const f = fs * k;
          const ref = circuit(fs, qts, alpha, { fb: h * fs, ql }, f);
          expect(ventedBoxResponseDb(p, [f])[0]).toBeCloseTo(20 * Math.log10(ref.g.abs()), 7);
          expect(Math.abs(ventedOutputPerCone(h * fs, ql, f).re - ref.outPerCone.re)).toBeLessThan(1e-9 * ref.outPerCone.abs());
          expect(Math.abs(ventedOutputPerCone(h * fs, ql, f).im - ref.outPerCone.im)).toBeLessThan(1e-9 * ref.outPerCone.abs());
        },
      ),
      { numRuns: 500 },
    );
  });

  it('B4, lossless: h = 1, α = 1.414, Qts = 0.383, f3 = fs', () => {
    // Thiele (JAES 1971) alignment table, B4 (values from memory).
    const r = ventedBox({ fs: 30, qts: b4RequiredQts(), vas: 0.1, alignment: 'B4' });
    expect(r.h).toBe(1);
    expect(r.fb).toBe(30);
    expect(r.qtsB4).toBeCloseTo(0.383, 3);
    expect(r.alpha).toBeCloseTo(1.414, 3);
    expect(r.vb).toBeCloseTo(0.1 / Math.SQRT2, 6);
    expect(r.f3 / 30).toBeCloseTo(1, 6);
  });

  it('B4 has the fourth-order Butterworth magnitude, with and without leakage', () => {
    // Butterworth: |G(jω)|² = ω⁸/(1 + ω⁸), ω normalised to the alignment's f0 = √(fs·fb).
    for (const ql of [Infinity, 7, 15]) {
      const fs = 30;
      const probe = ventedBox({ fs, qts: 0.4, vas: 0.1, alignment: 'B4', ql, b4Tolerance: 0.2 });
      const qts = probe.qtsB4;
      const r = ventedBox({ fs, qts, vas: 0.1, alignment: 'B4', ql });
      const alpha = 0.1 / r.vb;
      for (const k of [0.3, 0.7, 1, 1.4, 3]) {
        const f = k * Math.sqrt(fs * r.fb);
        const g2 = circuit(fs, qts, alpha, { fb: r.fb, ql }, f).g.abs() ** 2;
        expect(g2).toBeCloseTo(k ** 8 / (1 + k ** 8), 9);
      }
    }
  });

  it('QB3 has |G|² = ω⁸/(ω⁸ + B·ω² + 1), with and without leakage', () => {
    // Thiele (1971) / Small (1973): quasi-Butterworth third order; checked on the independent circuit.
    fc.assert(
      fc.property(fc.double({ min: 0.18, max: 0.37, noNaN: true }), fc.oneof(fc.constant(Infinity), fc.double({ min: 5, max: 20, noNaN: true })), (qts, ql) => {
        const fs = 40;
        const r = ventedBox({ fs, qts, vas: 0.05, alignment: 'QB3', ql });
        expect(r.b).toBeGreaterThanOrEqual(0);
        const alpha = 0.05 / r.vb;
        const f0 = Math.sqrt(fs * r.fb);
        for (const k of [0.4, 0.8, 1.3, 2.5]) {
          const g2 = circuit(fs, qts, alpha, { fb: r.fb, ql }, k * f0).g.abs() ** 2;
          expect((1 / g2 - 1) * k ** 8).toBeCloseTo(r.b * k * k + 1, 6);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('QB3 meets B4 at Qts = 0.383 and needs a larger box tuned higher as Qts falls', () => {
    const b4 = ventedBox({ fs: 30, qts: 0.3826, vas: 0.1, alignment: 'QB3' });
    expect(b4.h).toBeCloseTo(1, 2);
    expect(b4.alpha).toBeCloseTo(Math.SQRT2, 2);
    const low = ventedBox({ fs: 30, qts: 0.3, vas: 0.1, alignment: 'QB3' });
    expect(low.h).toBeGreaterThan(1);
    expect(low.alpha).toBeGreaterThan(Math.SQRT2);
  });

  it('refuses alignments the driver cannot make', () => {
    expect(() => ventedBox({ fs: 30, qts: 0.5, vas: 0.1, alignment: 'B4' })).toThrow(AcousticsInputError);
    try {
      ventedBox({ fs: 30, qts: 0.45, vas: 0.1, alignment: 'QB3' });
      throw new Error('expected a throw');
    } catch (e) {
      expect(e).toBeInstanceOf(AcousticsInputError);
      expect((e as AcousticsInputError).field).toBe('qts');
    }
  });
});

describe('excursion-limited SPL', () => {
  const air = airProperties(20);

  it('equals ρ·f·U/r for a half-space source of peak volume velocity U = ω·Vd', () => {
    // Beranek & Mellow: a small baffled piston radiates p = jωρU/(2πr) into half space, |p| = ρ·f·U/r.
    const sd = 0.05;
    const xmax = 0.008;
    const f = 40;
    const spl = excursionLimitedSpl({ sd, xmax, frequencies: [f], enclosure: { kind: 'closed' } })[0];
    const pPeak = (air.rho * f * (2 * Math.PI * f * sd * xmax)) / 1;
    expect(spl).toBeCloseTo(20 * Math.log10(pPeak / Math.SQRT2 / 20e-6), 9);
  });

  it('rises 12 dB per octave and 6 dB per doubling of Vd in a sealed box', () => {
    // Beranek & Mellow: p ∝ ω²·Vd for fixed excursion.
    const [a, b] = excursionLimitedSpl({ sd: 0.03, xmax: 0.005, frequencies: [30, 60], enclosure: { kind: 'infinite-baffle' } });
    expect(b - a).toBeCloseTo(20 * Math.log10(4), 9);
    const doubled = excursionLimitedSpl({ sd: 0.03, xmax: 0.01, frequencies: [30], enclosure: { kind: 'closed' } })[0];
    expect(doubled - a).toBeCloseTo(20 * Math.log10(2), 9);
  });

  it('is raised near fb in a vented box by the cone unloading, and tends to the sealed value far above', () => {
    // Small (JAES 1973): cone excursion has a minimum at fb; output per cone displacement = |U0/UD|.
    const base = { sd: 0.03, xmax: 0.005 };
    const freqs = [35, 400];
    const vented = excursionLimitedSpl({ ...base, frequencies: freqs, enclosure: { kind: 'vented', fb: 35, ql: 7 } });
    const sealed = excursionLimitedSpl({ ...base, frequencies: freqs, enclosure: { kind: 'closed' } });
    expect(vented[0] - sealed[0]).toBeCloseTo(20 * Math.log10(7), 6);
    expect(vented[1] - sealed[1]).toBeLessThan(0.1);
  });
});
