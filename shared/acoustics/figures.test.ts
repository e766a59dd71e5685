import { besselj } from 'bessel';
import { airProperties } from './constants';
import { logFrequencyGrid } from './curves';
import { beamingOnset, firstBreakupPeak, imdSummary, linearity, meanSensitivity, suggestUsableBand, thdLimitFrequency } from './figures';
import { synthesiseDriverCurves } from './synthesis';

const f = logFrequencyGrid(48, 20, 20000);

describe('band figures', () => {
  it('mean and linearity of a known ripple', () => {
    // 88 dB with a ±2 dB sine over whole periods in log2 f: mean 88, +2 / −2.
    const y = f.map((x) => 88 + 2 * Math.sin(2 * Math.PI * Math.log2(x / 200)));
    expect(meanSensitivity(f, y, 200, 3200)).toBeCloseTo(88, 3);
    const l = linearity(f, y, 200, 3200);
    expect(l.maxUp).toBeCloseTo(2, 2);
    expect(l.maxDown).toBeCloseTo(-2, 2);
    expect(l.maxUpHz).toBeGreaterThan(200);
  });
});

describe('beamingOnset', () => {
  it('finds where the 60° curve is 6 dB below on-axis for a piston', () => {
    // Expected from the bessel npm package: solve 2·J1(x)/x = 10^(−6/20) by bisection, x = ka·sin 60°.
    const d = 0.15;
    const air = airProperties(20);
    const target = Math.pow(10, -6 / 20);
    let lo = 0.5;
    let hi = 3.8;
    for (let i = 0; i < 60; i++) {
      const m = (lo + hi) / 2;
      if ((2 * besselj(m, 1)) / m > target) lo = m;
      else hi = m;
    }
    const expected = (lo * air.c) / (Math.PI * d * Math.sin(Math.PI / 3));
    const on = f.map(() => 90);
    const off = f.map((x) => {
      const k = ((Math.PI * x * d) / air.c) * Math.sin(Math.PI / 3);
      return 90 + 20 * Math.log10(Math.abs((2 * besselj(k, 1)) / k));
    });
    const r = beamingOnset({ diameter: d, onAxis: { frequencies: f, spl: on }, offAxis: { frequencies: f, spl: off } });
    expect(r.measuredHz! / expected).toBeCloseTo(1, 3);
    expect(r.halfWaveHz).toBeCloseTo(air.c / 0.3, 9);
  });
});

describe('firstBreakupPeak', () => {
  it('finds the peak of a second-order resonance at f0·√(1 − 1/(2Q²))', () => {
    // Second-order low-pass magnitude peak (standard filter result).
    const f0 = 5000;
    const q = 4;
    const y = f.map((x) => {
      const u = x / f0;
      return 85 - 10 * Math.log10((1 - u * u) ** 2 + (u / q) ** 2);
    });
    const p = firstBreakupPeak(f, y, 2000, { passBandLowHz: 200 })!;
    const expected = f0 * Math.sqrt(1 - 1 / (2 * q * q));
    expect(Math.abs(Math.log2(p.frequency / expected))).toBeLessThan(1 / 96 + 1e-9);
    expect(p.prominence).toBeGreaterThan(10);
    expect(firstBreakupPeak(f, y, 8000)).toBeNull();
  });
});

describe('thdLimitFrequency', () => {
  it('finds where 0.1 % + 10 %·(50/f)² falls under 1 %', () => {
    // Analytic: 10·(50/f)² = 0.9 → f = 50·√(10/0.9).
    const thd = f.map((x) => 0.1 + 10 * (50 / x) ** 2);
    expect(thdLimitFrequency(f, thd, 1)! / (50 * Math.sqrt(10 / 0.9))).toBeCloseTo(1, 3);
    expect(thdLimitFrequency(f, thd, 0.05)).toBeNull();
  });
});

describe('imdSummary', () => {
  it('reports the maximum and the log-frequency mean', () => {
    const imd = f.map((x) => (x < 1000 ? 2 : 1));
    const s = imdSummary(f, imd, 100, 10000);
    expect(s.maxPercent).toBe(2);
    expect(s.meanPercent).toBeCloseTo(1.5, 2);
    // Common practice, no source: 1 % = −40 dB.
    expect(s.maxDb).toBeCloseTo(-33.98, 2);
  });
});

describe('suggestUsableBand', () => {
  it('gives a band with every candidate reason and one governing edge each', () => {
    const syn = synthesiseDriverCurves(
      { fs: 45, qms: 4, qes: 0.5, re: 5.8, le: 4e-4, bl: 6.5, sd: 0.0133, xmax: 0.005 },
      { frequencies: f, breakup: { frequency: 6000, q: 4 }, anglesDeg: [0, 60] },
    );
    const on = syn.spl[0].spl;
    const band = suggestUsableBand({
      frequencies: f,
      spl: on,
      referenceBand: [300, 2000],
      diameter: 0.13,
      offAxis: { frequencies: f, spl: syn.spl[1].spl, angleDeg: 60 },
      thd: { frequencies: f, percent: syn.distortion[0].thdPercent, limitPercent: 3 },
    });
    expect(band.lowHz).toBeGreaterThan(40);
    expect(band.highHz).toBeLessThan(6000);
    expect(band.highHz).toBeGreaterThan(band.lowHz);
    expect(new Set(band.reasons.map((r) => r.figure))).toEqual(new Set(['response', 'thd', 'beaming', 'breakup']));
    expect(band.reasons.filter((r) => r.governs && r.edge === 'low')).toHaveLength(1);
    expect(band.reasons.filter((r) => r.governs && r.edge === 'high')).toHaveLength(1);
  });
});
