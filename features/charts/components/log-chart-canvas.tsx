// The Skia drawing of a log-frequency chart. Loaded lazily on web, after CanvasKit is ready.
import { Canvas, DashPathEffect, Group, Line, Path, Rect, Skia, Text, useFont, vec } from '@shopify/react-native-skia';
import { useMemo } from 'react';
import { colors } from '../../ui';
import type { ChartGeometry } from '../chart-math';

export interface LogChartCanvasProps {
  geometry: ChartGeometry;
  width: number;
  height: number;
  /** An x range shaded behind the curves. */
  highlight?: readonly [number, number] | null;
}

const axisFont = require('../../../assets/fonts/Manrope_600SemiBold.ttf');

export function LogChartCanvas({ geometry, width, height, highlight }: LogChartCanvasProps) {
  const font = useFont(axisFont, 11);
  const { plot, xTicks, yTicks, paths } = geometry;
  const skPaths = useMemo(() => paths.map((p) => ({ ...p, path: Skia.Path.MakeFromSVGString(p.d) })), [paths]);
  const band = highlight ? { a: Math.max(plot.left, geometry.x(highlight[0])), b: Math.min(plot.right, geometry.x(highlight[1])) } : null;
  return (
    <Canvas style={{ width, height }}>
      {band && band.b > band.a ? <Rect x={band.a} y={plot.top} width={band.b - band.a} height={plot.bottom - plot.top} color={colors.accentSoft} /> : null}
      {xTicks.map((t) => (
        <Line key={`x${t.value}`} p1={vec(t.pos, plot.top)} p2={vec(t.pos, plot.bottom)} color={t.major ? colors.gridStrong : colors.grid} strokeWidth={1} />
      ))}
      {yTicks.map((t) => (
        <Line key={`y${t.value}`} p1={vec(plot.left, t.pos)} p2={vec(plot.right, t.pos)} color={t.major ? colors.gridStrong : colors.grid} strokeWidth={1} />
      ))}
      <Group clip={Skia.XYWHRect(plot.left, plot.top, plot.right - plot.left, plot.bottom - plot.top)}>
        {skPaths.map((p) =>
          p.path ? (
            <Path key={p.id} path={p.path} color={p.color} style="stroke" strokeWidth={p.width} strokeJoin="round" strokeCap="round">
              {p.dash ? <DashPathEffect intervals={[...p.dash]} /> : null}
            </Path>
          ) : null,
        )}
      </Group>
      {font
        ? xTicks.map((t) => {
            const w = font.getTextWidth(t.label);
            return <Text key={`xl${t.value}`} x={t.pos - w / 2} y={plot.bottom + 16} text={t.label} font={font} color={colors.inkSoft} />;
          })
        : null}
      {font
        ? yTicks
            .filter((t) => t.major)
            .map((t) => {
              const w = font.getTextWidth(t.label);
              return <Text key={`yl${t.value}`} x={plot.left - 6 - w} y={t.pos + 4} text={t.label} font={font} color={colors.inkSoft} />;
            })
        : null}
    </Canvas>
  );
}
