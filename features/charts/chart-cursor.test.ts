import { createChartCursor } from './chart-cursor';

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
