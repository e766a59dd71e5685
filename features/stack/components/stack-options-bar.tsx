import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { OverlayOptions } from '../../../shared/schemas/overlay';
import { colors, DebouncedTextInput, fonts, space, ToggleChip } from '../../ui';
import { bandOf, DEFAULT_ALIGN_HZ, type LevelMode, type Smoothing } from '../logic/stack-options';

const levelChoices: { v: LevelMode; label: string }[] = [
  { v: 'raw', label: 'As measured' },
  { v: 'frequency', label: 'Align at a frequency' },
  { v: 'band', label: 'Align on the band mean' },
];
const smoothChoices: { v: Smoothing; label: string }[] = [
  { v: 'none', label: 'None' },
  { v: '1/12', label: '1/12 oct' },
  { v: '1/6', label: '1/6 oct' },
  { v: '1/3', label: '1/3 oct' },
];

function Group({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.group}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.chips}>{children}</View>
    </View>
  );
}

const numOrUndef = (t: string) => {
  const n = Number(t);
  return t.trim() && Number.isFinite(n) && n >= 10 && n <= 40000 ? n : undefined;
};

/** Every display choice; each change goes to the URL through onChange. */
export function StackOptionsBar({ o, onChange, thdLevels }: { o: OverlayOptions; onChange: (patch: Partial<OverlayOptions>) => void; thdLevels: readonly number[] }) {
  const band = bandOf(o);
  return (
    <View style={styles.bar} testID="stack-options">
      <Group label="Level">
        {levelChoices.map((c) => (
          <ToggleChip key={c.v} label={c.label} selected={o.level === c.v} onPress={() => onChange({ level: c.v })} testID={`level-${c.v}`} />
        ))}
        {o.level === 'frequency' ? (
          <View style={styles.inline}>
            <Text style={styles.small}>at</Text>
            <DebouncedTextInput value={String(o.alignHz ?? DEFAULT_ALIGN_HZ)} onCommit={(t) => onChange({ alignHz: numOrUndef(t) })} inputMode="numeric" style={styles.num} accessibilityLabel="Alignment frequency in Hz" testID="align-hz" />
            <Text style={styles.small}>Hz</Text>
          </View>
        ) : null}
      </Group>
      <Group label="Band">
        <View style={styles.inline}>
          <DebouncedTextInput value={String(band.lo)} onCommit={(t) => onChange({ bandLo: numOrUndef(t), bandHi: o.bandHi ?? band.hi })} inputMode="numeric" style={styles.num} accessibilityLabel="Band low edge in Hz" testID="band-lo" />
          <Text style={styles.small}>–</Text>
          <DebouncedTextInput value={String(band.hi)} onCommit={(t) => onChange({ bandHi: numOrUndef(t), bandLo: o.bandLo ?? band.lo })} inputMode="numeric" style={styles.num} accessibilityLabel="Band high edge in Hz" testID="band-hi" />
          <Text style={styles.small}>Hz</Text>
        </View>
        <ToggleChip label="Shade the band" selected={o.highlight} onPress={() => onChange({ highlight: !o.highlight })} testID="toggle-highlight" />
      </Group>
      <Group label="Smoothing">
        {smoothChoices.map((c) => (
          <ToggleChip key={c.v} label={c.label} selected={o.smoothing === c.v} onPress={() => onChange({ smoothing: c.v })} testID={`smoothing-${c.v.replace('/', '-')}`} />
        ))}
      </Group>
      <Group label="Show">
        <ToggleChip label="Off-axis angles" selected={o.offAxis} onPress={() => onChange({ offAxis: !o.offAxis })} testID="toggle-offaxis" />
        <ToggleChip label="H2 and H3" selected={o.harmonics} onPress={() => onChange({ harmonics: !o.harmonics })} testID="toggle-harmonics" />
        <ToggleChip label="THD in %" selected={o.thdUnit === 'percent'} onPress={() => onChange({ thdUnit: 'percent' })} testID="thd-percent" />
        <ToggleChip label="THD in dB" selected={o.thdUnit === 'db'} onPress={() => onChange({ thdUnit: 'db' })} testID="thd-db" />
      </Group>
      {thdLevels.length > 1 ? (
        <Group label="Drive level">
          {thdLevels.map((v) => (
            <ToggleChip key={v} label={`${v} V`} selected={o.thdLevelV === v || (o.thdLevelV == null && v === thdLevels[thdLevels.length - 1])} onPress={() => onChange({ thdLevelV: v })} testID={`thd-level-${v}`} />
          ))}
        </Group>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm },
  group: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  label: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft, minWidth: 70 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, alignItems: 'center', flexShrink: 1 },
  small: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  inline: { flexDirection: 'row', alignItems: 'center', gap: 4 },
  num: { width: 72 },
});
