import { Link } from 'expo-router';
import { useEffect, useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import type { OverlayOptions } from '../../../shared/schemas/overlay';
import { ApiRequestError, colors, fonts, ScreenFrame, space } from '../../ui';
import { useSavedOverlay } from '../hooks/use-overlay';
import { DEFAULT_OPTIONS, toParams, type StackEntry } from '../logic/stack-options';
import { StackView } from './stack-view';

function stackHref(entries: readonly StackEntry[], o: OverlayOptions): string {
  const p = Object.entries(toParams(entries, o)).filter(([, v]) => v != null) as [string, string][];
  return `/stack?${p.map(([k, v]) => `${k}=${encodeURIComponent(v).replace(/%2C/g, ',')}`).join('&')}`;
}

/** The saved entries and options, changeable here without touching the saved link. */
function useSavedState(code: string) {
  const { data, error } = useSavedOverlay(code);
  const [entries, setEntries] = useState<StackEntry[] | null>(null);
  const [options, setOptions] = useState<OverlayOptions>(DEFAULT_OPTIONS);
  useEffect(() => {
    if (!data) return;
    setEntries(data.entries.map((e) => ({ slug: e.slug, setId: e.setId })));
    setOptions({ ...DEFAULT_OPTIONS, ...data.options });
  }, [data]);
  return { data, error, entries, options, setEntries, setOptions };
}

function Missing({ error, testID, chrome }: { error: Error; testID: string; chrome: boolean }) {
  const missing = error instanceof ApiRequestError && error.status === 404;
  const body = <Text style={styles.h1}>{missing ? 'No stack is saved under this link' : `Could not load this stack: ${error.message}`}</Text>;
  return chrome ? <ScreenFrame testID={testID}>{body}</ScreenFrame> : <View testID={testID}>{body}</View>;
}

export function SavedStackScreen({ code }: { code: string }) {
  const s = useSavedState(code);
  if (s.error) return <Missing error={s.error} testID="stack-screen" chrome />;
  if (!s.data || !s.entries) {
    return (
      <ScreenFrame testID="stack-screen">
        <ActivityIndicator color={colors.accent} />
      </ScreenFrame>
    );
  }
  return (
    <ScreenFrame testID="stack-screen">
      <StackView
        entries={s.entries}
        options={s.options}
        onEntries={s.setEntries}
        onOptions={(patch) => s.setOptions((o) => ({ ...o, ...patch }))}
        title={s.data.title}
        header={
          <View style={styles.head} testID="saved-header">
            <Text style={styles.kicker}>Saved stack</Text>
            <Text style={styles.h1} accessibilityRole="header" testID="saved-title">{s.data.title}</Text>
            {s.data.note ? <Text style={styles.note} testID="saved-note">{s.data.note}</Text> : null}
            <View style={styles.links}>
              <Link href={stackHref(s.entries, s.options) as never} style={styles.link} testID="saved-open-stack">Open in the stack editor</Link>
              <Link href={`/o/${code}/embed` as never} style={styles.link} testID="saved-embed-link">Embed view</Link>
            </View>
          </View>
        }
      />
    </ScreenFrame>
  );
}

/** Charts, legend and a source line only: for an article's iframe. */
export function EmbedStackScreen({ code }: { code: string }) {
  const s = useSavedState(code);
  if (s.error) return <Missing error={s.error} testID="embed-screen" chrome={false} />;
  return (
    <View style={styles.embedRoot} testID="embed-screen">
      {s.data && s.entries ? <StackView mode="embed" entries={s.entries} options={s.options} title={s.data.title} /> : <ActivityIndicator color={colors.accent} />}
    </View>
  );
}

const styles = StyleSheet.create({
  head: { gap: 4 },
  kicker: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8 },
  h1: { fontFamily: fonts.bold, fontSize: 24, color: colors.ink },
  note: { fontFamily: fonts.regular, fontSize: 14, color: colors.ink, maxWidth: 720 },
  links: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  link: { fontFamily: fonts.semibold, fontSize: 14, color: colors.accent },
  embedRoot: { flex: 1, backgroundColor: colors.paper },
});
