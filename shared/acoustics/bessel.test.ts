import { besselj } from 'bessel';
import fc from 'fast-check';
import { besselJ1, jinc } from './bessel';

describe('besselJ1 (Abramowitz & Stegun 9.4.4 / 9.4.6)', () => {
  it('matches tabulated values', () => {
    // Abramowitz & Stegun Table 9.1: J1(1) = 0.4400505857, J1(2) = 0.5767248078, J1(5) = −0.3275791376 (values from memory).
    expect(besselJ1(1)).toBeCloseTo(0.4400505857, 7);
    expect(besselJ1(2)).toBeCloseTo(0.5767248078, 7);
    expect(besselJ1(5)).toBeCloseTo(-0.3275791376, 7);
  });

  it('has its first zero at 3.8317', () => {
    // Abramowitz & Stegun Table 9.5: j1,1 = 3.8317059702 (value from memory).
    expect(Math.abs(besselJ1(3.8317059702))).toBeLessThan(2e-7);
    expect(besselJ1(3.8)).toBeGreaterThan(0);
    expect(besselJ1(3.9)).toBeLessThan(0);
  });

  it('agrees with the bessel npm package to 2e-7 on [−60, 60]', () => {
    // Cross-check: npm "bessel" besselj(x, 1).
    fc.assert(
      fc.property(fc.double({ min: -60, max: 60, noNaN: true }), (x) => {
        expect(Math.abs(besselJ1(x) - besselj(x, 1))).toBeLessThan(2e-7);
      }),
      { numRuns: 2000 },
    );
  });

  it('is continuous across the switch between the two approximations at x = 3', () => {
    // A&S 9.4.4 and 9.4.6 both hold at x = 3; their error bounds are below 1e-7.
    expect(Math.abs(besselJ1(3 - 1e-12) - besselJ1(3 + 1e-12))).toBeLessThan(2e-7);
  });

  it('jinc(0) is 1 and jinc is 2·J1(x)/x elsewhere', () => {
    // Limit 2·J1(x)/x → 1 as x → 0 (A&S 9.1.10 series).
    expect(jinc(0)).toBe(1);
    expect(jinc(1e-3)).toBeCloseTo(1 - (1e-3) ** 2 / 8, 10);
    expect(jinc(2)).toBeCloseTo((2 * besselj(2, 1)) / 2, 7);
  });
});
