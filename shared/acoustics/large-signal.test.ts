import fc from 'fast-check';
import { AcousticsInputError } from './errors';
import { DEFAULT_EXCURSION_THRESHOLDS, excursionLimits } from './large-signal';

const xs = (n: number, span: number): number[] => Array.from({ length: n }, (_, i) => -span + (2 * span * i) / (n - 1));

describe('excursionLimits', () => {
  it('uses the 82 % / 75 % / 10 % thresholds by default', () => {
    // "Assessment of voice-coil peak displacement Xmax", JAES 51(5), 2003 (values from memory).
    expect(DEFAULT_EXCURSION_THRESHOLDS).toEqual({ blMin: 0.82, cmsMin: 0.75, leVariation: 0.1 });
  });

  it('finds analytic crossings of quadratic Bl(x), Kms(x) and linear Le(x)', () => {
    // Bl = Bl0·(1 − (x/w)²) falls to 82 % at x = w·√0.18; Kms = K0·(1 + (x/v)²) makes Cms 75 % at x = v/√3;
    // Le = L0·(1 − x/d) changes by 10 % at |x| = 0.1·d. Piecewise-linear sampling error only.
    const x = xs(2001, 0.02);
    const w = 0.02;
    const v = 0.015;
    const d = 0.1;
    const r = excursionLimits({
      x,
      bl: x.map((xi) => 7 * (1 - (xi / w) ** 2)),
      kms: x.map((xi) => 1500 * (1 + (xi / v) ** 2)),
      le: x.map((xi) => 1e-3 * (1 - xi / d)),
    });
    expect(r.xBl!.limit).toBeCloseTo(w * Math.sqrt(0.18), 6);
    expect(r.xC!.limit).toBeCloseTo(v / Math.sqrt(3), 6);
    expect(r.xL!.limit).toBeCloseTo(0.1 * d, 6);
    expect(r.xmax).toBeCloseTo(Math.min(w * Math.sqrt(0.18), v / Math.sqrt(3), 0.01), 6);
    // 0.02·√0.18 = 8.49 mm < 0.015/√3 = 8.66 mm < 10 mm.
    expect(r.governedBy).toBe('bl');
    expect(r.xBl!.offset).toBeCloseTo(0, 9);
  });

  it('reports the offset of an asymmetric curve as the centre between the crossings', () => {
    // A curve symmetric about d crosses any level at d ± s, so the centre is d.
    fc.assert(
      fc.property(fc.double({ min: -0.002, max: 0.002, noNaN: true }), fc.double({ min: 0.006, max: 0.012, noNaN: true }), (offset, w) => {
        const x = xs(801, 0.03);
        const r = excursionLimits({ x, bl: x.map((xi) => 5 / (1 + ((xi - offset) / w) ** 2)) });
        expect(r.xBl!.offset).toBeCloseTo(offset, 5);
        expect(r.xBl!.limit).toBeLessThanOrEqual(Math.min(r.xBl!.positive, -r.xBl!.negative) + 1e-15);
      }),
      { numRuns: 200 },
    );
  });

  it('accepts Cms or Kms alike and configurable thresholds', () => {
    const x = xs(401, 0.01);
    const kms = x.map((xi) => 1000 * (1 + (xi / 0.005) ** 2));
    const a = excursionLimits({ x, kms });
    const b = excursionLimits({ x, cms: kms.map((k) => 1 / k) });
    expect(a.xC!.limit).toBeCloseTo(b.xC!.limit, 12);
    const strict = excursionLimits({ x, kms, thresholds: { cmsMin: 0.9 } });
    expect(strict.xC!.limit).toBeLessThan(a.xC!.limit);
    // Cms/Cms0 = 1/(1 + (x/v)²) = 0.9 at x = v·√(1/9).
    expect(strict.xC!.limit).toBeCloseTo(0.005 / 3, 6);
  });

  it('flags a criterion never violated inside the range', () => {
    const x = xs(11, 0.005);
    const r = excursionLimits({ x, bl: x.map(() => 6) });
    expect(r.xBl!.beyondRange).toBe(true);
    expect(r.xBl!.limit).toBeCloseTo(0.005, 12);
  });

  it('rejects unusable inputs', () => {
    expect(() => excursionLimits({ x: [0, 1, 2], bl: [1, 1, 1] })).toThrow(AcousticsInputError);
    expect(() => excursionLimits({ x: [-1, 0, 1], bl: [1, 1] })).toThrow(AcousticsInputError);
    expect(() => excursionLimits({ x: [-1, 0, 1] })).toThrow(AcousticsInputError);
  });
});
