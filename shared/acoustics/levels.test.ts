import fc from 'fast-check';
import { dbToPercent, driveVoltage, normaliseSpl, percentToDb, powerRatioDb, splAtDistance, totalHarmonicDistortion, voltageRatioDb } from './levels';

describe('levels', () => {
  it('2.83 V to 9 V is about +10 dB', () => {
    // Common practice, no source.
    expect(voltageRatioDb(9, 2.83)).toBeCloseTo(10, 0);
    expect(Math.abs(voltageRatioDb(9, 2.83) - 10)).toBeLessThan(0.1);
  });

  it('doubling the drive voltage adds 6 dB', () => {
    // Common practice, no source: 20·log10 2 = 6.02 dB.
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), (v) => {
        expect(voltageRatioDb(2 * v, v)).toBeCloseTo(6.02, 2);
      }),
      { numRuns: 200 },
    );
  });

  it('power ratios are 10·log10: twice the power is +3 dB', () => {
    // IEC 60027-3 level of a power quantity.
    expect(powerRatioDb(2, 1)).toBeCloseTo(3.01, 2);
  });

  it('THD of 1 % is −40 dB, and % ↔ dB round-trips', () => {
    // Common practice, no source: 1 % = −40 dB, 10 % = −20 dB.
    expect(percentToDb(1)).toBeCloseTo(-40, 12);
    expect(percentToDb(10)).toBeCloseTo(-20, 12);
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 100, noNaN: true }), (p) => {
        expect(dbToPercent(percentToDb(p))).toBeCloseTo(p, 9);
      }),
      { numRuns: 500 },
    );
  });

  it('refers distance by the inverse distance law', () => {
    // Inverse distance law, p ∝ 1/r: 0.5 m → 1 m is −6.02 dB, 2 m → 1 m is +6.02 dB.
    expect(splAtDistance(96, 0.5)).toBeCloseTo(96 - 6.0206, 4);
    expect(splAtDistance(84, 2)).toBeCloseTo(84 + 6.0206, 4);
  });

  it('normalises an SPL taken at another drive and distance to 2.83 V / 1 m', () => {
    // 1 W into 8 Ω is 2.83 V (common practice, no source), so the correction is ~0.
    expect(driveVoltage({ power: 1, impedance: 8 })).toBeCloseTo(2.828, 3);
    expect(normaliseSpl(88, { drive: { power: 1, impedance: 8 }, distance: 1 })).toBeCloseTo(88 + 20 * Math.log10(2.83 / Math.sqrt(8)), 9);
    // 2 V at 0.5 m → 2.83 V at 1 m: +3.02 dB for drive, −6.02 dB for distance.
    expect(normaliseSpl(90, { drive: { voltage: 2 }, distance: 0.5 })).toBeCloseTo(90 + 20 * Math.log10(2.83 / 2) - 20 * Math.log10(2), 9);
  });

  it('adds harmonics root-sum-square', () => {
    // IEC 60268-5 total harmonic distortion: √(Σ Hn²).
    expect(totalHarmonicDistortion([3, 4])).toBeCloseTo(5, 12);
  });
});
