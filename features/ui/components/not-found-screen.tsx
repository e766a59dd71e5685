import { Link } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { colors, fonts } from '../theme';
import { ScreenFrame } from './screen-frame';

export function NotFoundScreen() {
  return (
    <ScreenFrame testID="not-found-screen">
      <Text style={styles.h1}>Nothing on this page</Text>
      <Link href="/" style={styles.link}>Back to the catalogue</Link>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 24, color: colors.ink },
  link: { fontFamily: fonts.semibold, color: colors.accent, fontSize: 16 },
});
