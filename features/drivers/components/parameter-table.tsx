import { StyleSheet, Text, View } from 'react-native';
import type { Parameter } from '../../../shared/schemas/drivers';
import { colors, fonts, space } from '../../ui';
import { formatParameter, parameterOrder } from './parameter-format';

export function ParameterTable({ parameters }: { parameters: readonly Parameter[] }) {
  const rank = (n: string) => {
    const i = parameterOrder.indexOf(n);
    return i < 0 ? 999 : i;
  };
  const sorted = [...parameters].sort((a, b) => rank(a.name) - rank(b.name));
  return (
    <View style={styles.table} testID="parameter-table" accessibilityRole="list">
      {sorted.map((p) => {
        const f = formatParameter(p.name, p.value);
        return (
          <View key={p.name} style={styles.row}>
            <Text style={styles.name}>{f.label}</Text>
            <Text style={styles.value}>
              {f.text}
              {f.unit ? <Text style={styles.unit}> {f.unit}</Text> : null}
            </Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { backgroundColor: colors.card, borderRadius: 10, borderWidth: 1, borderColor: colors.rule, paddingVertical: space.xs },
  row: {
    flexDirection: 'row', justifyContent: 'space-between', paddingHorizontal: space.lg, paddingVertical: 6,
    borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.rule,
  },
  name: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  value: { fontFamily: fonts.regular, fontSize: 14, color: colors.ink, fontVariant: ['tabular-nums'] },
  unit: { color: colors.inkSoft, fontSize: 12 },
});
