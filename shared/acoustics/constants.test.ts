import fc from 'fast-check';
import { airDensity, airProperties, speedOfSound, P_REF } from './constants';

describe('speed of sound', () => {
  it('is 343.2 m/s at 20 °C', () => {
    // ISO 9613-1:1993: c = 343.2·(T/T0)^½ m/s, T0 = 293.15 K.
    expect(speedOfSound(20)).toBeCloseTo(343.2, 10);
  });

  it('is about 331.3 m/s at 0 °C', () => {
    // Handbook value for dry air at 0 °C, 331.3 m/s (value from memory); ISO 9613-1 gives 331.29.
    expect(speedOfSound(0)).toBeCloseTo(331.3, 1);
  });

  it('matches the trade figure of 13,500 inches per second', () => {
    // Common practice, no source: c ≈ 13,500 in/s at room temperature.
    expect(speedOfSound(20) / 0.0254).toBeGreaterThan(13500 * 0.99);
    expect(speedOfSound(20) / 0.0254).toBeLessThan(13500 * 1.01);
  });

  it('rises with the square root of absolute temperature', () => {
    // ISO 9613-1: c ∝ √T.
    fc.assert(
      fc.property(fc.double({ min: -40, max: 60, noNaN: true }), fc.double({ min: -40, max: 60, noNaN: true }), (a, b) => {
        const ratio = speedOfSound(a) / speedOfSound(b);
        expect(ratio).toBeCloseTo(Math.sqrt((a + 273.15) / (b + 273.15)), 12);
      }),
      { numRuns: 300 },
    );
  });
});

describe('air density', () => {
  it('is 1.2250 kg/m³ at 15 °C and 101 325 Pa', () => {
    // ISO 2533:1975 standard atmosphere, sea-level density 1.2250 kg/m³.
    expect(airDensity(15)).toBeCloseTo(1.225, 4);
  });

  it('is about 1.204 kg/m³ at 20 °C', () => {
    // Handbook value for dry air at 20 °C and 1 atm, 1.204 kg/m³ (value from memory).
    expect(airDensity(20)).toBeCloseTo(1.204, 3);
  });

  it('follows the ideal gas law: ρ·T is constant at fixed pressure', () => {
    // ISO 2533: ρ = p/(R·T).
    fc.assert(
      fc.property(fc.double({ min: -40, max: 60, noNaN: true }), (t) => {
        expect(airDensity(t) * (t + 273.15)).toBeCloseTo(airDensity(0) * 273.15, 8);
      }),
      { numRuns: 200 },
    );
  });

  it('gives a characteristic impedance of about 413 rayl at 20 °C', () => {
    // Beranek & Mellow: ρ0·c ≈ 413 Pa·s/m at 20 °C (value from memory).
    const air = airProperties(20);
    expect(air.rho * air.c).toBeGreaterThan(411);
    expect(air.rho * air.c).toBeLessThan(415);
  });

  it('uses 20 µPa as reference pressure', () => {
    // IEC 60268-5 / ISO 1683 reference sound pressure.
    expect(P_REF).toBe(2e-5);
  });
});
