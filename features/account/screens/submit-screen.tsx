import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, ScreenFrame, space } from '../../ui';
import { RequireRole } from '../components/require-role';

/** The reviewer's desk. The upload steps arrive with the submission flow; the cautions apply now. */
export function SubmitScreen() {
  return (
    <ScreenFrame testID="submit-screen">
      <Text style={styles.h1} accessibilityRole="header">
        Submit measurements
      </Text>
      <RequireRole role="reviewer">
        <View style={styles.card}>
          <Text style={styles.body}>Uploading measurement files opens here with the submission flow. Until then, no submission is pending.</Text>
          <Text style={styles.caution}>
            Before measuring: wear hearing protection at high test levels, keep sweeps short, and stay within the amplifier's and the driver's power ratings.
          </Text>
        </View>
      </RequireRole>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  card: { backgroundColor: colors.card, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.md, gap: space.sm },
  body: { fontFamily: fonts.regular, fontSize: 15, color: colors.ink },
  caution: { fontFamily: fonts.semibold, fontSize: 14, color: colors.warn },
});
