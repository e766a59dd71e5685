import { logFrequencyGrid } from '../acoustics/curves';
import { onCommonGrid, PREVIEW_MAX_POINTS, previewPoints, thinPoints } from './preview';

// A dense sweep, 20 Hz to 20 kHz, far more points than the grid has.
const n = 20_000;
const x = Array.from({ length: n }, (_, i) => 20 * Math.pow(1000, i / (n - 1)));

describe('upload previews', () => {
  it('puts an acoustic curve on the common 1/48-octave grid, inside the measured span only', () => {
    // Values are kept to 6 significant figures, hence 2 decimals below.
    // y linear in log10(f): linear interpolation in log frequency reproduces it exactly
    // (the interpolant is exact for functions linear in its variable; common practice, no source).
    const y = x.map((f) => 80 + 6 * Math.log10(f));
    const phase = x.map((f) => -45 * Math.log10(f));
    const p = previewPoints('spl', { x, y, phase });
    const grid = logFrequencyGrid().filter((f) => f >= 20 && f <= 20_000);
    expect(p.x).toHaveLength(grid.length);
    p.x.forEach((f, i) => expect(f).toBeCloseTo(grid[i], 1));
    p.x.forEach((f, i) => expect(p.y[i]).toBeCloseTo(80 + 6 * Math.log10(f), 2));
    p.x.forEach((f, i) => expect(p.phase?.[i]).toBeCloseTo(-45 * Math.log10(f), 1));
  });

  it('adds the level shift it is given (SPL referred to 2.83 V / 1 m on submit)', () => {
    const flat = onCommonGrid({ x, y: x.map(() => 90), phase: null }, -12.04);
    expect(new Set(flat.y)).toEqual(new Set([77.96]));
    expect(flat.phase).toBeNull();
  });

  it('thins other kinds to a bounded number of points, keeping both ends', () => {
    const xs = Array.from({ length: 5001 }, (_, i) => -0.01 + (i * 0.02) / 5000);
    const p = previewPoints('bl_x', { x: xs, y: xs.map((v) => 5 - v * v), phase: null });
    expect(p.x).toHaveLength(PREVIEW_MAX_POINTS);
    expect(p.x[0]).toBe(xs[0]);
    expect(p.x[p.x.length - 1]).toBe(xs[xs.length - 1]);
    // Every kept point is one that was read, with its own value.
    p.x.forEach((v, i) => expect(p.y[i]).toBe(5 - v * v));
    for (let i = 1; i < p.x.length; i++) expect(p.x[i]).toBeGreaterThan(p.x[i - 1]);
  });

  it('leaves a short curve as it is', () => {
    const short = { x: [0, 1, 2], y: [3, 4, 5], phase: null };
    expect(thinPoints(short)).toEqual(short);
  });
});
