// The interactive layer over a chart's plot: pointer and touch set the shared cursor, and a thin
// line shows it. It is plain views above the canvas, so moving the cursor never redraws the Skia
// picture or rebuilds a path.
import { useRef } from 'react';
import { Platform, StyleSheet, View, type GestureResponderEvent, type ViewProps } from 'react-native';
import { colors } from '../../ui';
import type { ChartCursor } from '../chart-cursor';
import type { ChartGeometry } from '../chart-math';
import { useChartCursorValue } from '../hooks/use-chart-cursor';

function CursorLine({ cursor, geometry }: { cursor: ChartCursor; geometry: ChartGeometry }) {
  const f = useChartCursorValue(cursor);
  if (f == null) return null;
  const x = geometry.x(f) - geometry.plot.left;
  if (!(x >= 0 && x <= geometry.plot.right - geometry.plot.left)) return null;
  return <View pointerEvents="none" style={[styles.line, { left: x }]} />;
}

export function CursorLayer({ cursor, geometry }: { cursor: ChartCursor; geometry: ChartGeometry }) {
  const { plot, x } = geometry;
  const w = plot.right - plot.left;
  const frame = useRef<number | null>(null);
  const pending = useRef<number | null>(null);
  // One cursor update per animation frame, however fast the events come.
  const setAt = (px: number) => {
    pending.current = x.invert(plot.left + Math.max(0, Math.min(w, px)));
    if (frame.current != null) return;
    frame.current = requestAnimationFrame(() => {
      frame.current = null;
      cursor.set(pending.current);
    });
  };
  const fromTouch = (e: GestureResponderEvent) => setAt(e.nativeEvent.locationX);
  const webProps =
    Platform.OS === 'web'
      ? ({
          onMouseMove: (e: { nativeEvent: MouseEvent; currentTarget: unknown }) => {
            const rect = (e.currentTarget as HTMLElement).getBoundingClientRect();
            setAt(e.nativeEvent.clientX - rect.left);
          },
        } as unknown as ViewProps)
      : {};
  return (
    <View
      style={[styles.layer, { left: plot.left, top: plot.top, width: w, height: plot.bottom - plot.top }]}
      onStartShouldSetResponder={() => true}
      onResponderGrant={fromTouch}
      onResponderMove={fromTouch}
      onResponderTerminationRequest={() => true}
      accessibilityLabel="Move the cursor along the frequency axis"
      {...webProps}
    >
      <CursorLine cursor={cursor} geometry={geometry} />
    </View>
  );
}

const styles = StyleSheet.create({
  layer: { position: 'absolute', cursor: 'crosshair' } as never,
  line: { position: 'absolute', top: 0, bottom: 0, width: 1.5, backgroundColor: colors.ink, opacity: 0.7 },
});
