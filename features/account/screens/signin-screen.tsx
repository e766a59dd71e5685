import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { ActionButton, colors, fonts, ScreenFrame } from '../../ui';
import { signInHref } from '../api/account-api';
import { goTo } from '../components/go-to';

export function SignInScreen() {
  const { failed, returnTo } = useLocalSearchParams<{ failed?: string; returnTo?: string }>();
  return (
    <ScreenFrame testID="signin-screen">
      <Text style={styles.h1} accessibilityRole="header">
        Sign in
      </Text>
      {failed ? <Text style={styles.warn}>Sign-in did not complete. Please try again.</Text> : null}
      <Text style={styles.lede}>Members keep shortlists and saved comparisons; reviewers submit measurements.</Text>
      <ActionButton label="Continue to sign in" onPress={() => goTo(signInHref(typeof returnTo === 'string' ? returnTo : '/'))} testID="signin-continue" />
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  lede: { fontFamily: fonts.regular, fontSize: 15, color: colors.inkSoft },
  warn: { fontFamily: fonts.semibold, fontSize: 15, color: colors.warn },
});
