import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { LogChart, type ChartSeries } from '../../charts';
import { ApiRequestError, colors, fonts, ScreenFrame, space, useBreakpoint } from '../../ui';
import { ParameterTable } from '../components/parameter-table';
import { useDriver } from '../hooks/use-driver';
import type { DriverDetail } from '../../../shared/schemas/drivers';

function responseSeries(driver: DriverDetail): ChartSeries[] {
  const set = driver.measurementSets[0];
  if (!set) return [];
  return set.curves
    .filter((c) => c.kind === 'spl' && (c.angleDeg ?? 0) === 0)
    .map((c) => ({ id: `spl-${c.angleDeg ?? 0}`, x: c.x, y: c.y, color: colors.series[0], width: 2 }));
}

export function DriverScreen({ slug }: { slug: string }) {
  const { data, error, isLoading } = useDriver(slug);
  const wide = useBreakpoint() === 'wide';
  if (error) {
    const missing = error instanceof ApiRequestError && error.status === 404;
    return (
      <ScreenFrame testID="driver-screen">
        <Text style={styles.h1}>{missing ? 'Driver not found' : 'Could not load this driver'}</Text>
        <Text style={styles.meta}>{missing ? `No driver is listed as “${slug}”.` : error.message}</Text>
      </ScreenFrame>
    );
  }
  if (isLoading || !data) {
    return (
      <ScreenFrame testID="driver-screen">
        <ActivityIndicator color={colors.accent} />
      </ScreenFrame>
    );
  }
  const set = data.measurementSets[0];
  return (
    <ScreenFrame testID="driver-screen">
      <View style={styles.header}>
        <Text style={styles.maker}>{data.maker.name}</Text>
        <Text style={styles.h1} accessibilityRole="header">{data.model}</Text>
        <Text style={styles.meta}>
          {data.nominalSizeIn}″ {data.type} · {data.nominalImpedanceOhm} Ω nominal
        </Text>
      </View>
      <View style={[styles.body, wide && styles.bodyWide]}>
        <View style={[styles.main, wide && styles.mainWide]}>
          <LogChart testID="response-chart" title="On-axis response, 2.83 V / 1 m" series={responseSeries(data)} yUnit="dB SPL" yStep={5} />
          {set ? (
            <Text style={styles.meta}>
              Method: {set.driveVoltageV} V at {set.distanceM} m, {set.baffle}
              {set.gating ? `, ${set.gating}` : ''}
              {set.temperatureC != null ? `, ${set.temperatureC} °C` : ''}
              {set.measuredOn ? `, measured ${set.measuredOn}` : ''}.
            </Text>
          ) : (
            <Text style={styles.meta}>No approved measurements yet.</Text>
          )}
        </View>
        <View style={[styles.side, wide && styles.sideWide]}>
          <Text style={styles.h2}>Small-signal parameters</Text>
          {set ? <ParameterTable parameters={set.parameters} /> : null}
        </View>
      </View>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  header: { gap: 2 },
  maker: { fontFamily: fonts.semibold, fontSize: 13, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8 },
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  h2: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkSoft },
  body: { gap: space.lg },
  bodyWide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { gap: space.sm },
  mainWide: { flex: 3 },
  side: { gap: space.sm },
  sideWide: { flex: 2 },
});
