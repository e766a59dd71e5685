import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import type { DriverSummary } from '../../../shared/schemas/drivers';
import { colors, fonts, radius, space } from '../../ui';
import { formatPrice } from './parameter-format';
import { RoleFitBlock } from './role-fit-block';

function Fact({ label, value }: { label: string; value: string | null }) {
  if (value == null) return null;
  return (
    <Text style={styles.fact}>
      <Text style={styles.factLabel}>{label} </Text>
      {value}
    </Text>
  );
}

const fixed = (v: number | null, digits: number, unit = '') => (v == null ? null : `${v.toFixed(digits)}${unit}`);

export function DriverCard({ driver, href }: { driver: DriverSummary; href: string }) {
  return (
    <Link href={href} style={styles.link} testID={`driver-card-${driver.slug}`}>
      <View style={styles.card}>
        <Text style={styles.maker}>{driver.maker.name}</Text>
        <Text style={styles.model}>{driver.model}</Text>
        <View style={styles.facts}>
          <Text style={styles.chip}>{driver.type}</Text>
          <Text style={styles.fact}>{driver.nominalSizeIn}″</Text>
          <Text style={styles.fact}>{driver.nominalImpedanceOhm} Ω</Text>
          {driver.price != null ? <Text style={styles.price}>{formatPrice(driver.price, driver.currency)}</Text> : null}
        </View>
        <View style={styles.facts}>
          <Fact label="Fs" value={fixed(driver.fsHz, 0, ' Hz')} />
          <Fact label="Qts" value={fixed(driver.qts, 2)} />
          <Fact label="Vas" value={fixed(driver.vasL, driver.vasL != null && driver.vasL < 10 ? 2 : 1, ' L')} />
          <Fact label="Xmax" value={fixed(driver.xmaxMm, 1, ' mm')} />
          <Fact label="Sens." value={fixed(driver.sensitivityDb, 1, ' dB')} />
        </View>
        {driver.role ? <RoleFitBlock role={driver.role} testID={`role-${driver.slug}`} /> : null}
      </View>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { flexGrow: 1, flexBasis: 280, maxWidth: '100%' },
  card: {
    backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule,
    padding: space.lg, gap: space.xs, width: '100%', height: '100%',
  },
  maker: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8 },
  model: { fontFamily: fonts.bold, fontSize: 18, color: colors.ink },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: 2, marginTop: 2, alignItems: 'center' },
  chip: {
    fontFamily: fonts.semibold, fontSize: 12, color: colors.accent, backgroundColor: colors.accentSoft,
    paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm,
  },
  fact: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink, fontVariant: ['tabular-nums'] },
  factLabel: { color: colors.inkSoft },
  price: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink, marginLeft: 'auto' },
});
