import { useState } from 'react';
import { Platform, StyleSheet, Text, TextInput, View } from 'react-native';
import type { OverlayOptions } from '../../../shared/schemas/overlay';
import { signInHref, useMe } from '../../account';
import { ActionButton, ApiRequestError, colors, fonts, radius, space } from '../../ui';
import { saveOverlay } from '../api/overlay-api';
import type { StackEntry } from '../logic/stack-options';

/** Saves the stack under a short link a reviewer can paste into an article. */
export function SaveForm({ entries, options }: { entries: readonly StackEntry[]; options: OverlayOptions }) {
  const [title, setTitle] = useState('');
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [link, setLink] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);
  const me = useMe();

  const save = async () => {
    setBusy(true);
    setError(null);
    try {
      const r = await saveOverlay(title, note, entries, options);
      setLink(r.url);
      setCopied(false);
    } catch (e) {
      if (e instanceof ApiRequestError && e.status === 401) setError('Sign in to save a link.');
      else if (e instanceof ApiRequestError && e.status === 400) setError(e.message);
      else setError('Could not save the link; try again.');
    } finally {
      setBusy(false);
    }
  };
  const absolute = link && Platform.OS === 'web' && typeof window !== 'undefined' ? `${window.location.origin}${link}` : link;
  const copy = async () => {
    if (!absolute) return;
    try {
      await navigator.clipboard.writeText(absolute);
      setCopied(true);
    } catch {
      // Some browsers refuse the clipboard without a secure context; the link stays selectable.
      setCopied(false);
    }
  };

  if (!me.isLoading && !me.can('member')) {
    // Visitors see how to get the action rather than a form that would refuse them.
    const back = typeof window !== 'undefined' ? `${window.location.pathname}${window.location.search}` : '/stack';
    return (
      <View style={styles.box} testID="save-form">
        <Text style={styles.title}>Save link</Text>
        <Text style={styles.hint}>Members can save this comparison as a short link for a write-up.</Text>
        <ActionButton kind="secondary" label="Sign in to save" onPress={() => window.location.assign(signInHref(back))} testID="save-sign-in" />
      </View>
    );
  }
  return (
    <View style={styles.box} testID="save-form">
      <Text style={styles.title}>Save link</Text>
      <TextInput value={title} onChangeText={setTitle} placeholder="Title, e.g. Four 3-inch mid-ranges" style={styles.input} placeholderTextColor={colors.inkSoft} accessibilityLabel="Title" testID="save-title" maxLength={120} />
      <TextInput value={note} onChangeText={setNote} placeholder="Note (optional)" style={[styles.input, styles.note]} placeholderTextColor={colors.inkSoft} accessibilityLabel="Note" multiline testID="save-note" maxLength={2000} />
      <ActionButton label={busy ? 'Saving…' : 'Save link'} onPress={save} disabled={busy || !title.trim() || entries.length === 0} testID="save-submit" />
      {error ? <Text style={styles.error} testID="save-error">{error}</Text> : null}
      {link ? (
        <View style={styles.linkRow}>
          <Text style={styles.link} selectable testID="saved-link">{absolute}</Text>
          <ActionButton kind="secondary" label={copied ? 'Copied' : 'Copy'} onPress={copy} testID="copy-link" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.card, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.md, gap: space.sm },
  title: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  hint: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkSoft },
  input: { fontFamily: fonts.regular, fontSize: 14, color: colors.ink, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 6 },
  note: { minHeight: 56 },
  error: { fontFamily: fonts.semibold, fontSize: 13, color: colors.warn },
  linkRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  link: { fontFamily: fonts.semibold, fontSize: 14, color: colors.accent },
});
