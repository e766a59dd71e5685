import { computeGeometry, formatHz, logFrequencyTicks, logYDomain, nearestIndex, niceStep, niceYDomain } from './chart-math';

describe('computeGeometry', () => {
  const series = [{ id: 'a', x: [20, Math.sqrt(20 * 20000), 20000], y: [70, 80, 90], color: '#000' }];
  const g = computeGeometry(series, { width: 440, height: 240, xDomain: [20, 20000], yDomain: [70, 90], padding: { top: 0, right: 0, bottom: 0, left: 40 } });

  it('places the geometric mean of the x domain at the centre of the plot', () => {
    // A log scale maps log(f) linearly (definition of a logarithmic axis; d3-scale scaleLog docs).
    // sqrt(20 * 20000) = 632.4555 Hz sits halfway between 40 px and 440 px.
    expect(g.x(632.4555)).toBeCloseTo(240, 3);
    expect(g.x(20)).toBeCloseTo(40, 6);
    expect(g.x(20000)).toBeCloseTo(440, 6);
  });

  it('puts one decade on an equal share of the width', () => {
    // Three decades from 20 Hz to 20 kHz over 400 px: 133.3 px per decade.
    expect(g.x(200) - g.x(20)).toBeCloseTo(400 / 3, 6);
    expect(g.x(2000) - g.x(200)).toBeCloseTo(400 / 3, 6);
  });

  it('draws the series as a path through every point', () => {
    const d = g.paths[0].d;
    expect(d.startsWith('M40,240')).toBe(true);
    expect(d).toContain('L240,120');
    expect(d.endsWith('L440,0')).toBe(true);
  });

  it('skips points outside the x domain and non-finite values', () => {
    const g2 = computeGeometry([{ id: 'b', x: [10, 100, 1000, 50000], y: [1, NaN, 3, 4], color: '#000' }], {
      width: 100, height: 100, xDomain: [20, 20000], yDomain: [0, 10],
    });
    expect(g2.paths[0].d.match(/[ML]/g)).toHaveLength(1);
  });
});

describe('ticks and labels', () => {
  it('gives 1-2-5 ticks with decades marked major', () => {
    const ticks = logFrequencyTicks([20, 20000]);
    expect(ticks.map((t) => t.label)).toEqual(['20', '50', '100', '200', '500', '1k', '2k', '5k', '10k', '20k']);
    expect(ticks.filter((t) => t.major).map((t) => t.value)).toEqual([100, 1000, 10000]);
  });

  it('formats kilohertz compactly', () => {
    expect(formatHz(2500)).toBe('2.5k');
    expect(formatHz(315)).toBe('315');
  });

  it('snaps the y range outwards to whole steps with a minimum span', () => {
    expect(niceYDomain([{ id: 'a', x: [1, 2], y: [71.2, 93.9], color: '' }], 5)).toEqual([70, 95]);
    const [a, b] = niceYDomain([{ id: 'a', x: [1], y: [80], color: '' }], 5, 20);
    expect(b - a).toBe(20);
    expect(a).toBeLessThanOrEqual(80);
    expect(b).toBeGreaterThanOrEqual(80);
  });
});

describe('nearestIndex', () => {
  const xs = [100, 200, 400, 800];
  it('finds the closest point in log distance', () => {
    // 282 Hz is just under the geometric mean of 200 and 400 (282.8 Hz), so 200 is nearer.
    expect(nearestIndex(xs, 282)).toBe(1);
    expect(nearestIndex(xs, 284)).toBe(2);
  });
  it('clamps to the ends and handles an empty list', () => {
    expect(nearestIndex(xs, 1)).toBe(0);
    expect(nearestIndex(xs, 1e6)).toBe(3);
    expect(nearestIndex([], 5)).toBe(-1);
  });
});

describe('axis variants', () => {
  it('maps a linear x axis proportionally, for excursion in mm', () => {
    // -5 mm .. +5 mm over 100 px: 0 mm sits at the centre (definition of a linear scale).
    const g = computeGeometry([{ id: 'a', x: [-5, 0, 5], y: [1, 1, 1], color: '#000' }], {
      width: 100, height: 100, xDomain: [-5, 5], yDomain: [0, 2], xScale: 'linear', padding: { top: 0, right: 0, bottom: 0, left: 0 },
    });
    expect(g.x(0)).toBeCloseTo(50, 6);
    expect(g.paths[0].d).toBe('M0,50L50,50L100,50');
    expect(g.xTicks.map((t) => t.value)).toEqual([-4, -2, 0, 2, 4]);
  });

  it('maps a log y axis by decades and drops values a log axis cannot hold', () => {
    const g = computeGeometry([{ id: 'a', x: [100, 1000, 10000], y: [0.1, 0, 10], color: '#000' }], {
      width: 100, height: 200, xDomain: [100, 10000], yScale: 'log', padding: { top: 0, right: 0, bottom: 0, left: 0 },
    });
    // Domain snaps to whole decades, 0.1 % .. 10 %: 1 % sits halfway up.
    expect(g.y.domain()).toEqual([0.1, 10]);
    expect(g.y(1)).toBeCloseTo(100, 6);
    expect(g.paths[0].d.match(/[ML]/g)).toHaveLength(2);
    expect(g.yTicks.filter((t) => t.major).map((t) => t.label)).toEqual(['0.1', '1', '10']);
  });

  it('picks 1-2-5 steps for linear ticks', () => {
    expect(niceStep(10, 5)).toBe(2);
    expect(niceStep(1, 4)).toBeCloseTo(0.5, 9);
    expect(niceStep(70, 6)).toBe(20);
  });

  it('gives a log y domain with a floor when there is no positive value', () => {
    expect(logYDomain([{ id: 'a', x: [1], y: [0], color: '' }])).toEqual([0.01, 10]);
    expect(logYDomain([{ id: 'a', x: [1, 2], y: [0.05, 100.0001], color: '' }])).toEqual([0.01, 100]);
  });
});
