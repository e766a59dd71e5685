import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { useStackSelection } from '../../stack';
import { ActionButton, colors, fonts, space } from '../../ui';

/** Adds the driver to the comparison stack; shows its place in the stack or that it is full. */
export function StackButton({ slug }: { slug: string }) {
  const stack = useStackSelection();
  const inStack = stack.has(slug);
  const label = inStack ? `Added (${stack.count}/${stack.max})` : stack.full ? `Stack full (${stack.max})` : 'Add to stack';
  return (
    <View style={styles.row}>
      <ActionButton
        label={label}
        kind={inStack ? 'secondary' : 'primary'}
        disabled={!inStack && stack.full}
        onPress={() => (inStack ? undefined : stack.add(slug))}
        testID="stack-add"
      />
      {inStack ? <ActionButton kind="quiet" label="Remove" onPress={() => stack.remove(slug)} testID="stack-remove" /> : null}
      {stack.count > 0 ? (
        <Link href="/stack" style={styles.link} accessibilityRole="link" testID="stack-open">
          Open the stack
        </Link>
      ) : null}
      {!inStack && stack.full ? <Text style={styles.note}>Remove one from the stack to add this driver.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  link: { fontFamily: fonts.semibold, fontSize: 14, color: colors.accent },
  note: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
});
