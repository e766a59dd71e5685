import { StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, fonts, radius, space } from '../../ui';

export function NumberField({
  label, unit, value, onChangeText, error, placeholder, testID,
}: {
  label: string;
  unit: string;
  value: string;
  onChangeText: (text: string) => void;
  error?: string;
  placeholder?: string;
  testID: string;
}) {
  return (
    // A long message gets the whole row rather than a tall sliver of text under a narrow box.
    <View style={[styles.field, error && error.length > 40 ? styles.fieldWide : null]}>
      <Text style={styles.label} nativeID={`${testID}-label`}>
        {label}
        {unit ? <Text style={styles.unit}> {unit}</Text> : null}
      </Text>
      <TextInput
        value={value}
        onChangeText={onChangeText}
        placeholder={placeholder}
        placeholderTextColor={colors.gridStrong}
        inputMode="decimal"
        style={[styles.input, error ? styles.inputError : null]}
        accessibilityLabel={unit ? `${label} (${unit})` : label}
        aria-invalid={error ? true : undefined}
        testID={testID}
      />
      {error ? (
        <Text style={styles.error} testID={`${testID}-error`} accessibilityLiveRegion="polite">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { flexGrow: 1, flexBasis: 120, minWidth: 110, gap: 2 },
  fieldWide: { flexBasis: '100%' },
  label: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  unit: { fontFamily: fonts.regular, color: colors.inkSoft },
  input: {
    fontFamily: fonts.regular, fontSize: 16, color: colors.ink, backgroundColor: colors.paper, borderWidth: 1,
    borderColor: colors.rule, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 6,
    fontVariant: ['tabular-nums'],
  },
  inputError: { borderColor: colors.warn },
  error: { fontFamily: fonts.semibold, fontSize: 12, color: colors.warn },
});
