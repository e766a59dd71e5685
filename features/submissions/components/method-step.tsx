import { StyleSheet, Text, View } from 'react-native';
import { ChoiceToggle, colors, FieldGrid, fonts, NumberField, space, TextField } from '../../ui';
import { splShiftDb, readNumber, type MethodText } from '../logic/draft';

/** Step 2: how the curves were taken, so the server can refer them to 2.83 V / 1 m. */
export function MethodStep({ value, onChange }: { value: MethodText; onChange: (patch: Partial<MethodText>) => void }) {
  const v = readNumber(value.driveVoltage);
  const d = readNumber(value.distance);
  const shift = v && d && v > 0 && d > 0 ? splShiftDb(v, d) : null;
  return (
    <View style={styles.gap} testID="submit-step-method">
      <View style={styles.caution} testID="submit-hearing-caution" accessibilityRole="alert">
        <Text style={styles.cautionTitle}>Before you measure</Text>
        <Text style={styles.cautionText}>
          Sweeps at high drive are loud enough to damage hearing: wear hearing protection, keep others out of the room and keep sweeps short. Stay
          within the driver&apos;s rated power and excursion and the amplifier&apos;s ratings, start low and step up, and watch for a voice coil
          running hot. Follow the safety rules and any noise limits that apply where you work.
        </Text>
      </View>
      <FieldGrid>
        <NumberField label="Drive voltage" unit="V rms" value={value.driveVoltage} onChangeText={(driveVoltage) => onChange({ driveVoltage })} testID="submit-voltage" placeholder="2.83" />
        <NumberField label="Distance" unit="m" value={value.distance} onChangeText={(distance) => onChange({ distance })} testID="submit-distance" placeholder="1" />
        <NumberField label="Temperature" unit="°C" value={value.temperature} onChangeText={(temperature) => onChange({ temperature })} testID="submit-temperature" placeholder="20" />
        <TextField label="Date measured" value={value.measuredOn} onChangeText={(measuredOn) => onChange({ measuredOn })} testID="submit-date" placeholder="YYYY-MM-DD" />
        <TextField label="Sample id" value={value.sampleId} onChangeText={(sampleId) => onChange({ sampleId })} testID="submit-sample" placeholder="serial or your own label" />
      </FieldGrid>
      <TextField
        label="Baffle or enclosure"
        value={value.baffle}
        onChangeText={(baffle) => onChange({ baffle })}
        testID="submit-baffle"
        placeholder="e.g. 600 × 400 mm flat baffle, or a 2 L closed box"
      />
      <TextField
        label="Gating or windowing"
        value={value.gating}
        onChangeText={(gating) => onChange({ gating })}
        testID="submit-gating"
        placeholder="e.g. 6 ms gate above 300 Hz"
      />
      <Text style={styles.label}>Burn-in</Text>
      <ChoiceToggle
        label="Burn-in"
        options={[{ value: 'out-of-box', label: 'Out of the box' }, { value: 'burned-in', label: 'After burn-in' }]}
        value={value.burnIn}
        onChange={(burnIn) => onChange({ burnIn })}
        testID="submit-burnin"
      />
      <Text style={styles.note} testID="submit-shift">
        {shift === null
          ? 'Give the drive voltage and distance; responses are referred to 2.83 V / 1 m from them.'
          : `Responses will be shifted ${shift >= 0 ? '+' : ''}${shift.toFixed(2)} dB to refer them to 2.83 V / 1 m.`}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.md },
  label: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  caution: { borderLeftWidth: 3, borderLeftColor: colors.warn, paddingLeft: space.sm, gap: 2 },
  cautionTitle: { fontFamily: fonts.semibold, fontSize: 14, color: colors.warn },
  cautionText: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink },
  note: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
});
