import { StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, fonts, radius, space } from '../theme';
import { useInFieldGrid } from './field-grid';

interface FieldProps {
  label: string;
  unit: string;
  value: string;
  onChangeText: (text: string) => void;
  error?: string;
  placeholder?: string;
  testID: string;
  /** Words rather than a number (a description, a date). */
  inputMode?: 'decimal' | 'text';
  /** A short hint under the field. */
  hint?: string;
}

/** A labelled field for free text: the same look as a number field, without the number keypad. */
export function TextField(props: Omit<FieldProps, 'inputMode' | 'unit'> & { unit?: string }) {
  return <NumberField {...props} unit={props.unit ?? ''} inputMode="text" />;
}

export function NumberField({ label, unit, value, onChangeText, error, placeholder, testID, inputMode = 'decimal', hint }: FieldProps) {
  const inGrid = useInFieldGrid();
  return (
    // A long message gets the whole row rather than a tall sliver of text under a narrow box.
    <View style={[styles.field, inGrid && styles.cell, inGrid && error && error.length > 40 ? styles.fieldWide : null]}>
      <Text style={styles.label} nativeID={`${testID}-label`}>
        {label}
        {unit ? <Text style={styles.unit}> {unit}</Text> : null}
      </Text>
      <TextInput
        value={value}
        onChangeText={onChangeText}
        placeholder={placeholder}
        placeholderTextColor={colors.gridStrong}
        inputMode={inputMode}
        style={[styles.input, error ? styles.inputError : null]}
        accessibilityLabel={unit ? `${label} (${unit})` : label}
        aria-invalid={error ? true : undefined}
        testID={testID}
      />
      {hint && !error ? <Text style={styles.hint}>{hint}</Text> : null}
      {error ? (
        <Text style={styles.error} testID={`${testID}-error`} accessibilityLiveRegion="polite">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: 2 },
  cell: { flexGrow: 1, flexBasis: 120, minWidth: 110 },
  fieldWide: { flexBasis: '100%' },
  label: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  unit: { fontFamily: fonts.regular, color: colors.inkSoft },
  input: {
    fontFamily: fonts.regular, fontSize: 16, color: colors.ink, backgroundColor: colors.paper, borderWidth: 1,
    borderColor: colors.rule, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 6,
    fontVariant: ['tabular-nums'],
  },
  inputError: { borderColor: colors.warn },
  hint: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  error: { fontFamily: fonts.semibold, fontSize: 12, color: colors.warn },
});
