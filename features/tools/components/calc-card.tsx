import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '../../ui';

/** One calculator: inputs, then results, then where the formulas and constants come from. */
export function CalcCard({
  title, lede, children, source, constants, caution, pending, testID,
}: {
  title: string;
  lede?: string;
  children: ReactNode;
  source: string;
  constants: string;
  caution?: string;
  pending?: boolean;
  testID: string;
}) {
  return (
    <View style={styles.card} testID={testID}>
      <View style={styles.head}>
        <Text style={styles.title} accessibilityRole="header">{title}</Text>
        {pending ? <ActivityIndicator size="small" color={colors.accent} /> : null}
      </View>
      {lede ? <Text style={styles.lede}>{lede}</Text> : null}
      {children}
      <View style={styles.foot}>
        <Text style={styles.meta} testID={`${testID}-source`}>
          <Text style={styles.metaLabel}>Source: </Text>
          {source}
        </Text>
        <Text style={styles.meta} testID={`${testID}-constants`}>
          <Text style={styles.metaLabel}>Constants: </Text>
          {constants}
        </Text>
        {caution ? <Text style={styles.caution}>⚠ {caution}</Text> : null}
      </View>
    </View>
  );
}

export function ResultBlock({ children, message, testID }: { children?: ReactNode; message?: string; testID: string }) {
  return (
    <View style={styles.results} testID={testID}>
      {message ? <Text style={styles.placeholder}>{message}</Text> : children}
    </View>
  );
}

/** What the result area says while there is no result to show. */
export function waitingMessage(sent: boolean, calc: { pending: boolean; error?: string; fieldErrors: Record<string, string> }, empty: string): string {
  if (!sent) return empty;
  if (calc.pending) return 'Calculating…';
  return calc.error || Object.keys(calc.fieldErrors).length > 0 ? 'Correct the marked input to see the result.' : empty;
}

export function FormError({ message, testID }: { message?: string; testID: string }) {
  if (!message) return null;
  return <Text style={styles.formError} testID={testID}>{message}</Text>;
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule,
    padding: space.lg, gap: space.md,
  },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  title: { fontFamily: fonts.bold, fontSize: 18, color: colors.ink },
  lede: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkSoft },
  results: { backgroundColor: colors.paper, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.xs },
  placeholder: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft, paddingVertical: space.sm },
  foot: { gap: 2, borderTopWidth: StyleSheet.hairlineWidth, borderTopColor: colors.rule, paddingTop: space.sm },
  meta: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  metaLabel: { fontFamily: fonts.semibold, color: colors.ink },
  caution: { fontFamily: fonts.regular, fontSize: 12, color: colors.warn, marginTop: space.xs },
  formError: { fontFamily: fonts.semibold, fontSize: 13, color: colors.warn },
});
