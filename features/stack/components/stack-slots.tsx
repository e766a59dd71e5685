import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import useSWR from 'swr';
import type { DriverListResponse } from '../../../shared/schemas/drivers';
import type { OverlayDriver } from '../../../shared/schemas/overlay';
import { ChartLegend } from '../../charts';
import { ActionButton, colors, DebouncedTextInput, fonts, radius, space, ToggleChip } from '../../ui';
import { SLOT_DASH_NAMES, slotStyle } from '../logic/stack-series';
import { STACK_MAX } from '../stack-store';
import type { StackEntry } from '../logic/stack-options';

const burnInText: Record<string, string> = { 'out-of-box': 'out of the box', 'burned-in': 'burned in' };

function setText(s: OverlayDriver['sets'][number]): string {
  return [s.label, s.sampleId ? `sample ${s.sampleId}` : null, burnInText[s.burnIn] ?? s.burnIn].filter(Boolean).join(' · ');
}

/** One slot per driver: its line style, its measurement set and a remove button. */
export function StackSlots({
  entries, drivers, onSetChange, onRemove,
}: {
  entries: readonly StackEntry[];
  drivers: readonly OverlayDriver[];
  onSetChange: (index: number, setId: number) => void;
  onRemove: (index: number) => void;
}) {
  return (
    <View style={styles.slots} testID="stack-slots">
      {entries.map((e, i) => {
        const d = drivers.find((x) => x.slug === e.slug || x.requestedSlug === e.slug);
        const style = slotStyle(i, colors.series);
        return (
          <View key={e.slug} style={styles.slot} testID={`slot-${i}`}>
            <View style={styles.slotHead}>
              <ChartLegend series={[{ id: e.slug, x: [], y: [], ...style, width: 3, label: d ? `${d.maker.name} ${d.model}` : e.slug }]} />
              <Text style={styles.dash}>{SLOT_DASH_NAMES[i]}</Text>
              <ActionButton kind="quiet" label="Remove" accessibilityLabel={`Remove ${d?.model ?? e.slug}`} onPress={() => onRemove(i)} testID={`slot-${i}-remove`} />
            </View>
            {d && d.sets.length > 1 ? (
              <View style={styles.sets} accessibilityRole="radiogroup">
                {d.sets.map((s) => (
                  <ToggleChip key={s.id} label={setText(s)} selected={s.id === d.set.id} onPress={() => onSetChange(i, s.id)} testID={`slot-${i}-set-${s.id}`} />
                ))}
              </View>
            ) : d ? (
              <Text style={styles.meta}>{setText(d.set)}</Text>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

/** Finds drivers by name to add to the stack. */
export function StackSearch({ entries, onAdd }: { entries: readonly StackEntry[]; onAdd: (slug: string) => void }) {
  const [q, setQ] = useState('');
  const full = entries.length >= STACK_MAX;
  const { data } = useSWR<DriverListResponse>(q.trim() ? `/api/drivers?q=${encodeURIComponent(q.trim())}&limit=6` : null);
  return (
    <View style={styles.search}>
      <DebouncedTextInput
        value={q}
        onCommit={setQ}
        placeholder={full ? `The stack holds ${STACK_MAX}; remove one to add another` : 'Add a driver: search by maker or model'}
        editable={!full}
        accessibilityLabel="Search drivers to add"
        testID="stack-search"
      />
      {q.trim() && data && !full ? (
        <View style={styles.results} testID="stack-search-results">
          {data.items.length === 0 ? <Text style={styles.meta}>No driver matches “{q}”.</Text> : null}
          {data.items.map((it) => {
            const inStack = entries.some((e) => e.slug === it.slug);
            return (
              <Pressable
                key={it.slug}
                accessibilityRole="button"
                accessibilityState={{ disabled: inStack }}
                disabled={inStack}
                onPress={() => {
                  onAdd(it.slug);
                  setQ('');
                }}
                style={({ pressed }) => [styles.result, pressed && { opacity: 0.7 }, inStack && { opacity: 0.5 }]}
                testID={`stack-add-${it.slug}`}
              >
                <Text style={styles.resultText}>{it.maker.name} {it.model}</Text>
                <Text style={styles.meta}>{it.nominalSizeIn}″ {it.type}{inStack ? ' · in the stack' : ''}</Text>
              </Pressable>
            );
          })}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  slots: { gap: space.sm },
  slot: { backgroundColor: colors.card, borderRadius: radius.md, borderWidth: 1, borderColor: colors.rule, padding: space.sm, gap: space.xs },
  slotHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  dash: { fontFamily: fonts.regular, fontSize: 11, color: colors.inkSoft, flexGrow: 1 },
  sets: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  meta: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft },
  search: { gap: space.xs },
  results: { backgroundColor: colors.card, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.rule },
  result: { paddingHorizontal: space.sm, paddingVertical: 6, borderBottomWidth: 1, borderBottomColor: colors.grid },
  resultText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
});
