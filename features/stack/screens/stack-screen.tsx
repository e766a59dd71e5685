import { useLocalSearchParams, useRouter } from 'expo-router';
import { useCallback, useMemo } from 'react';
import { StyleSheet, Text } from 'react-native';
import type { OverlayOptions } from '../../../shared/schemas/overlay';
import { colors, fonts, ScreenFrame } from '../../ui';
import { parseEntries, parseOptions, toParams, type StackEntry, type StackParams } from '../logic/stack-options';
import { writeStack } from '../stack-store';
import { useStackSelection } from '../use-stack-selection';
import { StackView } from './stack-view';

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

/** /stack: drivers and every display choice live in the URL; without drivers there, the saved stack. */
export function StackScreen() {
  const raw = useLocalSearchParams<Record<keyof StackParams, string>>();
  const router = useRouter();
  const selection = useStackSelection();
  const params: StackParams = useMemo(() => Object.fromEntries(Object.entries(raw).map(([k, v]) => [k, one(v)])), [raw]);
  const fromUrl = params.drivers != null;
  const entries = useMemo(
    () => (fromUrl ? parseEntries(params.drivers, params.sets) : selection.list.map((slug) => ({ slug, setId: null }))),
    [fromUrl, params.drivers, params.sets, selection.list],
  );
  const options = useMemo(() => parseOptions(params), [params]);
  const onEntries = useCallback(
    (next: StackEntry[]) => {
      // Editing here is editing the stack: the saved selection follows, so the top bar count agrees.
      writeStack(next.map((e) => e.slug));
      router.setParams(toParams(next, options));
    },
    [router, options],
  );
  const onOptions = useCallback((patch: Partial<OverlayOptions>) => router.setParams(toParams(entries, { ...options, ...patch })), [router, entries, options]);
  return (
    <ScreenFrame testID="stack-screen">
      <StackView
        entries={entries}
        options={options}
        onEntries={onEntries}
        onOptions={onOptions}
        header={<Text style={styles.h1} accessibilityRole="header">Stack</Text>}
      />
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
});
