// Small shared controls. Pressables carry accessibility roles and states so they work with a
// keyboard and a screen reader, and so browser tests can find them by role and name.
import { useEffect, useRef, useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View, type StyleProp, type TextInputProps, type ViewStyle } from 'react-native';
import { colors, fonts, radius, space } from '../theme';

export function ActionButton({
  label, onPress, testID, kind = 'primary', disabled, accessibilityLabel, style,
}: {
  label: string;
  onPress: () => void;
  testID?: string;
  kind?: 'primary' | 'secondary' | 'quiet';
  disabled?: boolean;
  accessibilityLabel?: string;
  style?: StyleProp<ViewStyle>;
}) {
  return (
    <Pressable
      onPress={onPress}
      disabled={disabled}
      testID={testID}
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ disabled: Boolean(disabled) }}
      style={({ pressed }) => [styles.button, styles[kind], disabled && styles.disabled, pressed && styles.pressed, style]}
    >
      <Text style={[styles.buttonText, kind === 'primary' ? styles.primaryText : styles.secondaryText]}>{label}</Text>
    </Pressable>
  );
}

/** A toggle chip with an optional count beside its label (facet counts). */
export function ToggleChip({
  label, selected, onPress, count, testID, disabled,
}: {
  label: string;
  selected: boolean;
  onPress: () => void;
  count?: number;
  testID?: string;
  disabled?: boolean;
}) {
  return (
    <Pressable
      onPress={onPress}
      testID={testID}
      disabled={disabled}
      accessibilityRole="checkbox"
      accessibilityState={{ checked: selected, disabled: Boolean(disabled) }}
      accessibilityLabel={count != null ? `${label} (${count})` : label}
      style={({ pressed }) => [styles.chip, selected && styles.chipOn, disabled && styles.disabled, pressed && styles.pressed]}
    >
      <Text style={[styles.chipText, selected && styles.chipTextOn]}>{label}</Text>
      {count != null ? <Text style={[styles.chipCount, selected && styles.chipTextOn]}>{count}</Text> : null}
    </Pressable>
  );
}

/**
 * A text input that keeps its own text while the user types and reports it `delay` ms after the
 * last key, so a URL or a request follows the typing without one update per key.
 */
export function DebouncedTextInput({
  value, onCommit, delay = 250, style, ...rest
}: Omit<TextInputProps, 'value' | 'onChangeText'> & { value: string; onCommit: (text: string) => void; delay?: number }) {
  const [text, setText] = useState(value);
  const committed = useRef(value);
  const commit = useRef(onCommit);
  commit.current = onCommit;
  // An outside change (back button, Clear) replaces the text; the echo of our own commit does not,
  // or a trailing space being typed would vanish.
  useEffect(() => {
    if (value.trim() !== committed.current.trim()) {
      committed.current = value;
      setText(value);
    }
  }, [value]);
  useEffect(() => {
    if (text.trim() === committed.current.trim()) return;
    const t = setTimeout(() => {
      committed.current = text;
      commit.current(text);
    }, delay);
    return () => clearTimeout(t);
  }, [text, delay]);
  return <TextInput {...rest} value={text} onChangeText={setText} style={[styles.input, style]} placeholderTextColor={colors.inkSoft} />;
}

export function Card({ children, style, testID }: { children: ReactNode; style?: StyleProp<ViewStyle>; testID?: string }) {
  return (
    <View style={[styles.card, style]} testID={testID}>
      {children}
    </View>
  );
}

export function SectionTitle({ children }: { children: ReactNode }) {
  return (
    <Text style={styles.sectionTitle} accessibilityRole="header">
      {children}
    </Text>
  );
}

const styles = StyleSheet.create({
  button: { paddingHorizontal: space.lg, paddingVertical: space.sm, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center', borderWidth: 1 },
  primary: { backgroundColor: colors.accent, borderColor: colors.accent },
  secondary: { backgroundColor: colors.card, borderColor: colors.gridStrong },
  quiet: { backgroundColor: 'transparent', borderColor: 'transparent', paddingHorizontal: space.sm },
  disabled: { opacity: 0.5 },
  pressed: { opacity: 0.75 },
  buttonText: { fontFamily: fonts.semibold, fontSize: 14 },
  primaryText: { color: colors.card },
  secondaryText: { color: colors.ink },
  chip: {
    flexDirection: 'row', alignItems: 'center', gap: 6, paddingHorizontal: space.md, paddingVertical: 6, borderRadius: 999,
    borderWidth: 1, borderColor: colors.gridStrong, backgroundColor: colors.card, maxWidth: '100%',
  },
  chipOn: { backgroundColor: colors.accent, borderColor: colors.accent },
  chipText: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink, flexShrink: 1 },
  chipTextOn: { color: colors.card },
  chipCount: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft, fontVariant: ['tabular-nums'] },
  input: {
    fontFamily: fonts.regular, fontSize: 15, color: colors.ink, backgroundColor: colors.card, borderWidth: 1,
    borderColor: colors.rule, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 6, minWidth: 0,
  },
  card: { backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule, padding: space.lg, gap: space.sm },
  sectionTitle: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
});
