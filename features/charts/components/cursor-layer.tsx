// The interactive layer over a chart's plot: pointer and touch set the shared cursor, and a thin
// line shows it. It is plain views above the canvas, so moving the cursor never redraws the Skia
// picture or rebuilds a path.
import { useEffect, useRef } from 'react';
import { Platform, StyleSheet, View, type GestureResponderEvent, type ViewProps } from 'react-native';
import { colors } from '../../ui';
import { frequencyAtOffset, type ChartCursor } from '../chart-cursor';
import type { ChartGeometry } from '../chart-math';
import { useChartCursorValue } from '../hooks/use-chart-cursor';

function CursorLine({ cursor, geometry }: { cursor: ChartCursor; geometry: ChartGeometry }) {
  const f = useChartCursorValue(cursor);
  if (f == null) return null;
  const x = geometry.x(f) - geometry.plot.left;
  if (!(x >= 0 && x <= geometry.plot.right - geometry.plot.left)) return null;
  return <View pointerEvents="none" style={[styles.line, { left: x }]} testID="chart-cursor-line" />;
}

type WebPointerEvent = { nativeEvent: PointerEvent; currentTarget: unknown };

export function CursorLayer({ cursor, geometry }: { cursor: ChartCursor; geometry: ChartGeometry }) {
  const { plot } = geometry;
  const frame = useRef<number | null>(null);
  const pending = useRef<number | null>(null);
  // Where the cursor stood before a touch began, for when the browser takes that touch as a scroll.
  const beforeTouch = useRef<number | null>(null);
  useEffect(() => () => {
    if (frame.current != null) cancelAnimationFrame(frame.current);
  }, []);
  // One cursor update per animation frame, however fast the events come.
  const setAt = (px: number) => {
    pending.current = frequencyAtOffset(geometry, px);
    if (frame.current != null) return;
    frame.current = requestAnimationFrame(() => {
      frame.current = null;
      cursor.set(pending.current);
    });
  };
  let handlers: ViewProps;
  if (Platform.OS === 'web') {
    // Pointer events serve mouse hover, mouse drag, pen and touch alike. The responder system is
    // left out on web: it would answer the same touches a second time and gives up when the page
    // scrolls.
    const fromPointer = (e: WebPointerEvent) => {
      const rect = (e.currentTarget as HTMLElement).getBoundingClientRect();
      setAt(e.nativeEvent.clientX - rect.left);
    };
    handlers = {
      onPointerDown: (e: WebPointerEvent) => {
        if (e.nativeEvent.pointerType !== 'mouse') beforeTouch.current = cursor.get();
        fromPointer(e);
      },
      onPointerMove: fromPointer,
      // With touch-action: pan-y the browser cancels a touch it has taken as a vertical scroll; the
      // cursor goes back to where it was, so scrolling past a chart does not move it.
      onPointerCancel: (e: WebPointerEvent) => {
        if (e.nativeEvent.pointerType === 'mouse') return;
        if (frame.current != null) cancelAnimationFrame(frame.current);
        frame.current = null;
        cursor.set(beforeTouch.current);
      },
    } as unknown as ViewProps;
  } else {
    const fromTouch = (e: GestureResponderEvent) => setAt(e.nativeEvent.locationX);
    handlers = {
      onStartShouldSetResponder: () => true,
      onResponderGrant: fromTouch,
      onResponderMove: fromTouch,
      onResponderTerminationRequest: () => true,
    };
  }
  return (
    <View
      style={[styles.layer, { left: plot.left, top: plot.top, width: plot.right - plot.left, height: plot.bottom - plot.top }]}
      accessibilityLabel="Move the cursor along the frequency axis"
      testID="chart-cursor-layer"
      {...handlers}
    >
      <CursorLine cursor={cursor} geometry={geometry} />
    </View>
  );
}

const styles = StyleSheet.create({
  // pan-y: a vertical swipe still scrolls the page, a sideways drag is the cursor's.
  layer: { position: 'absolute', cursor: 'crosshair', touchAction: 'pan-y', userSelect: 'none' } as never,
  line: { position: 'absolute', top: 0, bottom: 0, width: 1.5, backgroundColor: colors.ink, opacity: 0.7 },
});
