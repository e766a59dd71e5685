import { StyleSheet, Text, View } from 'react-native';
import type { DerivedFigures } from '../../../shared/schemas/drivers';
import { Card, colors, fonts, radius, space } from '../../ui';
import { hz, mm, num } from './detail-format';

function Row({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.row} testID={testID}>
      <Text style={styles.label}>{label}</Text>
      <Text style={styles.value}>{value}</Text>
    </View>
  );
}

function Group({ title, children, source }: { title: string; children: React.ReactNode; source?: string }) {
  return (
    <View style={styles.group}>
      <Text style={styles.groupTitle}>{title}</Text>
      {children}
      {source ? <Text style={styles.source}>Source: {source}</Text> : null}
    </View>
  );
}

/** What the server derived from the selected set over the band in use. */
export function FiguresPanel({ figures, bandFromUrl }: { figures: DerivedFigures | undefined; bandFromUrl: boolean }) {
  if (!figures) return <Text style={styles.source}>No derived figures for this set.</Text>;
  const f = figures;
  return (
    <Card testID="figures-panel">
      <Text style={styles.title} accessibilityRole="header">Derived figures</Text>
      <Text style={styles.source} testID="figures-band">
        Band {hz(f.band.lo)}–{hz(f.band.hi)} {bandFromUrl ? '(from your role search)' : '(the usual band for this type)'}
      </Text>
      <Group title="In band">
        <Row label="Sensitivity, 2.83 V / 1 m" value={num(f.sensitivityDb, 1, 'dB')} testID="figure-sensitivity" />
        <Row label="Linearity" value={f.linearity ? `+${f.linearity.maxUpDb.toFixed(1)} / −${Math.abs(f.linearity.maxDownDb).toFixed(1)} dB (span ${f.linearity.spanDb.toFixed(1)} dB)` : '—'} testID="figure-linearity" />
      </Group>
      <Group title="Directivity and breakup">
        <Row label="Beaming, half wavelength = diameter" value={hz(f.beaming.halfWaveHz)} />
        <Row label="Beaming, ka = 1" value={hz(f.beaming.ka1Hz)} />
        <Row
          label={`Beaming, measured (${f.beaming.dropDb} dB down${f.beaming.angleDeg != null ? ` at ${f.beaming.angleDeg}°` : ''})`}
          value={hz(f.beaming.measuredHz)}
          testID="figure-beaming"
        />
        <Row label="First breakup" value={f.breakup ? `${hz(f.breakup.frequency)}, ${f.breakup.level > 0 ? '+' : ''}${f.breakup.level.toFixed(1)} dB` : 'none found'} />
      </Group>
      <Group title="Distortion">
        <Row label={f.thdLimit ? `THD above ${f.thdLimit.limitPercent} % at ${f.thdLimit.driveLevelV} V` : 'THD limit'} value={f.thdLimit ? (f.thdLimit.fromHz != null ? `below ${hz(f.thdLimit.fromHz)}` : 'nowhere in band') : '—'} />
        <Row label={`IMD${f.imd?.driveLevelV != null ? ` at ${f.imd.driveLevelV} V` : ''}`} value={f.imd ? `mean ${f.imd.meanPercent.toFixed(2)} %, max ${f.imd.maxPercent.toFixed(2)} %` : '—'} />
      </Group>
      {f.usableBand ? (
        <Group title={`Usable band ${hz(f.usableBand.lowHz)}–${hz(f.usableBand.highHz)}`}>
          {f.usableBand.reasons.map((r, i) => (
            <View key={i} style={[styles.reason, r.governs && styles.governs]} testID={r.governs ? `usable-governs-${r.edge}` : undefined}>
              <Text style={styles.reasonHead}>
                {r.edge === 'low' ? 'Low edge' : 'High edge'} {hz(r.frequency)} · {r.figure}
                {r.governs ? ' · sets this edge' : ''}
              </Text>
              <Text style={styles.reasonText}>{r.reason}</Text>
            </View>
          ))}
        </Group>
      ) : null}
      {f.closedBox ? (
        <Group title="Closed box suggestion" source={f.closedBox.source}>
          <Row label="Volume" value={num(f.closedBox.vbL, 1, 'L')} />
          <Row label="Qtc" value={num(f.closedBox.qtc, 2)} />
          <Row label="Fc / F3" value={`${hz(f.closedBox.fc)} / ${hz(f.closedBox.f3)}`} />
        </Group>
      ) : null}
      {f.ventedBox ? (
        <Group title={`Vented box suggestion (${f.ventedBox.alignment})`} source={f.ventedBox.source}>
          <Row label="Volume" value={num(f.ventedBox.vbL, 1, 'L')} />
          <Row label="Tuning Fb / F3" value={`${hz(f.ventedBox.fb)} / ${hz(f.ventedBox.f3)}`} />
        </Group>
      ) : null}
      {f.excursion ? (
        <Group title="Excursion limits" source={f.excursion.source}>
          <Row label="Xmax (governing)" value={`${mm(f.excursion.xmaxMm)} · by ${f.excursion.governedBy}`} testID="figure-xmax" />
          <Row label="X(Bl) / X(C) / X(L)" value={`${mm(f.excursion.xBlMm)} / ${mm(f.excursion.xCMm)} / ${mm(f.excursion.xLMm)}`} />
          {f.excursion.offsetMm != null ? <Row label="Coil rest offset" value={mm(f.excursion.offsetMm)} /> : null}
          {f.vdCm3 != null ? <Row label="Vd (Sd × Xmax)" value={num(f.vdCm3, 1, 'cm³')} /> : null}
        </Group>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  title: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  group: { gap: 2, paddingTop: space.xs },
  groupTitle: { fontFamily: fonts.semibold, fontSize: 13, color: colors.accent, textTransform: 'uppercase', letterSpacing: 0.6 },
  row: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, paddingVertical: 2 },
  label: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft, flexShrink: 1 },
  value: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink, textAlign: 'right', fontVariant: ['tabular-nums'], flexShrink: 1 },
  source: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  reason: { borderLeftWidth: 3, borderLeftColor: colors.rule, paddingLeft: space.sm, paddingVertical: 2, borderRadius: radius.sm },
  governs: { borderLeftColor: colors.accent, backgroundColor: colors.accentSoft },
  reasonHead: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  reasonText: { fontFamily: fonts.regular, fontSize: 12, color: colors.ink },
});
