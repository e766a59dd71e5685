import fc from 'fast-check';
import { airProperties } from './constants';
import { motionalElements } from './impedance';
import { completeThieleSmall, pistonAirLoadMass, referenceEfficiency, sensitivity1W } from './thiele-small';

const air = airProperties(20);
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

// A physically plausible driver drawn from ranges typical of 1"–15" units (common practice, no source).
const driverArb = fc.record({
  fs: fc.double({ min: 15, max: 1500, noNaN: true }),
  qms: fc.double({ min: 1, max: 15, noNaN: true }),
  qes: fc.double({ min: 0.2, max: 2, noNaN: true }),
  re: fc.double({ min: 2, max: 16, noNaN: true }),
  sd: fc.double({ min: 5e-4, max: 0.09, noNaN: true }),
  vas: fc.double({ min: 1e-4, max: 0.5, noNaN: true }),
  xmax: fc.double({ min: 1e-4, max: 0.02, noNaN: true }),
});

describe('completeThieleSmall', () => {
  it('derives the mechanical set with textbook formulas', () => {
    // Small (JAES 1972): Cms = Vas/(ρc²Sd²), Mms = 1/((2πfs)²Cms), Rms = 2πfs·Mms/Qms, Bl² = 2πfs·Mms·Re/Qes.
    const input = { fs: 30, qms: 5, qes: 0.4, re: 6, sd: 0.0133, vas: 0.08, xmax: 0.006 };
    const r = completeThieleSmall(input);
    const cms = input.vas / (air.rho * air.c ** 2 * input.sd ** 2);
    const mms = 1 / ((2 * Math.PI * input.fs) ** 2 * cms);
    const rms = (2 * Math.PI * input.fs * mms) / input.qms;
    const bl = Math.sqrt((2 * Math.PI * input.fs * mms * input.re) / input.qes);
    expect(rel(r.values.cms!, cms)).toBeLessThan(1e-12);
    expect(rel(r.values.mms!, mms)).toBeLessThan(1e-12);
    expect(rel(r.values.rms!, rms)).toBeLessThan(1e-12);
    expect(rel(r.values.bl!, bl)).toBeLessThan(1e-12);
    expect(rel(r.values.kms!, 1 / cms)).toBeLessThan(1e-12);
    // Thiele (1971): Qts = Qms·Qes/(Qms + Qes).
    expect(r.values.qts).toBeCloseTo((5 * 0.4) / 5.4, 12);
    // Common practice, no source: EBP = fs/Qes, Vd = Sd·Xmax.
    expect(r.values.ebp).toBeCloseTo(75, 10);
    expect(r.values.vd).toBeCloseTo(0.0133 * 0.006, 14);
    // Diameter of the equivalent piston: Sd = πD²/4.
    expect(r.values.diameter).toBeCloseTo(Math.sqrt((4 * 0.0133) / Math.PI), 12);
    expect(r.warnings).toEqual([]);
  });

  it('gives the 1 W / 1 m sensitivity as 112 + 10·log10(η0)', () => {
    // Small (JAES 1972): SPL(1 W, 1 m, half space) ≈ 112.1 + 10·log10 η0 dB (constant value from memory).
    const r = completeThieleSmall({ fs: 30, qes: 0.4, qms: 5, vas: 0.1, re: 6 });
    const eta0 = r.values.eta0!;
    // Small (JAES 1972): η0 = 4π²·fs³·Vas/(c³·Qes), computed here by hand.
    expect(rel(eta0, (4 * Math.PI ** 2 * 30 ** 3 * 0.1) / (343.2 ** 3 * 0.4))).toBeLessThan(1e-9);
    expect(Math.abs(r.values.spl1w! - (112.1 + 10 * Math.log10(eta0)))).toBeLessThan(0.15);
  });

  it('refers 2.83 V sensitivity to 1 W through Re', () => {
    // Common practice, no source: 2.83 V is 1 W into 8 Ω; into 4 Ω it is 2 W, +3 dB.
    const r8 = completeThieleSmall({ fs: 40, qes: 0.4, vas: 0.05, re: 8 });
    expect(r8.values.spl283v! - r8.values.spl1w!).toBeCloseTo(0, 2);
    const r4 = completeThieleSmall({ fs: 40, qes: 0.4, vas: 0.05, re: 4 });
    expect(r4.values.spl283v! - r4.values.spl1w!).toBeCloseTo(3.01, 1);
  });

  it('agrees between the two forms of η0', () => {
    // Small (JAES 1972): 4π²fs³Vas/(c³Qes) = ρ·Bl²·Sd²/(2π·c·Re·Mms²).
    fc.assert(
      fc.property(driverArb, (d) => {
        const r = completeThieleSmall(d);
        const v = r.values;
        const mech = (air.rho * v.bl! ** 2 * v.sd! ** 2) / (2 * Math.PI * air.c * v.re! * v.mms! ** 2);
        expect(rel(v.eta0!, mech)).toBeLessThan(1e-9);
        expect(r.warnings).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });

  it('round-trips: electrical set → mechanical set → electrical set', () => {
    fc.assert(
      fc.property(driverArb, (d) => {
        const first = completeThieleSmall(d).values;
        const back = completeThieleSmall({ re: d.re, sd: d.sd, mms: first.mms, kms: first.kms, rms: first.rms, bl: first.bl }).values;
        for (const k of ['fs', 'qms', 'qes', 'vas', 'qts'] as const) expect(rel(back[k]!, first[k]!)).toBeLessThan(1e-9);
        const viaQts = completeThieleSmall({ fs: d.fs, qts: first.qts, qms: d.qms, re: d.re, sd: d.sd, vas: d.vas }).values;
        expect(rel(viaQts.qes!, d.qes)).toBeLessThan(1e-9);
        expect(rel(viaQts.bl!, first.bl!)).toBeLessThan(1e-9);
      }),
      { numRuns: 300 },
    );
  });

  it('uses the air load of a baffled piston on both sides for Mmd', () => {
    // Beranek & Mellow: low-frequency radiation mass of a baffled piston is 8ρa³/3 per side.
    const a = 0.1;
    expect(pistonAirLoadMass(Math.PI * a * a)).toBeCloseTo((16 / 3) * 1.204 * a ** 3, 4);
    const r = completeThieleSmall({ mmd: 0.02, sd: Math.PI * a * a });
    expect(r.values.mms! - 0.02).toBeCloseTo((16 / 3) * air.rho * a ** 3, 12);
    const back = completeThieleSmall({ mms: r.values.mms, sd: Math.PI * a * a });
    expect(back.values.mmd).toBeCloseTo(0.02, 12);
  });

  it('gives motional elements that match the impedance model', () => {
    // Res = Bl²/Rms = Re·Qms/Qes, Lces = Bl²·Cms, Cmes = Mms/Bl² (Beranek & Mellow, mobility analogy).
    const d = { fs: 55, qms: 3, qes: 0.5, re: 5.5, sd: 0.022, vas: 0.03 };
    const v = completeThieleSmall(d).values;
    const m = motionalElements(d);
    expect(rel(v.res!, m.res)).toBeLessThan(1e-12);
    expect(rel(v.lces!, m.lces)).toBeLessThan(1e-12);
    expect(rel(v.cmes!, m.cmes)).toBeLessThan(1e-12);
  });

  it('states where each derived value came from', () => {
    const r = completeThieleSmall({ fs: 30, qms: 5, qes: 0.4, re: 6, sd: 0.0133, vas: 0.08 });
    expect(r.provenance.fs).toEqual({ source: 'input', from: [], inputs: ['fs'], formula: 'given' });
    expect(r.provenance.cms?.source).toBe('derived');
    expect(r.provenance.cms?.inputs.sort()).toEqual(['sd', 'vas']);
    expect(r.provenance.bl?.inputs.sort()).toEqual(['fs', 'qes', 're', 'sd', 'vas']);
    expect(r.provenance.qts?.inputs.sort()).toEqual(['qes', 'qms']);
    expect(r.missing).toEqual(expect.arrayContaining(['le', 'xmax', 'vd']));
    expect(r.missing).not.toContain('bl');
  });

  it('reports a Qts that disagrees with Qms and Qes', () => {
    // Thiele (1971): Qts = Qms·Qes/(Qms+Qes) = 0.370 here, so 0.39 is 5 % off.
    const r = completeThieleSmall({ qms: 5, qes: 0.4, qts: 0.39 });
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0].fields).toEqual(['qts', 'qms', 'qes']);
    expect(r.warnings[0].relativeError).toBeCloseTo(0.39 / ((5 * 0.4) / 5.4) - 1, 6);
    // A Qts above Qes is impossible and is reported on its own as well.
    const worse = completeThieleSmall({ qms: 5, qes: 0.4, qts: 0.45 });
    expect(worse.warnings.map((w) => w.relation)).toEqual(['qts = qms·qes/(qms+qes)', 'qts < qes']);
    const ok = completeThieleSmall({ qms: 5, qes: 0.4, qts: (5 * 0.4) / 5.4 });
    expect(ok.warnings).toEqual([]);
  });

  it('reports an fs that disagrees with Mms and Cms, and an impossible Qts', () => {
    const cms = 1e-3;
    const mms = 0.02;
    const fsTrue = 1 / (2 * Math.PI * Math.sqrt(mms * cms));
    const r = completeThieleSmall({ fs: fsTrue * 1.1, mms, cms });
    expect(r.warnings.map((w) => w.fields[0])).toEqual(['fs']);
    const bad = completeThieleSmall({ qts: 0.6, qms: 0.5 });
    expect(bad.warnings.some((w) => w.relation === 'qts < qms')).toBe(true);
    expect(bad.values.qes).toBeUndefined();
  });

  it('rejects non-positive inputs', () => {
    expect(() => completeThieleSmall({ fs: -1 })).toThrow(RangeError);
  });

  it('exposes the η0 and sensitivity helpers consistently with the completion', () => {
    const r = completeThieleSmall({ fs: 45, qes: 0.35, vas: 0.04 });
    expect(referenceEfficiency(45, 0.04, 0.35)).toBeCloseTo(r.values.eta0!, 15);
    expect(sensitivity1W(r.values.eta0!)).toBeCloseTo(r.values.spl1w!, 12);
  });
});
