import { StyleSheet, Text, View } from 'react-native';
import type { OverlayDriver, OverlayOptions } from '../../../shared/schemas/overlay';
import { LineSample, useChartCursorValue, type ChartCursor } from '../../charts';
import { colors, fonts, radius, space } from '../../ui';
import { formatCursorHz, readoutAt, type ReadoutRow, type StackCurves } from '../logic/curves';
import { slotStyle } from '../logic/stack-series';

const fmt = (v: number | null, digits: number, unit: string) => (v == null ? '—' : `${v.toFixed(digits)} ${unit}`);

/**
 * Every driver's value at the cursor, on all three charts. Only this re-renders as the cursor moves.
 *
 * A grid of fixed-width, right-aligned, tabular columns: the frequency and column heads on top,
 * one row per driver under them. The rows are there before the cursor is (as dashes), so the first
 * touch does not push the chart below down under the finger, and values changing width never
 * move their neighbours. It fits a 390 px phone without wrapping.
 */
export function CursorReadout({ cursor, grid, curves, drivers, o }: { cursor: ChartCursor; grid: readonly number[]; curves: readonly StackCurves[]; drivers: readonly OverlayDriver[]; o: OverlayOptions }) {
  const f = useChartCursorValue(cursor);
  const r = f == null ? null : readoutAt(grid, curves, f);
  const rows: ReadoutRow[] = r ? r.rows : curves.map((c) => ({ slug: c.slug, spl: null, thd: null, impedance: null }));
  const percent = o.thdUnit === 'percent';
  return (
    <View style={styles.box} testID="cursor-readout" accessibilityLiveRegion={r ? 'polite' : 'none'}>
      <View style={styles.row}>
        <Text style={styles.freq} numberOfLines={1} testID={r ? 'cursor-frequency' : undefined}>
          {r ? formatCursorHz(r.frequency) : '— Hz'}
        </Text>
        <Text style={[styles.head, styles.spl]}>SPL</Text>
        <Text style={[styles.head, styles.thd]}>THD</Text>
        {/* Manrope draws "|Z|" much like "IZI"; the values carry Ω, so Z alone is plain enough. */}
        <Text style={[styles.head, styles.z]} accessibilityLabel="impedance magnitude">Z</Text>
      </View>
      {rows.map((row, i) => {
        const d = drivers[i];
        const s = slotStyle(i, colors.series);
        return (
          <View key={`${row.slug}-${i}`} style={styles.row} testID={`readout-${i}`}>
            <View style={styles.driver}>
              <LineSample color={s.color} dash={s.dash} width={3} length={24} />
              {/* Model first: on a phone the ellipsis takes the set and maker, which the legend above spells out. */}
              <Text style={styles.name} numberOfLines={1}>
                {d ? d.model : row.slug}
                {d ? <Text style={styles.nameSoft}>{` · ${d.set.label} · ${d.maker.name}`}</Text> : null}
              </Text>
            </View>
            <Text style={[styles.value, styles.spl]} numberOfLines={1} testID={`readout-${i}-spl`}>{fmt(row.spl, 1, 'dB')}</Text>
            <Text style={[styles.value, styles.thd]} numberOfLines={1} testID={`readout-${i}-thd`}>{fmt(row.thd, percent ? 2 : 1, percent ? '%' : 'dB')}</Text>
            <Text style={[styles.value, styles.z]} numberOfLines={1} testID={`readout-${i}-z`}>{fmt(row.impedance, 2, 'Ω')}</Text>
          </View>
        );
      })}
      <Text style={styles.hint}>Hover over a chart, or touch and drag along it, to read every driver at one frequency.</Text>
    </View>
  );
}

// Widths hold the longest value each column shows at 12 px Manrope ("100.0 dB" 50 px, "-62.5 dB" 47,
// "125.00 Ω" 51, measured in Chromium), which leaves a phone's name column room for a whole model.
const styles = StyleSheet.create({
  box: { backgroundColor: colors.card, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.sm, gap: 3 },
  row: { flexDirection: 'row', alignItems: 'center', columnGap: 6, minHeight: 20 },
  freq: { flex: 1, minWidth: 0, fontFamily: fonts.bold, fontSize: 14, color: colors.ink, fontVariant: ['tabular-nums'] },
  head: { fontFamily: fonts.semibold, fontSize: 11, color: colors.inkSoft, textAlign: 'right', letterSpacing: 0.3 },
  driver: { flex: 1, minWidth: 0, flexDirection: 'row', alignItems: 'center', gap: 6 },
  name: { flexShrink: 1, minWidth: 0, fontFamily: fonts.semibold, fontSize: 12, color: colors.ink },
  nameSoft: { fontFamily: fonts.regular, color: colors.inkSoft },
  value: { fontFamily: fonts.regular, fontSize: 12, color: colors.ink, fontVariant: ['tabular-nums'], textAlign: 'right' },
  spl: { width: 52 },
  thd: { width: 50 },
  z: { width: 54 },
  hint: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft, marginTop: 2 },
});
