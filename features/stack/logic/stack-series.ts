// Chart series for the stack. Each slot keeps one colour AND one dash pattern on every chart, so
// drivers stay apart in greyscale and for readers who cannot tell the colours apart.
import type { OverlayDriver } from '../../../shared/schemas/overlay';
import type { ChartSeries } from '../../charts/chart-math';
import type { StackCurves } from './curves';

export const SLOT_DASHES: readonly (readonly number[] | undefined)[] = [undefined, [14, 6], [4, 4], [2, 4, 10, 4]];
export const SLOT_DASH_NAMES = ['solid', 'long dash', 'short dash', 'dot-dash'] as const;

export function slotStyle(i: number, palette: readonly string[]): { color: string; dash?: readonly number[] } {
  return { color: palette[i % palette.length], dash: SLOT_DASHES[i % SLOT_DASHES.length] };
}

/** '#rrggbb' at an opacity, for the lighter off-axis and harmonic lines. */
export function withAlpha(hex: string, alpha: number): string {
  const n = parseInt(hex.slice(1), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}

export function driverLabel(d: Pick<OverlayDriver, 'maker' | 'model' | 'set'>): string {
  return `${d.maker.name} ${d.model} · ${d.set.label}`;
}

const toY = (y: readonly (number | null)[]) => y.map((v) => (v == null ? NaN : v));

export function splChartSeries(grid: readonly number[], curves: readonly StackCurves[], drivers: readonly OverlayDriver[], palette: readonly string[], offAxis: boolean): ChartSeries[] {
  const out: ChartSeries[] = [];
  curves.forEach((c, i) => {
    const s = slotStyle(i, palette);
    if (offAxis) {
      for (const o of c.offAxis) out.push({ id: `${c.slug}-spl-${o.angleDeg}`, x: grid, y: toY(o.y), color: withAlpha(s.color, 0.45), dash: s.dash, width: 1 });
    }
    out.push({ id: `${c.slug}-spl`, x: grid, y: toY(c.spl), ...s, width: 2.25, label: driverLabel(drivers[i]) });
  });
  return out;
}

export function thdChartSeries(grid: readonly number[], curves: readonly StackCurves[], drivers: readonly OverlayDriver[], palette: readonly string[], harmonics: boolean): ChartSeries[] {
  const out: ChartSeries[] = [];
  curves.forEach((c, i) => {
    if (!c.thd) return;
    const s = slotStyle(i, palette);
    out.push({ id: `${c.slug}-thd`, x: grid, y: toY(c.thd.thd), ...s, width: 2.25, label: driverLabel(drivers[i]) });
    if (harmonics) {
      if (c.thd.h2) out.push({ id: `${c.slug}-h2`, x: grid, y: toY(c.thd.h2), color: withAlpha(s.color, 0.65), dash: s.dash, width: 1.25 });
      if (c.thd.h3) out.push({ id: `${c.slug}-h3`, x: grid, y: toY(c.thd.h3), color: withAlpha(s.color, 0.4), dash: s.dash, width: 1 });
    }
  });
  return out;
}

export function impedanceChartSeries(grid: readonly number[], curves: readonly StackCurves[], drivers: readonly OverlayDriver[], palette: readonly string[]): ChartSeries[] {
  return curves.flatMap((c, i) => (c.impedance ? [{ id: `${c.slug}-z`, x: grid, y: toY(c.impedance), ...slotStyle(i, palette), width: 2.25, label: driverLabel(drivers[i]) }] : []));
}
