import { WithSkiaWeb } from '@shopify/react-native-skia/lib/module/web';
import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import { ClientOnly, colors, fonts } from '../../ui';
import type { ChartCursor } from '../chart-cursor';
import type { AxisScale, ChartSeries } from '../chart-math';
import { useChartGeometry } from '../hooks/use-chart-geometry';
import { ChartLegend } from './chart-legend';
import { CursorLayer } from './cursor-layer';

export interface LogChartProps {
  testID?: string;
  title: string;
  series: readonly ChartSeries[];
  xDomain?: readonly [number, number];
  yDomain?: readonly [number, number];
  yStep?: number;
  yUnit: string;
  height?: number;
  /** What the x axis measures; frequency by default. */
  xLabel?: string;
  xScale?: AxisScale;
  yScale?: AxisScale;
  xStep?: number;
  /** Show a legend of the labelled series under the title. */
  legend?: boolean;
  /** Shown instead of the plot when there is nothing to draw. */
  emptyText?: string;
  /** A cursor shared with other charts: hovering or dragging here moves it, every chart draws it. */
  cursor?: ChartCursor;
  /** An x range shaded behind the curves (an intended pass band). */
  highlight?: readonly [number, number] | null;
  /** Extra content under the plot (a caution, a note). */
  footer?: ReactNode;
}

const DEFAULT_X: readonly [number, number] = [20, 20000];
// CanvasKit is fetched from the app's own origin; nothing is loaded from elsewhere.
const skiaOptions = { locateFile: (file: string) => `/${file}` };
const loadCanvas = () => import('./log-chart-canvas').then((m) => ({ default: m.LogChartCanvas }));

/**
 * A chart that sizes itself to its container and draws with Skia once mounted. Log-frequency by
 * default; `xScale="linear"` serves excursion curves and `yScale="log"` distortion in percent.
 */
export function LogChart({
  testID, title, series, xDomain = DEFAULT_X, yDomain, yStep, yUnit, height = 260, xLabel = 'frequency (Hz)', xScale, yScale, xStep, legend, emptyText, cursor, highlight, footer,
}: LogChartProps) {
  const [width, setWidth] = useState(0);
  const geometry = useChartGeometry(series, { width, height, xDomain, yDomain, yStep, xScale, yScale, xStep });
  const empty = series.every((s) => s.x.length === 0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.floor(e.nativeEvent.layout.width));
  return (
    <View style={styles.wrap} testID={testID}>
      <View style={styles.head}>
        <Text style={styles.title}>{title}</Text>
        <Text style={styles.units}>
          {yUnit} against {xLabel}
        </Text>
      </View>
      {legend ? <ChartLegend series={series} testID={testID ? `${testID}-legend` : undefined} /> : null}
      {empty && emptyText ? <Text style={styles.units}>{emptyText}</Text> : null}
      <View style={{ height }} onLayout={onLayout}>
        {width > 0 ? (
          <ClientOnly>
            <WithSkiaWeb
              opts={skiaOptions}
              getComponent={loadCanvas}
              fallback={<View style={{ width, height }} />}
              componentProps={{ geometry, width, height, highlight: highlight ?? null }}
            />
          </ClientOnly>
        ) : null}
        {cursor && width > 0 ? <CursorLayer cursor={cursor} geometry={geometry} /> : null}
      </View>
      {footer}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { backgroundColor: colors.card, borderRadius: 10, borderWidth: 1, borderColor: colors.rule, padding: 10, gap: 6 },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: 6 },
  title: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  units: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
});
