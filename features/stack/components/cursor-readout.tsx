import { StyleSheet, Text, View } from 'react-native';
import type { OverlayDriver, OverlayOptions } from '../../../shared/schemas/overlay';
import { useChartCursorValue, type ChartCursor } from '../../charts';
import { colors, fonts, radius, space } from '../../ui';
import { formatCursorHz, readoutAt, type StackCurves } from '../logic/curves';
import { slotStyle } from '../logic/stack-series';

const fmt = (v: number | null, digits: number, unit: string) => (v == null ? '—' : `${v.toFixed(digits)} ${unit}`);

/** Every driver's value at the cursor, on all three charts. Only this re-renders as the cursor moves. */
export function CursorReadout({ cursor, grid, curves, drivers, o }: { cursor: ChartCursor; grid: readonly number[]; curves: readonly StackCurves[]; drivers: readonly OverlayDriver[]; o: OverlayOptions }) {
  const f = useChartCursorValue(cursor);
  if (f == null) {
    return (
      <View style={styles.box} testID="cursor-readout">
        <Text style={styles.hint}>Hover over a chart, or touch and drag, to read every driver at one frequency.</Text>
      </View>
    );
  }
  const r = readoutAt(grid, curves, f);
  const thdUnit = o.thdUnit === 'percent' ? '%' : 'dB';
  return (
    <View style={styles.box} testID="cursor-readout" accessibilityLiveRegion="polite">
      <Text style={styles.freq} testID="cursor-frequency">{formatCursorHz(r.frequency)}</Text>
      {r.rows.map((row, i) => {
        const d = drivers[i];
        return (
          <View key={row.slug} style={styles.row} testID={`readout-${i}`}>
            <View style={[styles.swatch, { backgroundColor: slotStyle(i, colors.series).color }]} />
            <Text style={styles.name} numberOfLines={1}>{d ? `${d.maker.name} ${d.model}` : row.slug}</Text>
            <Text style={styles.value} testID={`readout-${i}-spl`}>{fmt(row.spl, 1, 'dB')}</Text>
            <Text style={styles.value} testID={`readout-${i}-thd`}>THD {fmt(row.thd, o.thdUnit === 'percent' ? 2 : 1, thdUnit)}</Text>
            <Text style={styles.value} testID={`readout-${i}-z`}>{fmt(row.impedance, 2, 'Ω')}</Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.card, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.sm, gap: 2, minHeight: 44 },
  hint: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  freq: { fontFamily: fonts.bold, fontSize: 14, color: colors.ink, fontVariant: ['tabular-nums'] },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  swatch: { width: 10, height: 10, borderRadius: 2 },
  name: { fontFamily: fonts.semibold, fontSize: 12, color: colors.ink, flexGrow: 1, flexShrink: 1, minWidth: 100 },
  value: { fontFamily: fonts.regular, fontSize: 12, color: colors.ink, fontVariant: ['tabular-nums'], minWidth: 70 },
});
