import { computeGeometry } from './chart-math';
import { createChartCursor, frequencyAtOffset } from './chart-cursor';

describe('shared chart cursor', () => {
  it('tells every subscriber about a change, once, and not about a repeat', () => {
    const c = createChartCursor();
    const a = jest.fn();
    const b = jest.fn();
    const off = c.subscribe(a);
    c.subscribe(b);
    c.set(1000);
    c.set(1000);
    expect(c.get()).toBe(1000);
    expect(a).toHaveBeenCalledTimes(1);
    off();
    c.set(null);
    expect(a).toHaveBeenCalledTimes(1);
    expect(b).toHaveBeenCalledTimes(2);
  });
});

describe('frequency under a pointer', () => {
  // 1054 px wide with the default padding (40 left, 14 right) leaves a 1000 px plot for 20 Hz–20 kHz.
  const g = computeGeometry([], { width: 1054, height: 200, xDomain: [20, 20000], yDomain: [0, 1] });

  it('reads a log axis: equal distances are equal frequency ratios', () => {
    // On a log axis position is proportional to log f (definition of the scale, no source): the
    // midpoint of 20 Hz–20 kHz is their geometric mean, a third of the way is one decade up.
    expect(frequencyAtOffset(g, 0)).toBeCloseTo(20, 6);
    expect(frequencyAtOffset(g, 500)).toBeCloseTo(Math.sqrt(20 * 20000), 6);
    expect(frequencyAtOffset(g, 1000 / 3)).toBeCloseTo(200, 6);
    expect(frequencyAtOffset(g, 1000)).toBeCloseTo(20000, 6);
  });

  it('holds a drag that runs past the plot at its ends', () => {
    expect(frequencyAtOffset(g, -80)).toBeCloseTo(20, 6);
    expect(frequencyAtOffset(g, 1400)).toBeCloseTo(20000, 6);
  });

  it('rises from left to right, so a finger moving right reads higher', () => {
    const fs = [0, 100, 250, 600, 999].map((px) => frequencyAtOffset(g, px));
    for (let i = 1; i < fs.length; i++) expect(fs[i]).toBeGreaterThan(fs[i - 1]);
  });
});
