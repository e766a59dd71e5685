import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { MeasurementSet } from '../../../shared/schemas/drivers';
import { LogChart, logYDomain } from '../../charts';
import { colors, space, ToggleChip } from '../../ui';
import {
  distortionSeries, excursionDomain, frequencyDomain, impedancePhaseSeries, impedanceSeries, largeSignalSeries, phaseDomain, setOverlaySeries, splDomain, splSeries,
} from '../logic/driver-series';

const palette = colors.series;

/** The measurement charts for one set (impedance as magnitude over phase), plus every set's on-axis response when there are several. */
export function DriverCharts({ set, sets }: { set: MeasurementSet | undefined; sets: readonly MeasurementSet[] }) {
  const [harmonics, setHarmonics] = useState({ h2: false, h3: false });
  const spl = useMemo(() => splSeries(set, palette), [set]);
  const overlay = useMemo(() => setOverlaySeries(sets, palette), [sets]);
  const z = useMemo(() => impedanceSeries(set, palette), [set]);
  const thd = useMemo(() => distortionSeries(set, harmonics, palette), [set, harmonics]);
  const large = useMemo(() => largeSignalSeries(set, palette), [set]);
  const splX = useMemo(() => frequencyDomain(spl), [spl]);
  const splY = useMemo(() => splDomain(spl), [spl]);
  const overlayY = useMemo(() => splDomain(overlay), [overlay]);
  const phase = useMemo(() => impedancePhaseSeries(set, palette), [set]);
  // Magnitude and phase share one frequency axis, so a resonance lines up across the two.
  const zX = useMemo(() => frequencyDomain([...z, ...phase]), [z, phase]);
  const phaseY = useMemo(() => phaseDomain(phase), [phase]);
  const thdX = useMemo(() => frequencyDomain(thd), [thd]);
  // Past 100 % the fundamental is lost in its harmonics; the axis stops there and clips the rest.
  const thdY = useMemo((): [number, number] => {
    const [a, b] = logYDomain(thd);
    return [a, Math.max(a * 10, Math.min(b, 100))];
  }, [thd]);
  const largeX = useMemo(() => excursionDomain(large), [large]);
  const volts = set ? `${set.driveVoltageV} V / ${set.distanceM} m` : '2.83 V / 1 m';
  return (
    <View style={styles.charts}>
      <LogChart testID="chart-spl" title={`Frequency response on and off axis, ${volts}`} series={spl} xDomain={splX} yDomain={splY} yUnit="dB SPL" yStep={5} legend emptyText="No response measured." />
      {sets.length > 1 ? (
        <LogChart testID="chart-sets" title="On-axis response of every measurement set" series={overlay} xDomain={frequencyDomain(overlay)} yDomain={overlayY} yUnit="dB SPL" yStep={5} legend height={220} />
      ) : null}
      <View style={styles.pair}>
        <LogChart testID="chart-impedance" title="Impedance magnitude, measured and fitted model" series={z} xDomain={zX} yUnit="Ω" yStep={z.length && Math.max(...z.flatMap((s) => s.y)) > 40 ? 10 : 5} legend emptyText="No impedance measured." />
        <LogChart testID="chart-impedance-phase" title="Impedance phase" series={phase} xDomain={zX} yDomain={phaseY} yStep={30} yUnit="degrees" height={170} legend emptyText="No impedance phase measured." />
      </View>
      <View style={styles.chartWithToggles}>
        <View style={styles.toggles}>
          <ToggleChip label="H2" selected={harmonics.h2} onPress={() => setHarmonics((h) => ({ ...h, h2: !h.h2 }))} testID="toggle-h2" />
          <ToggleChip label="H3" selected={harmonics.h3} onPress={() => setHarmonics((h) => ({ ...h, h3: !h.h3 }))} testID="toggle-h3" />
        </View>
        <LogChart testID="chart-thd" title="Distortion per drive level (log scale)" series={thd} xDomain={thdX} yDomain={thdY} yUnit="% of fundamental" yScale="log" legend emptyText="No distortion measured." />
      </View>
      <LogChart
        testID="chart-large-signal"
        title="Large-signal Bl(x), Kms(x), Le(x)"
        series={large}
        xDomain={largeX}
        xScale="linear"
        xLabel="cone excursion (mm)"
        yUnit="% of value at rest"
        yStep={10}
        legend
        emptyText="No large-signal measurement."
      />
    </View>
  );
}

const styles = StyleSheet.create({
  charts: { gap: space.md },
  pair: { gap: space.xs },
  chartWithToggles: { gap: space.xs },
  toggles: { flexDirection: 'row', gap: space.xs, justifyContent: 'flex-end' },
});
