import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '../../ui';

export function ResultRow({ label, value, unit, note, testID }: { label: string; value: string; unit?: string; note?: string; testID: string }) {
  return (
    <View style={styles.row}>
      <View style={styles.nameBox}>
        <Text style={styles.name}>{label}</Text>
        {note ? <Text style={styles.note}>{note}</Text> : null}
      </View>
      <Text style={styles.value}>
        <Text testID={testID}>{value}</Text>
        {unit ? <Text style={styles.unit}> {unit}</Text> : null}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: space.md, paddingVertical: 5,
    borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.rule,
  },
  nameBox: { flexShrink: 1 },
  name: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  note: { fontFamily: fonts.regular, fontSize: 11, color: colors.inkSoft },
  value: { fontFamily: fonts.bold, fontSize: 15, color: colors.ink, fontVariant: ['tabular-nums'], textAlign: 'right' },
  unit: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
});
