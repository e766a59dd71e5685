import { Link } from 'expo-router';
import { useSyncExternalStore, type ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space } from '../theme';
import { useBarAccessory } from './app-providers';

// The stack lives in features/stack, which builds on ui; the count is read from the same storage
// key and refreshed by the event the stack store fires, so ui needs no import from it.
const STACK_KEY = 'conestack.stack';
const STACK_EVENT = 'conestack:stack';

function readStackCount(): number {
  try {
    const v: unknown = JSON.parse(window.localStorage.getItem(STACK_KEY) ?? '[]');
    return Array.isArray(v) ? Math.min(4, v.length) : 0;
  } catch {
    return 0;
  }
}

function subscribeStackCount(listener: () => void): () => void {
  window.addEventListener(STACK_EVENT, listener);
  window.addEventListener('storage', listener);
  return () => {
    window.removeEventListener(STACK_EVENT, listener);
    window.removeEventListener('storage', listener);
  };
}

function useStackCount(): number {
  return useSyncExternalStore(subscribeStackCount, readStackCount, () => 0);
}

/** The shared page chrome: brand bar, then a scrolling content column capped for wide screens. */
export function ScreenFrame({ testID, children }: { testID: string; children: ReactNode }) {
  const stackCount = useStackCount();
  const Accessory = useBarAccessory();
  return (
    <View style={styles.root} testID={testID}>
      <View style={styles.bar}>
        <Link href="/" style={styles.brand} accessibilityRole="link">
          <Text style={styles.brandMark}>◖</Text>
          <Text style={styles.brandText}> Conestack</Text>
        </Link>
        <Link href="/tools" style={styles.navLink} accessibilityRole="link" testID="nav-tools">Tools</Link>
        <Link href="/stack" style={styles.navLink} accessibilityRole="link" testID="nav-stack">Stack ({stackCount})</Link>
        <Text style={styles.tagline}>measured drive units, side by side</Text>
        {Accessory ? (
          <View style={styles.accessory}>
            <Accessory />
          </View>
        ) : null}
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
  accessory: { marginLeft: 'auto', flexShrink: 1, maxWidth: '100%' },
  content: { padding: space.lg, gap: space.lg, width: '100%', maxWidth: 1280, alignSelf: 'center' },
});
