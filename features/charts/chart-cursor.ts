// A shared cursor frequency for charts drawn side by side. It is a tiny external store rather than
// React state so that a mouse move re-renders only the cursor lines and the readout, never the
// screen, the chart geometry or the Skia paths.
import type { ChartGeometry } from './chart-math';

export interface ChartCursor {
  get: () => number | null;
  set: (f: number | null) => void;
  subscribe: (listener: () => void) => () => void;
}

export function createChartCursor(initial: number | null = null): ChartCursor {
  let value = initial;
  const listeners = new Set<() => void>();
  return {
    get: () => value,
    set: (f) => {
      if (f === value) return;
      value = f;
      listeners.forEach((l) => l());
    },
    subscribe: (l) => {
      listeners.add(l);
      return () => listeners.delete(l);
    },
  };
}

/**
 * The frequency under a point `px` from the plot's left edge. A drag that runs past either end of
 * the plot holds the cursor at that end rather than dropping it, so a finger can overshoot.
 */
export function frequencyAtOffset(geometry: Pick<ChartGeometry, 'plot' | 'x'>, px: number): number {
  const { plot, x } = geometry;
  const w = plot.right - plot.left;
  return x.invert(plot.left + Math.max(0, Math.min(w, px)));
}
