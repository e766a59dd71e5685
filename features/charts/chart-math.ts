// Pure chart geometry: scales, SVG path data, ticks and nearest-point lookup. No React, no Skia,
// so it is tested directly and memoised by a hook.
import { scaleLinear, scaleLog, type ScaleLinear, type ScaleLogarithmic } from 'd3-scale';
import { line } from 'd3-shape';

export interface ChartSeries {
  id: string;
  x: readonly number[];
  y: readonly number[];
  color: string;
  /** Dash pattern in pixels; omitted for a solid line. */
  dash?: readonly number[];
  width?: number;
}

export interface Padding {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

export interface ChartOptions {
  width: number;
  height: number;
  xDomain: readonly [number, number];
  /** Fixed y range; computed from the data when omitted. */
  yDomain?: readonly [number, number];
  yStep?: number;
  padding?: Padding;
  yUnit?: string;
}

export interface Tick {
  value: number;
  pos: number;
  label: string;
  major: boolean;
}

export interface ChartGeometry {
  plot: { left: number; top: number; right: number; bottom: number };
  x: ScaleLogarithmic<number, number>;
  y: ScaleLinear<number, number>;
  paths: { id: string; d: string; color: string; dash?: readonly number[]; width: number }[];
  xTicks: Tick[];
  yTicks: Tick[];
}

export const defaultPadding: Padding = { top: 12, right: 14, bottom: 26, left: 40 };

export function formatHz(f: number): string {
  if (f >= 1000) {
    const k = f / 1000;
    return `${Number.isInteger(k) ? k : Number(k.toFixed(1))}k`;
  }
  return `${Number(f.toPrecision(3))}`;
}

/** 1-2-5 ticks per decade; the decades themselves are major. */
export function logFrequencyTicks(domain: readonly [number, number]): { value: number; label: string; major: boolean }[] {
  const [lo, hi] = domain;
  const ticks: { value: number; label: string; major: boolean }[] = [];
  for (let decade = 10 ** Math.floor(Math.log10(lo)); decade <= hi; decade *= 10) {
    for (const m of [1, 2, 5]) {
      const v = decade * m;
      if (v >= lo * 0.9999 && v <= hi * 1.0001) ticks.push({ value: v, label: formatHz(v), major: m === 1 });
    }
  }
  return ticks;
}

/** A y range that holds every finite value, padded and snapped outwards to the step. */
export function niceYDomain(series: readonly ChartSeries[], step = 5, minSpan = 20): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) {
    for (const v of s.y) {
      if (!Number.isFinite(v)) continue;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  if (!Number.isFinite(lo)) return [0, minSpan];
  let a = Math.floor(lo / step) * step;
  let b = Math.ceil(hi / step) * step;
  if (b - a < minSpan) {
    const mid = (a + b) / 2;
    a = Math.floor((mid - minSpan / 2) / step) * step;
    b = a + Math.ceil(minSpan / step) * step;
  }
  return [a, b];
}

export function computeGeometry(series: readonly ChartSeries[], options: ChartOptions): ChartGeometry {
  const pad = options.padding ?? defaultPadding;
  const step = options.yStep ?? 5;
  const plot = { left: pad.left, top: pad.top, right: Math.max(pad.left + 1, options.width - pad.right), bottom: Math.max(pad.top + 1, options.height - pad.bottom) };
  const x = scaleLog().domain([options.xDomain[0], options.xDomain[1]]).range([plot.left, plot.right]).clamp(false);
  const yDomain = options.yDomain ?? niceYDomain(series, step);
  const y = scaleLinear().domain([yDomain[0], yDomain[1]]).range([plot.bottom, plot.top]);
  const [xLo, xHi] = options.xDomain;
  const paths = series.map((s) => {
    const pts: [number, number][] = [];
    for (let i = 0; i < s.x.length; i++) {
      const f = s.x[i];
      const v = s.y[i];
      if (f >= xLo && f <= xHi && Number.isFinite(v)) pts.push([x(f), y(v)]);
    }
    const d = line()(pts) ?? '';
    return { id: s.id, d, color: s.color, dash: s.dash, width: s.width ?? 2 };
  });
  const xTicks = logFrequencyTicks(options.xDomain).map((t) => ({ ...t, pos: x(t.value) }));
  const yTicks: Tick[] = [];
  const labelEvery = (yDomain[1] - yDomain[0]) / step > 8 ? 2 : 1;
  for (let v = yDomain[0], i = 0; v <= yDomain[1] + 1e-9; v += step, i++) {
    yTicks.push({ value: v, pos: y(v), label: `${Number(v.toFixed(2))}`, major: i % labelEvery === 0 });
  }
  return { plot, x, y, paths, xTicks, yTicks };
}

/** Index of the x closest to `target` on a log axis; xs must be increasing. */
export function nearestIndex(xs: readonly number[], target: number): number {
  if (xs.length === 0) return -1;
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= target) lo = mid;
    else hi = mid;
  }
  return Math.abs(Math.log(xs[lo] / target)) <= Math.abs(Math.log(xs[hi] / target)) ? lo : hi;
}
