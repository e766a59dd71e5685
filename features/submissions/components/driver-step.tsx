import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { driverTypes, type DriverType } from '../../../shared/schemas/drivers';
import { ActionButton, ChoiceToggle, colors, DebouncedTextInput, FieldGrid, fonts, NumberField, radius, space, TextField } from '../../ui';
import { useDriverSearch } from '../hooks/use-driver-search';
import { useNearDuplicates } from '../hooks/use-near-duplicates';
import type { DriverChoice } from '../logic/draft';

const typeLabels: Record<DriverType, string> = {
  woofer: 'Woofer', 'mid-woofer': 'Mid-woofer', 'mid-range': 'Mid-range', tweeter: 'Tweeter', 'full-range': 'Full-range', subwoofer: 'Subwoofer',
};

function CatalogueSearch({ onPick }: { onPick: (slug: string, label: string) => void }) {
  const [q, setQ] = useState('');
  const { data } = useDriverSearch(q);
  const items = q.trim().length >= 2 ? (data?.items ?? []).slice(0, 8) : [];
  return (
    <View style={styles.gap}>
      <DebouncedTextInput value={q} onCommit={setQ} placeholder="Maker or model, e.g. a model code" accessibilityLabel="Search the catalogue" testID="submit-driver-search" />
      <View style={styles.gap} testID="submit-driver-results">
        {items.map((d) => (
          <Pressable
            key={d.slug}
            onPress={() => onPick(d.slug, `${d.maker.name} ${d.model}`)}
            accessibilityRole="button"
            accessibilityLabel={`Use ${d.maker.name} ${d.model}`}
            style={styles.result}
            testID={`submit-driver-pick-${d.slug}`}
          >
            <Text style={styles.resultTitle}>
              {d.maker.name} {d.model}
            </Text>
            <Text style={styles.meta}>
              {typeLabels[d.type]} · {d.nominalSizeIn} in · {d.nominalImpedanceOhm} Ω
            </Text>
          </Pressable>
        ))}
        {q.trim().length >= 2 && data && items.length === 0 ? <Text style={styles.meta}>Nothing in the catalogue matches; add a new entry instead.</Text> : null}
      </View>
    </View>
  );
}

function NearDuplicateWarning({ makerName, model, onPick }: { makerName: string; model: string; onPick: (slug: string, label: string) => void }) {
  const { data } = useNearDuplicates(makerName, model);
  const candidates = data?.candidates ?? [];
  if (candidates.length === 0) return null;
  return (
    <View style={styles.warning} testID="submit-near-duplicates" accessibilityLiveRegion="polite">
      <Text style={styles.warnTitle}>This driver may already be in the catalogue</Text>
      {candidates.map((c) => (
        <View key={c.slug} style={styles.candidate} testID={`submit-near-duplicate-${c.slug}`}>
          <View style={styles.flex}>
            <Text style={styles.resultTitle}>
              {c.makerName} {c.model}
              <Text style={styles.meta}> · {c.strength === 'strong' ? 'very likely the same' : 'possibly the same'}{c.status === 'pending' ? ' · awaiting approval' : ''}</Text>
            </Text>
            <Text style={styles.meta}>{c.reasons.join('; ')}</Text>
          </View>
          <ActionButton label="Add to this entry" kind="secondary" onPress={() => onPick(c.slug, `${c.makerName} ${c.model}`)} testID={`submit-use-${c.slug}`} />
        </View>
      ))}
      <Text style={styles.meta}>If it is a different driver, carry on: a moderator checks new entries before they are listed.</Text>
    </View>
  );
}

/** Step 1: add measurements to a listed driver, or describe a new one (with a duplicate check). */
export function DriverStep({ value, onChange }: { value: DriverChoice; onChange: (d: DriverChoice) => void }) {
  const [lastNew, setLastNew] = useState<Extract<DriverChoice, { mode: 'new' }>>(
    value.mode === 'new' ? value : { mode: 'new', makerName: '', model: '', type: 'mid-range', size: '', impedance: '' },
  );
  const pick = (slug: string, label: string) => {
    if (value.mode === 'new') setLastNew(value);
    onChange({ mode: 'existing', slug, label });
  };
  const setNew = (patch: Partial<Extract<DriverChoice, { mode: 'new' }>>) => {
    if (value.mode !== 'new') return;
    onChange({ ...value, ...patch });
  };
  return (
    <View style={styles.gap} testID="submit-step-driver">
      <ChoiceToggle
        label="Which driver"
        options={[{ value: 'existing', label: 'Already listed' }, { value: 'new', label: 'New entry' }]}
        value={value.mode}
        onChange={(mode) => {
          if (mode === value.mode) return;
          if (mode === 'new') return onChange(lastNew);
          if (value.mode === 'new') setLastNew(value);
          onChange({ mode: 'existing', slug: '', label: '' });
        }}
        testID="submit-driver-mode"
      />
      {value.mode === 'existing' ? (
        <>
          {value.slug ? (
            <Text style={styles.chosen} testID="submit-driver-chosen">
              Adding a measurement set to {value.label}
            </Text>
          ) : null}
          <CatalogueSearch onPick={pick} />
        </>
      ) : (
        <>
          <FieldGrid>
            <TextField label="Maker" value={value.makerName} onChangeText={(makerName) => setNew({ makerName })} testID="submit-maker" placeholder="as printed on the driver" />
            <TextField label="Model" value={value.model} onChangeText={(model) => setNew({ model })} testID="submit-model" placeholder="model code" />
            <NumberField label="Nominal size" unit="in" value={value.size} onChangeText={(size) => setNew({ size })} testID="submit-size" placeholder="3" />
            <NumberField label="Nominal impedance" unit="Ω" value={value.impedance} onChangeText={(impedance) => setNew({ impedance })} testID="submit-impedance" placeholder="4" />
          </FieldGrid>
          <Text style={styles.label}>Type</Text>
          <ChoiceToggle label="Type" options={driverTypes.map((t) => ({ value: t, label: typeLabels[t] }))} value={value.type} onChange={(type) => setNew({ type })} testID="submit-type" />
          <NearDuplicateWarning makerName={value.makerName} model={value.model} onPick={pick} />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.sm },
  flex: { flex: 1, minWidth: 180, gap: 2 },
  label: { fontFamily: fonts.semibold, fontSize: 13, color: colors.ink },
  result: { borderWidth: 1, borderColor: colors.rule, borderRadius: radius.sm, padding: space.sm, backgroundColor: colors.paper },
  resultTitle: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  chosen: { fontFamily: fonts.semibold, fontSize: 14, color: colors.accent },
  warning: { borderLeftWidth: 3, borderLeftColor: colors.warn, paddingLeft: space.sm, gap: space.sm },
  warnTitle: { fontFamily: fonts.semibold, fontSize: 14, color: colors.warn },
  candidate: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
