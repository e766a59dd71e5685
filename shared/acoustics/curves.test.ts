import fc from 'fast-check';
import {
  fractionalOctaveBand,
  fractionalOctaveBands,
  interpolateLog,
  logFrequencyGrid,
  logFrequencyMean,
  resampleLog,
  smoothFractionalOctave,
} from './curves';
import { AcousticsInputError } from './errors';

describe('logFrequencyGrid', () => {
  it('defaults to 1/48 octave from 10 Hz to 40 kHz', () => {
    const g = logFrequencyGrid();
    expect(g[0]).toBe(10);
    expect(g[1] / g[0]).toBeCloseTo(Math.pow(2, 1 / 48), 12);
    expect(g[g.length - 1]).toBeLessThanOrEqual(40000);
    // 48·log2(4000) = 574.3 steps.
    expect(g).toHaveLength(575);
  });
});

describe('resampleLog', () => {
  it('is exact for curves linear in log frequency and never extrapolates', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (slope, offset) => {
        const f = [50, 80, 200, 1000, 5000];
        const y = f.map((x) => offset + slope * Math.log10(x));
        const r = resampleLog(f, y);
        expect(r.frequencies[0]).toBeGreaterThanOrEqual(50);
        expect(r.frequencies[r.frequencies.length - 1]).toBeLessThanOrEqual(5000);
        const worst = Math.max(...r.frequencies.map((x, i) => Math.abs(r.values[i] - (offset + slope * Math.log10(x)))));
        expect(worst).toBeLessThan(1e-9);
        expect(r.frequencies.length).toBeGreaterThan(48 * Math.log2(5000 / 50) - 2);
      }),
      { numRuns: 200 },
    );
    expect(interpolateLog([10, 20], [1, 2], 21)).toBeNull();
    expect(interpolateLog([10, 20], [1, 2], 9.99)).toBeNull();
  });
});

describe('smoothFractionalOctave', () => {
  const f = logFrequencyGrid(48, 20, 20000);

  it('leaves a straight line in log frequency unchanged away from the ends', () => {
    // A symmetric window in log f averages a linear function to its centre value.
    const y = f.map((x) => 3 * Math.log2(x) - 10);
    const s = smoothFractionalOctave(f, y, 3);
    f.forEach((x, i) => {
      if (x > 40 && x < 10000) expect(s[i]).toBeCloseTo(y[i], 9);
    });
  });

  it('averages a ±A ripple of one-octave period to zero at 1/1 octave', () => {
    const y = f.map((x) => 5 * Math.sin(2 * Math.PI * Math.log2(x)));
    const s = smoothFractionalOctave(f, y, 1);
    f.forEach((x, i) => {
      if (x > 40 && x < 10000) expect(Math.abs(s[i])).toBeLessThan(0.01);
    });
  });

  it('averages power in power mode', () => {
    // Power mean of 90 dB and 80 dB halves: 10·log10((1e9 + 1e8)/2) = 87.40 dB.
    const ff = logFrequencyGrid(480, 100, 1000);
    const y = ff.map((x) => (x < Math.sqrt(1e5) ? 90 : 80));
    const i = ff.findIndex((x) => x >= Math.sqrt(1e5));
    const s = smoothFractionalOctave(ff, y, 0.5, 'power');
    expect(s[i]).toBeCloseTo(10 * Math.log10((1e9 + 1e8) / 2), 1);
  });

  it('keeps constants constant and rejects bad fractions', () => {
    const s = smoothFractionalOctave(f, f.map(() => 7), 6);
    s.forEach((v) => expect(v).toBeCloseTo(7, 12));
    expect(() => smoothFractionalOctave(f, f.map(() => 7), 0)).toThrow(AcousticsInputError);
  });
});

describe('IEC 61260-1 fractional-octave bands', () => {
  it('gives octave mid-bands 1000·10^(0.3x) and the nominal labels', () => {
    // IEC 61260-1:2014, base-ten, b = 1: fm = 1000·G^x, G = 10^0.3; nominal 31.5 … 16k (ISO 266).
    const bands = fractionalOctaveBands(1, 25, 20000);
    expect(bands.map((b) => b.nominal)).toEqual([31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000, 16000]);
    expect(fractionalOctaveBand(-1, 1).midband).toBeCloseTo(501.187, 3);
    // Octave band edges at 1 kHz: 707.9 Hz and 1412.5 Hz (G^±½).
    expect(fractionalOctaveBand(0, 1).lower).toBeCloseTo(707.946, 3);
    expect(fractionalOctaveBand(0, 1).upper).toBeCloseTo(1412.54, 2);
  });

  it('gives one-third-octave mid-bands, edges and nominal labels', () => {
    // IEC 61260-1:2014, b = 3: fm = 1000·10^(x/10); edges of the 1 kHz band 891.25 Hz and 1122.02 Hz (values from memory).
    const nominal = fractionalOctaveBands(3, 19, 20000).map((b) => b.nominal);
    expect(nominal).toEqual([
      20, 25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000,
      6300, 8000, 10000, 12500, 16000, 20000,
    ]);
    expect(fractionalOctaveBand(-10, 3).midband).toBeCloseTo(100, 9);
    expect(fractionalOctaveBand(0, 3).lower).toBeCloseTo(891.25, 2);
    expect(fractionalOctaveBand(0, 3).upper).toBeCloseTo(1122.02, 2);
  });

  it('places even-b mid-bands half a band off 1 kHz', () => {
    // IEC 61260-1:2014, even b: fm = fr·G^((2x+1)/(2b)).
    expect(fractionalOctaveBand(0, 6).midband).toBeCloseTo(1000 * Math.pow(10, 0.3 / 12), 9);
    expect(fractionalOctaveBand(-1, 6).upper).toBeCloseTo(1000, 9);
  });

  it('tiles the axis: each upper edge is the next lower edge', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 24 }), fc.integer({ min: -60, max: 60 }), (b, x) => {
        expect(fractionalOctaveBand(x, b).upper / fractionalOctaveBand(x + 1, b).lower).toBeCloseTo(1, 12);
      }),
      { numRuns: 300 },
    );
  });
});

describe('logFrequencyMean', () => {
  it('of a line in log f is its value at the geometric centre', () => {
    const f = [20, 100, 1000, 5000];
    const y = f.map((x) => 2 * Math.log(x));
    expect(logFrequencyMean(f, y, 50, 2000)).toBeCloseTo(2 * Math.log(Math.sqrt(50 * 2000)), 9);
  });
});
