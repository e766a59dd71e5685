import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import type { DriverSummary } from '../../../shared/schemas/drivers';
import { colors, fonts, radius, space } from '../../ui';

export function DriverCard({ driver }: { driver: DriverSummary }) {
  return (
    <Link href={`/drivers/${driver.slug}`} style={styles.link} testID={`driver-card-${driver.slug}`}>
      <View style={styles.card}>
        <Text style={styles.maker}>{driver.maker.name}</Text>
        <Text style={styles.model}>{driver.model}</Text>
        <View style={styles.facts}>
          <Text style={styles.chip}>{driver.type}</Text>
          <Text style={styles.fact}>{driver.nominalSizeIn}″</Text>
          <Text style={styles.fact}>{driver.nominalImpedanceOhm} Ω</Text>
          {driver.fsHz != null ? <Text style={styles.fact}>Fs {driver.fsHz.toFixed(0)} Hz</Text> : null}
          {driver.qts != null ? <Text style={styles.fact}>Qts {driver.qts.toFixed(2)}</Text> : null}
        </View>
      </View>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { flexGrow: 1, flexBasis: 300 },
  card: {
    backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule,
    padding: space.lg, gap: space.xs, width: '100%',
  },
  maker: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8 },
  model: { fontFamily: fonts.bold, fontSize: 18, color: colors.ink },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs, alignItems: 'center' },
  chip: {
    fontFamily: fonts.semibold, fontSize: 12, color: colors.accent, backgroundColor: colors.accentSoft,
    paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm,
  },
  fact: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink },
});
