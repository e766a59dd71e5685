import { StyleSheet, Text, View } from 'react-native';
import type { MakerSpec, Parameter } from '../../../shared/schemas/drivers';
import { colors, fonts, radius, space } from '../../ui';
import { DEVIATION_LIMIT_PERCENT, parameterRows } from '../logic/spec-deviation';

/** Measured parameters of one signal level beside the maker's figures, deviations past ±10 % marked. */
export function ParameterComparison({ parameters, specs, signal, testID }: { parameters: readonly Parameter[]; specs: readonly MakerSpec[]; signal: 'small' | 'large'; testID: string }) {
  const rows = parameterRows(parameters, specs, signal);
  if (rows.length === 0) return <Text style={styles.empty}>No {signal}-signal parameters measured.</Text>;
  return (
    <View style={styles.table} testID={testID}>
      <View style={[styles.row, styles.headRow]}>
        <Text style={[styles.cell, styles.name, styles.head]}>Parameter</Text>
        <Text style={[styles.cell, styles.num, styles.head]}>Measured</Text>
        <Text style={[styles.cell, styles.num, styles.head]}>Maker</Text>
        <Text style={[styles.cell, styles.dev, styles.head]}>Δ</Text>
      </View>
      {rows.map((r) => (
        <View key={r.name} style={styles.row} testID={`param-${r.name}`}>
          <View style={styles.nameCell}>
            <Text style={[styles.cell, styles.nameText]}>{r.label}</Text>
            {r.unit ? <Text style={styles.unit}>{r.unit}</Text> : null}
          </View>
          <Text style={[styles.cell, styles.num]}>{r.measured}</Text>
          <Text style={[styles.cell, styles.num, styles.soft]}>{r.spec ?? '—'}</Text>
          <Text
            style={[styles.cell, styles.dev, r.flagged && styles.flag]}
            testID={r.flagged ? `deviation-flag-${r.name}` : undefined}
            accessibilityLabel={r.deviationText ? `${r.deviationText} from maker${r.flagged ? `, beyond ±${DEVIATION_LIMIT_PERCENT} %` : ''}` : undefined}
          >
            {r.deviationText ?? ''}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule, paddingVertical: space.xs },
  row: { flexDirection: 'row', paddingHorizontal: space.md, paddingVertical: 5, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.rule, alignItems: 'center' },
  headRow: { paddingVertical: 4 },
  head: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft },
  cell: { fontFamily: fonts.regular, fontSize: 14, color: colors.ink, fontVariant: ['tabular-nums'] },
  name: { flex: 2.2, fontFamily: fonts.semibold },
  nameCell: { flex: 2.2, flexDirection: 'row', alignItems: 'baseline', gap: 4, flexWrap: 'wrap' },
  nameText: { fontFamily: fonts.semibold },
  num: { flex: 1.3, textAlign: 'right' },
  dev: { flex: 1.2, textAlign: 'right', fontSize: 13 },
  soft: { color: colors.inkSoft },
  unit: { fontFamily: fonts.regular, color: colors.inkSoft, fontSize: 12 },
  flag: { color: colors.card, backgroundColor: colors.warn, borderRadius: radius.sm, paddingHorizontal: 4, fontFamily: fonts.semibold, marginLeft: space.xs },
  empty: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
});
