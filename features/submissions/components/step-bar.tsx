import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '../../ui';

/** Numbered steps; any step can be opened, and a step with something missing is marked. */
export function StepBar({ steps, current, onPick }: { steps: readonly { label: string; complete: boolean }[]; current: number; onPick: (i: number) => void }) {
  return (
    <View style={styles.row} accessibilityRole="tablist">
      {steps.map((s, i) => {
        const on = i === current;
        return (
          <Pressable
            key={s.label}
            onPress={() => onPick(i)}
            accessibilityRole="tab"
            accessibilityState={{ selected: on }}
            accessibilityLabel={`Step ${i + 1}: ${s.label}${s.complete ? ', complete' : ''}`}
            style={[styles.step, on && styles.on]}
            testID={`submit-stepbar-${i + 1}`}
          >
            <Text style={[styles.num, on && styles.numOn, s.complete && !on && styles.done]}>{s.complete && !on ? '✓' : i + 1}</Text>
            <Text style={[styles.label, on && styles.labelOn]}>{s.label}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  step: { flexDirection: 'row', alignItems: 'center', gap: 6, paddingHorizontal: space.sm, paddingVertical: 6, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.rule, backgroundColor: colors.card },
  on: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  num: { fontFamily: fonts.bold, fontSize: 12, color: colors.inkSoft, minWidth: 14, textAlign: 'center' },
  numOn: { color: colors.accent },
  done: { color: colors.accent },
  label: { fontFamily: fonts.semibold, fontSize: 13, color: colors.inkSoft },
  labelOn: { color: colors.accent },
});
