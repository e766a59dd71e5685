import { StyleSheet, Text, View } from 'react-native';
import { ActionButton, Card, colors, DebouncedTextInput, fonts, space, ToggleChip } from '../../ui';
import { applyPreset, clearRole, hasRole, roleBandProblem, rolePresets, withParams, type ListParams, type RolePreset } from '../logic/list-query';

const numeric = (s: string) => s.replace(/,/g, '.').replace(/[^0-9.]/g, '');

function presetActive(params: ListParams, p: RolePreset): boolean {
  return params.bandLo === p.params.bandLo && params.bandHi === p.params.bandHi && (params.level ?? '') === p.params.level;
}

/** "Fit for a role": the band and level the driver must cover; ranks the results when complete. */
export function RoleSearch({ params, onChange }: { params: ListParams; onChange: (next: ListParams) => void }) {
  const field = (name: 'bandLo' | 'bandHi' | 'level', label: string, placeholder: string) => (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <DebouncedTextInput
        value={params[name] ?? ''}
        onCommit={(t) => onChange(withParams(params, { [name]: numeric(t) }))}
        placeholder={placeholder}
        inputMode="decimal"
        accessibilityLabel={label}
        testID={`role-${name}`}
        style={styles.input}
      />
    </View>
  );
  const problem = roleBandProblem(params);
  return (
    <Card testID="role-search">
      <View style={styles.head}>
        <Text style={styles.title} accessibilityRole="header">Fit for a role</Text>
        {hasRole(params) ? <ActionButton kind="quiet" label="Clear role" onPress={() => onChange(clearRole(params))} testID="role-clear" /> : null}
      </View>
      <Text style={styles.note}>Give the band the driver must cover and how loud it must play; results are ranked by how well each one fits.</Text>
      <View style={styles.chips}>
        {rolePresets.map((p) => (
          <ToggleChip key={p.id} label={p.label} selected={presetActive(params, p)} onPress={() => onChange(applyPreset(params, p))} testID={`role-preset-${p.id}`} />
        ))}
      </View>
      <View style={styles.fields}>
        {field('bandLo', 'Band low (Hz)', '300')}
        {field('bandHi', 'Band high (Hz)', '3000')}
        {field('level', 'Level (dB SPL at 1 m)', '90')}
      </View>
      {problem ? (
        <Text style={styles.problem} testID="role-band-problem" accessibilityRole="alert">
          {problem}; the list is not ranked until the band is fixed.
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  title: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  note: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  field: { gap: 2, flexGrow: 1, flexBasis: 100 },
  label: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft },
  input: { width: '100%' },
  problem: { fontFamily: fonts.semibold, fontSize: 13, color: colors.warn },
});
