import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '../theme';

/** The shared page chrome: brand bar, then a scrolling content column capped for wide screens. */
export function ScreenFrame({ testID, children }: { testID: string; children: ReactNode }) {
  return (
    <View style={styles.root} testID={testID}>
      <View style={styles.bar}>
        <Link href="/" style={styles.brand} accessibilityRole="link">
          <Text style={styles.brandMark}>◖</Text>
          <Text style={styles.brandText}> Conestack</Text>
        </Link>
        <Link href="/tools" style={styles.navLink} accessibilityRole="link" testID="nav-tools">Tools</Link>
        <Text style={styles.tagline}>measured drive units, side by side</Text>
      </View>
      <ScrollView contentContainerStyle={styles.content}>{children}</ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  bar: {
    flexDirection: 'row', alignItems: 'baseline', flexWrap: 'wrap', gap: space.md,
    paddingHorizontal: space.lg, paddingVertical: space.md, backgroundColor: colors.ink,
  },
  brand: { flexDirection: 'row', alignItems: 'baseline' },
  brandMark: { color: '#5eead4', fontSize: 20, fontFamily: fonts.bold },
  brandText: { color: colors.paper, fontSize: 20, fontFamily: fonts.bold, letterSpacing: 0.3 },
  navLink: { color: '#5eead4', fontSize: 15, fontFamily: fonts.semibold },
  tagline: { color: '#b9c4cc', fontSize: 13, fontFamily: fonts.regular },
  content: { padding: space.lg, gap: space.lg, width: '100%', maxWidth: 1280, alignSelf: 'center' },
});
