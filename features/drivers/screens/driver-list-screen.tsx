import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, fonts, radius, ScreenFrame, space } from '../../ui';
import { DriverCard } from '../components/driver-card';
import { useDrivers } from '../hooks/use-drivers';

export function DriverListScreen() {
  const [q, setQ] = useState('');
  const { data, error, isLoading } = useDrivers({ q: q.trim() || undefined });
  return (
    <ScreenFrame testID="driver-list-screen">
      <View style={styles.header}>
        <Text style={styles.h1} accessibilityRole="header">Measured drivers</Text>
        <Text style={styles.lede}>Independent bench measurements, normalised to 2.83 V / 1 m on one frequency grid.</Text>
      </View>
      <TextInput
        value={q}
        onChangeText={setQ}
        placeholder="Search maker or model"
        placeholderTextColor={colors.inkSoft}
        style={styles.search}
        accessibilityLabel="Search maker or model"
        testID="driver-search"
      />
      {error ? <Text style={styles.error}>Could not load drivers: {error.message}</Text> : null}
      {isLoading && !data ? <ActivityIndicator color={colors.accent} /> : null}
      {data ? <Text style={styles.count} testID="driver-count">{data.total} drivers</Text> : null}
      <View style={styles.grid}>
        {data?.items.map((d) => <DriverCard key={d.slug} driver={d} />)}
      </View>
      {data && data.items.length === 0 ? <Text style={styles.lede}>No driver matches “{q}”.</Text> : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  lede: { fontFamily: fonts.regular, fontSize: 15, color: colors.inkSoft },
  search: {
    fontFamily: fonts.regular, fontSize: 16, color: colors.ink, backgroundColor: colors.card, borderWidth: 1,
    borderColor: colors.rule, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm,
  },
  count: { fontFamily: fonts.semibold, fontSize: 13, color: colors.inkSoft },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  error: { fontFamily: fonts.semibold, color: colors.warn },
});
