import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '../../ui';
import type { ChartSeries } from '../chart-math';

/** A short sample of the line (colour and dash) so series can be told apart without colour. */
export function LineSample({ color, dash, width = 2, length = 28 }: { color: string; dash?: readonly number[]; width?: number; length?: number }) {
  if (!dash || dash.length < 2) return <View style={[styles.sample, { width: length, height: width, backgroundColor: color }]} />;
  const segments: { on: boolean; len: number }[] = [];
  let total = 0;
  for (let i = 0; total < length; i = (i + 1) % dash.length) {
    const len = Math.min(dash[i], length - total);
    segments.push({ on: i % 2 === 0, len });
    total += len;
  }
  return (
    <View style={[styles.sampleRow, { width: length, height: width }]}>
      {segments.map((s, i) => (
        <View key={i} style={{ width: s.len, height: width, backgroundColor: s.on ? color : 'transparent' }} />
      ))}
    </View>
  );
}

export function ChartLegend({ series, testID }: { series: readonly ChartSeries[]; testID?: string }) {
  const labelled = series.filter((s) => s.label);
  if (labelled.length === 0) return null;
  return (
    <View style={styles.legend} testID={testID} accessibilityRole="list">
      {labelled.map((s) => (
        <View key={s.id} style={styles.item}>
          <LineSample color={s.color} dash={s.dash} width={s.width} />
          <Text style={styles.label}>{s.label}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: space.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: 6 },
  sample: { borderRadius: 1 },
  sampleRow: { flexDirection: 'row', overflow: 'hidden' },
  label: { fontFamily: fonts.regular, fontSize: 12, color: colors.ink },
});
