import { besselj } from 'bessel';
import fc from 'fast-check';
import { airProperties } from './constants';
import { baffledPistonSpl, beamingFrequencies, pistonDirectivity, pistonDirectivityDb } from './piston';

describe('piston directivity (Beranek & Mellow, baffled rigid piston)', () => {
  it('is 1 on axis and at ka → 0', () => {
    expect(pistonDirectivity(5, 0)).toBe(1);
    expect(pistonDirectivity(1e-9, 90)).toBeCloseTo(1, 12);
  });

  it('has its first null at ka·sinθ = 3.832', () => {
    // Beranek & Mellow: first zero of J1, ka·sinθ = 3.8317.
    expect(Math.abs(pistonDirectivity(3.8317059702, 90))).toBeLessThan(1e-7);
  });

  it('is 3 dB down at ka·sinθ ≈ 1.62 and 6 dB down at ≈ 2.22', () => {
    // Beranek & Mellow: half-power beamwidth of a piston at ka·sinθ = 1.616; −6 dB at 2.215 (values from memory).
    expect(20 * Math.log10(pistonDirectivity(1.616, 90))).toBeCloseTo(-3, 1);
    expect(20 * Math.log10(pistonDirectivity(2.215, 90))).toBeCloseTo(-6, 1);
  });

  it('agrees with 2·J1(x)/x from the bessel npm package', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 40, noNaN: true }), fc.double({ min: 1, max: 90, noNaN: true }), (ka, deg) => {
        const x = ka * Math.sin((deg * Math.PI) / 180);
        expect(Math.abs(pistonDirectivity(ka, deg) - (2 * besselj(x, 1)) / x)).toBeLessThan(5e-7);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('beaming onset', () => {
  it('half-wavelength rule c/(2D) and ka = 1 for a 6.5 inch cone', () => {
    // Common practice, no source: c ≈ 13,500 in/s, f = c/(2D) and f(ka = 1) = c/(πD).
    const d = 6.5 * 0.0254;
    const b = beamingFrequencies(d);
    expect(b.halfWaveHz / (13500 / (2 * 6.5))).toBeCloseTo(1, 2);
    expect(b.ka1Hz / (13500 / (Math.PI * 6.5))).toBeCloseTo(1, 2);
  });

  it('moves with temperature through the speed of sound', () => {
    // ISO 9613-1: c ∝ √T.
    expect(beamingFrequencies(0.1, 30).halfWaveHz / beamingFrequencies(0.1, 0).halfWaveHz).toBeCloseTo(Math.sqrt(303.15 / 273.15), 12);
  });
});

describe('baffled piston SPL', () => {
  it('gives |p| = ρ·f·U/r on axis', () => {
    // Beranek & Mellow: p = jωρU/(2πr)·D(θ).
    const air = airProperties(20);
    const spl = baffledPistonSpl(1e-3, 100, 0.1, 1, 0, air);
    expect(spl).toBeCloseTo(20 * Math.log10((air.rho * 100 * 1e-3) / 20e-6), 9);
    expect(baffledPistonSpl(1e-3, 5000, 0.1, 1, 60, air) - baffledPistonSpl(1e-3, 5000, 0.1, 1, 0, air)).toBeCloseTo(pistonDirectivityDb(5000, 0.1, 60, air), 9);
  });
});
