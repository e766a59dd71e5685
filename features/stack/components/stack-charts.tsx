import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { OverlayDriver, OverlayOptions } from '../../../shared/schemas/overlay';
import { ChartLegend, LogChart, logYDomain, niceYDomain, type ChartCursor, type ChartSeries } from '../../charts';
import { colors, fonts, space } from '../../ui';
import type { StackCurves } from '../logic/curves';
import { bandOf } from '../logic/stack-options';
import { impedanceChartSeries, splChartSeries, thdChartSeries } from '../logic/stack-series';
import { CursorReadout } from './cursor-readout';

const palette = colors.series;
const X: readonly [number, number] = [20, 20000];

export interface StackChartSet {
  spl: ChartSeries[];
  thd: ChartSeries[];
  impedance: ChartSeries[];
  splY: [number, number];
  thdY: [number, number];
  thdLevelV: number | null;
}

/** Series and axes for the three charts, rebuilt only when the data or the options change. */
export function useStackChartSet(grid: readonly number[], curves: readonly StackCurves[], drivers: readonly OverlayDriver[], o: OverlayOptions): StackChartSet {
  return useMemo(() => {
    const spl = splChartSeries(grid, curves, drivers, palette, o.offAxis);
    const thd = thdChartSeries(grid, curves, drivers, palette, o.harmonics);
    const impedance = impedanceChartSeries(grid, curves, drivers, palette);
    const onAxis = spl.filter((s) => s.label);
    const [lo, hi] = niceYDomain(onAxis, 5);
    // A 50 dB window under the loudest point: deep low-frequency roll-off would squash the band.
    const splY: [number, number] = [Math.max(lo, hi - 50), hi];
    let thdY: [number, number];
    if (o.thdUnit === 'percent') {
      const [a, b] = logYDomain(thd);
      thdY = [a, Math.max(a * 10, Math.min(b, 100))];
    } else {
      thdY = niceYDomain(thd, 10, 40);
      thdY = [Math.max(thdY[0], -100), Math.min(Math.max(thdY[1], -20), 0)];
    }
    const levels = curves.map((c) => c.thd?.driveLevelV).filter((v): v is number => v != null);
    return { spl, thd, impedance, splY, thdY, thdLevelV: levels.length ? levels[0] : null };
  }, [grid, curves, drivers, o.offAxis, o.harmonics, o.thdUnit]);
}

export function StackCharts({
  set, o, cursor, grid, curves, drivers, chartHeight = 240,
}: {
  set: StackChartSet;
  o: OverlayOptions;
  cursor: ChartCursor;
  grid: readonly number[];
  curves: readonly StackCurves[];
  drivers: readonly OverlayDriver[];
  chartHeight?: number;
}) {
  const band = bandOf(o);
  const highlight = o.highlight ? ([band.lo, band.hi] as const) : null;
  const levelText = o.level === 'raw' ? 'dB SPL at 2.83 V / 1 m' : 'dB, aligned';
  return (
    <View style={styles.charts}>
      <ChartLegend series={set.spl} testID="stack-legend" />
      <CursorReadout cursor={cursor} grid={grid} curves={curves} drivers={drivers} o={o} />
      <LogChart
        testID="stack-chart-spl"
        title={o.offAxis ? 'Frequency response, on axis (bold) and off axis (light)' : 'Frequency response, on axis'}
        series={set.spl}
        xDomain={X}
        yDomain={set.splY}
        yUnit={levelText}
        yStep={5}
        height={chartHeight}
        cursor={cursor}
        highlight={highlight}
      />
      <LogChart
        testID="stack-chart-thd"
        title={`Total harmonic distortion${set.thdLevelV != null ? ` at ${set.thdLevelV} V` : ''}${o.harmonics ? ', with H2 and H3 (lighter)' : ''}`}
        series={set.thd}
        xDomain={X}
        yDomain={set.thdY}
        yUnit={o.thdUnit === 'percent' ? '% of fundamental (log)' : 'dB below fundamental'}
        yScale={o.thdUnit === 'percent' ? 'log' : 'linear'}
        yStep={10}
        height={chartHeight}
        cursor={cursor}
        highlight={highlight}
        emptyText="No distortion measured."
        footer={
          <Text style={styles.caution} testID="thd-caution">
            Caution: distortion is measured at high drive; protect your hearing at such levels and keep amplifier power within each driver’s rating.
          </Text>
        }
      />
      <LogChart
        testID="stack-chart-impedance"
        title="Impedance magnitude"
        series={set.impedance}
        xDomain={X}
        yUnit="Ω"
        yStep={5}
        height={chartHeight}
        cursor={cursor}
        highlight={highlight}
        emptyText="No impedance measured."
      />
    </View>
  );
}

const styles = StyleSheet.create({
  charts: { gap: space.md },
  caution: { fontFamily: fonts.regular, fontSize: 12, color: colors.warn },
});
