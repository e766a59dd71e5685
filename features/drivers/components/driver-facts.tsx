import { StyleSheet, Text, View } from 'react-native';
import type { DriverDetail, MeasurementSet } from '../../../shared/schemas/drivers';
import { Card, colors, fonts, radius, space, ToggleChip } from '../../ui';
import { cautionsFor } from '../logic/driver-notes';
import { mm } from './detail-format';
import { formatParameter, formatPrice } from './parameter-format';

function Line({ label, value }: { label: string; value: string | null | undefined }) {
  if (value == null || value === '') return null;
  return (
    <View style={styles.line}>
      <Text style={styles.label}>{label}</Text>
      <Text style={styles.value}>{value}</Text>
    </View>
  );
}

const burnIn = { 'out-of-box': 'out of the box', 'burned-in': 'burned in' } as const;

export function setSummary(s: MeasurementSet): string {
  return [s.reviewer, s.sampleId ? `sample ${s.sampleId}` : null, burnIn[s.burnIn]].filter(Boolean).join(' · ');
}

/** Chooses which measurement set the page shows when a driver has more than one. */
export function SetPicker({ sets, selectedId, onSelect }: { sets: readonly MeasurementSet[]; selectedId: number | undefined; onSelect: (id: number) => void }) {
  if (sets.length < 2) return null;
  return (
    <View style={styles.picker} testID="set-picker">
      <Text style={styles.label}>Measurement set</Text>
      <View style={styles.chips}>
        {sets.map((s) => (
          <ToggleChip key={s.id} label={`${s.label} (${setSummary(s)})`} selected={s.id === selectedId} onPress={() => onSelect(s.id)} testID={`set-${s.id}`} />
        ))}
      </View>
    </View>
  );
}

export function SpreadTable({ spread }: { spread: DriverDetail['spread'] }) {
  if (spread.length === 0) return null;
  return (
    <Card testID="spread-table">
      <Text style={styles.title} accessibilityRole="header">Sample-to-sample spread</Text>
      <View style={[styles.trow, styles.thead]}>
        <Text style={[styles.tcell, styles.tname, styles.th]}>Parameter</Text>
        <Text style={[styles.tcell, styles.th]}>Min</Text>
        <Text style={[styles.tcell, styles.th]}>Max</Text>
        <Text style={[styles.tcell, styles.th]}>±%</Text>
      </View>
      {spread.map((p) => {
        const lo = formatParameter(p.name, p.min);
        const hi = formatParameter(p.name, p.max);
        return (
          <View key={p.name} style={styles.trow}>
            <Text style={[styles.tcell, styles.tname]}>
              {lo.label}
              {lo.unit ? <Text style={styles.unit}> {lo.unit}</Text> : null}
              <Text style={styles.unit}> · {p.sets} sets</Text>
            </Text>
            <Text style={styles.tcell}>{lo.text}</Text>
            <Text style={styles.tcell}>{hi.text}</Text>
            <Text style={[styles.tcell, p.spreadPercent > 10 && styles.warnText]}>±{p.spreadPercent.toFixed(1)}</Text>
          </View>
        );
      })}
    </Card>
  );
}

export function MethodBlock({ set }: { set: MeasurementSet | undefined }) {
  if (!set) return <Text style={styles.label}>No approved measurements yet.</Text>;
  return (
    <Card testID="method-block">
      <Text style={styles.title} accessibilityRole="header">How it was measured</Text>
      <Line label="Drive" value={`${set.driveVoltageV} V at ${set.distanceM} m`} />
      <Line label="Baffle / enclosure" value={set.baffle} />
      <Line label="Gating" value={set.gating} />
      <Line label="Temperature" value={set.temperatureC != null ? `${set.temperatureC} °C` : null} />
      <Line label="Date" value={set.measuredOn} />
      <Line label="Sample" value={set.sampleId} />
      <Line label="Burn-in" value={burnIn[set.burnIn]} />
      <Line label="Reviewer" value={set.reviewer} />
      <Line label="Angles" value={set.anglesDeg.length ? set.anglesDeg.map((a) => `${a}°`).join(', ') : null} />
    </Card>
  );
}

const availability = { 'in-production': 'In production', limited: 'Limited stock', discontinued: 'Discontinued' } as const;

export function DriverInfo({ driver }: { driver: DriverDetail }) {
  const m = driver.mounting;
  return (
    <Card testID="driver-info">
      <Text style={styles.title} accessibilityRole="header">Build and mounting</Text>
      <Line label="Cutout" value={m?.cutoutDiameterMm != null ? mm(m.cutoutDiameterMm) : null} />
      <Line label="Outer diameter" value={m?.outerDiameterMm != null ? mm(m.outerDiameterMm) : null} />
      <Line label="Mounting depth" value={m?.mountingDepthMm != null ? mm(m.mountingDepthMm) : null} />
      <Line label="Bolt circle" value={m?.boltCircleMm != null ? mm(m.boltCircleMm) : null} />
      <Line label="Holes" value={m?.holeCount != null ? String(m.holeCount) : null} />
      <Line label="Diaphragm" value={driver.diaphragm} />
      <Line label="Surround" value={driver.surround} />
      <Line label="Voice coil" value={driver.voiceCoilDiameterMm != null ? `${mm(driver.voiceCoilDiameterMm)} diameter` : null} />
      <Line label="Magnet" value={driver.magnet} />
      <Line label="Availability" value={driver.availability ? availability[driver.availability] : null} />
      <Line label="Price" value={formatPrice(driver.price, driver.currency)} />
      <Line label="Also listed as" value={driver.aliases.length ? driver.aliases.join(', ') : null} />
    </Card>
  );
}

export function CautionsBlock({ driver }: { driver: DriverDetail }) {
  return (
    <View style={styles.cautions} testID="driver-cautions" accessibilityRole="summary">
      <Text style={styles.cautionTitle}>Safety</Text>
      {cautionsFor(driver).map((c) => (
        <Text key={c.id} style={styles.cautionText} testID={`caution-${c.id}`}>
          <Text style={styles.cautionHead}>{c.title}. </Text>
          {c.text}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  title: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  line: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, paddingVertical: 2 },
  label: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  value: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink, textAlign: 'right', flexShrink: 1 },
  picker: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  trow: { flexDirection: 'row', paddingVertical: 3, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.rule },
  thead: { paddingVertical: 2 },
  th: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft },
  tcell: { flex: 1, textAlign: 'right', fontFamily: fonts.regular, fontSize: 13, color: colors.ink, fontVariant: ['tabular-nums'] },
  tname: { flex: 2, textAlign: 'left', fontFamily: fonts.semibold },
  unit: { fontFamily: fonts.regular, fontSize: 11, color: colors.inkSoft },
  warnText: { color: colors.warn, fontFamily: fonts.semibold },
  cautions: { backgroundColor: '#fdf3e7', borderColor: '#e8c9a0', borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  cautionTitle: { fontFamily: fonts.bold, fontSize: 14, color: colors.warn },
  cautionHead: { fontFamily: fonts.semibold, color: colors.ink },
  cautionText: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink },
});
