// Pure chart geometry: scales, SVG path data, ticks and nearest-point lookup. No React, no Skia,
// so it is tested directly and memoised by a hook.
import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3-scale';
import { line } from 'd3-shape';

export interface ChartSeries {
  id: string;
  x: readonly number[];
  y: readonly number[];
  color: string;
  /** Dash pattern in pixels; omitted for a solid line. */
  dash?: readonly number[];
  width?: number;
  /** Legend text; series without one stay out of the legend. */
  label?: string;
}

export type AxisScale = 'log' | 'linear';

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
  /** Frequency charts are logarithmic in x; excursion charts (mm) are linear. */
  xScale?: AxisScale;
  /** Distortion in percent reads best on a logarithmic y axis. */
  yScale?: AxisScale;
  /** Linear x tick spacing; chosen from the domain when omitted. */
  xStep?: number;
}

export interface Tick {
  value: number;
  pos: number;
  label: string;
  major: boolean;
}

export interface ChartGeometry {
  plot: { left: number; top: number; right: number; bottom: number };
  x: ScaleContinuousNumeric<number, number>;
  y: ScaleContinuousNumeric<number, number>;
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

/** Labels for a logarithmic value axis (percent, ohms): compact, no trailing zeros. */
export function formatLogValue(v: number): string {
  if (v >= 1000) return formatHz(v);
  return `${Number(v.toPrecision(2))}`;
}

/** 1-2-5 ticks across any positive log domain (distortion in %, impedance in ohms). */
export function logValueTicks(domain: readonly [number, number]): { value: number; label: string; major: boolean }[] {
  return logFrequencyTicks(domain).map((t) => ({ ...t, label: formatLogValue(t.value) }));
}

/** Decades that hold every positive finite value, for a logarithmic y axis. */
export function logYDomain(series: readonly ChartSeries[], floor = 0.01): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) {
    for (const v of s.y) {
      if (!Number.isFinite(v) || v <= 0) continue;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  if (!Number.isFinite(lo)) return [floor, floor * 1000];
  const a = Math.max(floor, 10 ** Math.floor(Math.log10(lo)));
  // A peak a hair over a decade (100.0001 %) rounds down to it rather than adding an empty decade.
  let b = 10 ** Math.ceil(Math.log10(hi) - 1e-3);
  if (b <= a) b = a * 10;
  return [a, b];
}

/** A "nice" step (1, 2 or 5 times a power of ten) giving roughly `count` intervals over a span. */
export function niceStep(span: number, count = 6): number {
  if (!(span > 0)) return 1;
  const raw = span / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const r = raw / mag;
  return (r <= 1 ? 1 : r <= 2 ? 2 : r <= 5 ? 5 : 10) * mag;
}

function linearTicks(domain: readonly [number, number], step: number, labelEvery: number): { value: number; label: string; major: boolean }[] {
  const ticks: { value: number; label: string; major: boolean }[] = [];
  const start = Math.ceil(domain[0] / step - 1e-9) * step;
  for (let v = start, i = 0; v <= domain[1] + step * 1e-6; v += step, i++) {
    const value = Math.abs(v) < step * 1e-9 ? 0 : v;
    ticks.push({ value, label: `${Number(value.toFixed(3))}`, major: i % labelEvery === 0 });
  }
  return ticks;
}

export function computeGeometry(series: readonly ChartSeries[], options: ChartOptions): ChartGeometry {
  const pad = options.padding ?? defaultPadding;
  const step = options.yStep ?? 5;
  const xLog = (options.xScale ?? 'log') === 'log';
  const yLog = options.yScale === 'log';
  const plot = { left: pad.left, top: pad.top, right: Math.max(pad.left + 1, options.width - pad.right), bottom: Math.max(pad.top + 1, options.height - pad.bottom) };
  const x: ScaleContinuousNumeric<number, number> = (xLog ? scaleLog() : scaleLinear()).domain([options.xDomain[0], options.xDomain[1]]).range([plot.left, plot.right]).clamp(false);
  const yDomain = options.yDomain ?? (yLog ? logYDomain(series) : niceYDomain(series, step));
  const y: ScaleContinuousNumeric<number, number> = (yLog ? scaleLog() : scaleLinear()).domain([yDomain[0], yDomain[1]]).range([plot.bottom, plot.top]);
  const [xLo, xHi] = options.xDomain;
  const paths = series.map((s) => {
    const pts: [number, number][] = [];
    for (let i = 0; i < s.x.length; i++) {
      const f = s.x[i];
      const v = s.y[i];
      // A log axis has no place for zero or negative values; they are skipped, not clamped.
      if (f >= xLo && f <= xHi && Number.isFinite(v) && (!yLog || v > 0)) pts.push([x(f), y(v)]);
    }
    const d = line()(pts) ?? '';
    return { id: s.id, d, color: s.color, dash: s.dash, width: s.width ?? 2 };
  });
  const xTickList = xLog ? logFrequencyTicks(options.xDomain) : linearTicks(options.xDomain, options.xStep ?? niceStep(xHi - xLo), 1);
  const xTicks = xTickList.map((t) => ({ ...t, pos: x(t.value) }));
  let yTicks: Tick[];
  if (yLog) {
    yTicks = logValueTicks([yDomain[0], yDomain[1]]).map((t) => ({ ...t, pos: y(t.value) }));
  } else {
    yTicks = [];
    const labelEvery = (yDomain[1] - yDomain[0]) / step > 8 ? 2 : 1;
    for (let v = yDomain[0], i = 0; v <= yDomain[1] + 1e-9; v += step, i++) {
      yTicks.push({ value: v, pos: y(v), label: `${Number(v.toFixed(2))}`, major: i % labelEvery === 0 });
    }
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
