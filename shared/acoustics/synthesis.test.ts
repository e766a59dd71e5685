import { impedanceCurve } from './impedance';
import { excursionLimits } from './large-signal';
import { logFrequencyGrid } from './curves';
import { synthesiseDriverCurves } from './synthesis';
import { completeThieleSmall } from './thiele-small';

const driver = { fs: 38, qms: 4.2, qes: 0.42, re: 5.6, le: 5e-4, bl: 7.2, sd: 0.0215, xmax: 0.006 };
const f = logFrequencyGrid(24, 10, 20000);

describe('synthesiseDriverCurves', () => {
  const syn = synthesiseDriverCurves(driver, { frequencies: f, breakup: { frequency: 4000, q: 3 } });

  it('is deterministic', () => {
    expect(synthesiseDriverCurves(driver, { frequencies: f, breakup: { frequency: 4000, q: 3 } })).toEqual(syn);
  });

  it('gives the same impedance as the lumped model', () => {
    const ts = completeThieleSmall(driver).values;
    const z = impedanceCurve({ re: driver.re, fs: ts.fs!, qms: ts.qms!, qes: ts.qes!, le: driver.le }, f);
    syn.impedance.magnitude.forEach((m, i) => expect(m / z.magnitude[i]).toBeCloseTo(1, 9));
    syn.impedance.phaseDeg.forEach((p, i) => expect(p).toBeCloseTo(z.phaseDeg[i], 6));
  });

  it('matches the Small (1972) 2.83 V sensitivity in the mass-controlled band', () => {
    // Small (JAES 1972): above fs, below beaming and breakup, on-axis SPL = reference sensitivity.
    const ts = completeThieleSmall(driver).values;
    const i = f.findIndex((x) => x >= 300);
    expect(syn.spl[0].spl[i]).toBeCloseTo(ts.spl283v!, 0);
    expect(Math.abs(syn.spl[0].spl[i] - ts.spl283v!)).toBeLessThan(0.5);
  });

  it('keeps off-axis equal to on-axis at low frequency and below it at high frequency', () => {
    const at = (x: number) => f.findIndex((y) => y >= x);
    const on = syn.spl.find((c) => c.angleDeg === 0)!.spl;
    const side = syn.spl.find((c) => c.angleDeg === 90)!.spl;
    expect(Math.abs(on[at(50)] - side[at(50)])).toBeLessThan(0.05);
    expect(on[at(5000)] - side[at(5000)]).toBeGreaterThan(6);
  });

  it('gives the static excursion Bl·V·√2·Cms/Re well below fs', () => {
    // Hooke's law with the DC force Bl·V/Re (Beranek & Mellow): x = F·Cms.
    const ts = completeThieleSmall(driver).values;
    const d = synthesiseDriverCurves(driver, { frequencies: [0.5] }).distortion[0];
    const xStatic = ((driver.bl * d.driveVoltage * Math.SQRT2) / driver.re) * ts.cms!;
    expect(d.excursion[0] / xStatic).toBeCloseTo(1, 2);
  });

  it('raises distortion with drive level and towards low frequency', () => {
    const [low, high] = syn.distortion;
    expect(high.driveVoltage).toBeGreaterThan(low.driveVoltage);
    const i20 = f.findIndex((x) => x >= 20);
    const i1k = f.findIndex((x) => x >= 1000);
    expect(high.thdPercent[i20]).toBeGreaterThan(low.thdPercent[i20]);
    expect(low.thdPercent[i20]).toBeGreaterThan(low.thdPercent[i1k]);
    // THD is the root-sum-square of H2 and H3 here.
    expect(low.thdPercent[i1k]).toBeCloseTo(Math.hypot(low.h2Percent[i1k], low.h3Percent[i1k]), 12);
  });

  it('makes large-signal curves whose limits are the requested ones', () => {
    // The 82 % / 75 % / 10 % criteria read back on the synthetic curves.
    const s = synthesiseDriverCurves(driver, { frequencies: [100], largeSignal: { xBl: 0.007, xC: 0.009, xL: 0.011, points: 401 } });
    const r = excursionLimits({ x: s.largeSignal.x, bl: s.largeSignal.bl, kms: s.largeSignal.kms, le: s.largeSignal.le });
    expect(r.xBl!.limit).toBeCloseTo(0.007, 4);
    expect(r.xC!.limit).toBeCloseTo(0.009, 4);
    expect(r.xL!.limit).toBeCloseTo(0.011, 4);
    expect(r.governedBy).toBe('bl');
  });

  it('refuses a parameter set it cannot complete', () => {
    expect(() => synthesiseDriverCurves({ fs: 40, qts: 0.4 })).toThrow(/cannot synthesise/);
  });
});
