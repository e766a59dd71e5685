// A shared cursor frequency for charts drawn side by side. It is a tiny external store rather than
// React state so that a mouse move re-renders only the cursor lines and the readout, never the
// screen, the chart geometry or the Skia paths.
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
