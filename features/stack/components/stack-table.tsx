import { ScrollView, StyleSheet, Text, View } from 'react-native';
import type { OverlayDriver } from '../../../shared/schemas/overlay';
import { colors, fonts, radius, space } from '../../ui';
import { buildTable, formatDelta, rowDefs, type TableRow } from '../logic/table-rows';
import { slotStyle } from '../logic/stack-series';

const groups: { key: TableRow['group']; title: string }[] = [
  { key: 'small', title: 'Small-signal' },
  { key: 'large', title: 'Large-signal' },
  { key: 'derived', title: 'Derived figures' },
];
const digitsOf = (key: string) => rowDefs.find((r) => r.key === key)?.digits ?? 2;

/** Every driver side by side; the best value of a row is labelled "best", the others show Δ from it. */
export function StackTable({ drivers }: { drivers: readonly OverlayDriver[] }) {
  const rows = buildTable(drivers);
  return (
    <ScrollView horizontal contentContainerStyle={styles.scroll} testID="stack-table">
      <View style={styles.table}>
        <View style={[styles.tr, styles.head]}>
          <Text style={[styles.th, styles.labelCol]}>Figure</Text>
          {drivers.map((d, i) => (
            <View key={d.slug} style={styles.col}>
              <View style={[styles.swatch, { backgroundColor: slotStyle(i, colors.series).color }]} />
              <Text style={styles.th} numberOfLines={2}>{d.maker.name} {d.model}</Text>
            </View>
          ))}
        </View>
        {groups.map((g) => {
          const list = rows.filter((r) => r.group === g.key);
          if (list.length === 0) return null;
          return (
            <View key={g.key}>
              <Text style={styles.group}>{g.title}</Text>
              {list.map((r) => (
                <View key={r.key} style={styles.tr} testID={`stack-row-${r.key}`}>
                  <Text style={[styles.td, styles.labelCol]}>
                    {r.label}
                    {r.unit ? <Text style={styles.unit}> {r.unit}</Text> : null}
                    {r.better == null ? <Text style={styles.unit}>{'\n'}no better direction</Text> : null}
                  </Text>
                  {r.cells.map((c, i) => (
                    <View key={i} style={[styles.col, c.best && styles.bestCell]}>
                      <Text style={[styles.td, c.best && styles.bestText]}>{c.text}</Text>
                      {c.best ? <Text style={styles.bestTag} testID={`best-${r.key}`}>best</Text> : null}
                      {c.delta != null ? <Text style={styles.delta}>{formatDelta(c.delta, digitsOf(r.key))}</Text> : null}
                    </View>
                  ))}
                </View>
              ))}
            </View>
          );
        })}
        <Text style={styles.note}>“best” follows common practice for this role: lower Fs, Le, Mms and box size; higher Bl, Sd, excursion, sensitivity and beaming onset; a coil offset nearest zero.</Text>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  table: { flexGrow: 1, backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule, padding: space.sm },
  tr: { flexDirection: 'row', alignItems: 'stretch', borderBottomWidth: 1, borderBottomColor: colors.grid },
  head: { borderBottomColor: colors.gridStrong },
  labelCol: { width: 140, paddingRight: space.xs },
  col: { width: 92, paddingHorizontal: 4, paddingVertical: 3, gap: 1 },
  th: { fontFamily: fonts.semibold, fontSize: 12, color: colors.ink },
  td: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink, fontVariant: ['tabular-nums'], paddingVertical: 3 },
  unit: { fontFamily: fonts.regular, fontSize: 11, color: colors.inkSoft },
  group: { fontFamily: fonts.bold, fontSize: 13, color: colors.accent, marginTop: space.sm, marginBottom: 2 },
  swatch: { width: 18, height: 4, borderRadius: 2 },
  bestCell: { backgroundColor: colors.accentSoft, borderRadius: radius.sm },
  bestText: { fontFamily: fonts.bold },
  bestTag: { fontFamily: fonts.bold, fontSize: 10, color: colors.accent, textTransform: 'uppercase', letterSpacing: 0.6 },
  delta: { fontFamily: fonts.regular, fontSize: 11, color: colors.inkSoft, fontVariant: ['tabular-nums'] },
  note: { fontFamily: fonts.regular, fontSize: 11, color: colors.inkSoft, marginTop: space.sm, maxWidth: 520 },
});
