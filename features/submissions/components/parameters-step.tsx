import { useMemo, useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import { parseParameterText, type ParameterLine } from '../../../shared/uploads/parameter-text';
import { displayUnits, fillParameterFields, ParameterCompletion, toDisplay, type NumberFields, type ParameterFields } from '../../tools';
import type { DraftFile } from '../logic/draft';
import { disagreements, LARGE_FIELDS, limitsFromFiles, type LargeKey } from '../logic/large-signal-from-files';
import { ActionButton, colors, FieldGrid, fonts, NumberField, radius, space } from '../../ui';


/** Step 4: small- and large-signal parameters, typed or pasted, checked live by the acoustics core. */
export function ParametersStep({ small, large, files }: { small: ParameterFields; large: NumberFields<LargeKey>; files: readonly DraftFile[] }) {
  const [text, setText] = useState('');
  const fromFiles = useMemo(() => limitsFromFiles(files), [files]);
  const found = LARGE_FIELDS.filter((f) => fromFiles.values[f.key] !== undefined);
  const off = disagreements(large.values, fromFiles.values);
  const useFileValues = () => {
    for (const f of found) large.setText(f.key, toDisplay(fromFiles.values[f.key] as number, f.unit, 4));
  };
  const [lines, setLines] = useState<ParameterLine[] | null>(null);
  const fill = () => {
    const r = parseParameterText(text);
    fillParameterFields(small, r.values);
    for (const f of LARGE_FIELDS) {
      const v = r.values[f.key];
      if (v !== undefined) large.setText(f.key, toDisplay(v, f.unit, 6));
    }
    setLines(r.lines);
  };
  const taken = lines?.filter((l) => l.key && !l.error).length ?? 0;
  const errors = lines?.filter((l) => l.error) ?? [];
  return (
    <View style={styles.gap} testID="submit-step-parameters">
      <View style={styles.paste}>
        <Text style={styles.label}>Paste parameters</Text>
        <Text style={styles.meta}>One per line, e.g. &ldquo;Fs 82.4 Hz&rdquo;, &ldquo;Qts = 0,44&rdquo;, &ldquo;Vas: 1.9 L&rdquo;. Units are converted; a missing unit means the usual one.</Text>
        <TextInput
          value={text}
          onChangeText={setText}
          multiline
          numberOfLines={6}
          style={styles.textarea}
          accessibilityLabel="Pasted parameters"
          placeholder={'Fs 82.4 Hz\nRe 3.2 ohm\nQts 0.44'}
          placeholderTextColor={colors.gridStrong}
          testID="submit-paste"
        />
        <ActionButton label="Fill the fields" kind="secondary" onPress={fill} disabled={!text.trim()} testID="submit-paste-fill" />
        {lines ? (
          <View testID="submit-paste-report">
            <Text style={styles.meta}>{taken} parameter{taken === 1 ? '' : 's'} taken.</Text>
            {errors.map((l) => (
              <Text key={l.line} style={styles.error}>
                {l.error}
              </Text>
            ))}
          </View>
        ) : null}
      </View>
      <ParameterCompletion
        fields={small}
        testID="submit-ts"
        title="Small signal"
        lede="What you measured. The rest of the set, the figures and any disagreement between the values follow as you type."
      />
      <View style={styles.paste} testID="submit-large">
        <Text style={styles.label}>Large signal</Text>
        {found.length ? (
          <View style={styles.derived} testID="submit-large-from-files">
            <Text style={styles.meta}>
              From your curve files (thresholds 82 % Bl, 75 % compliance, ±10 % Le):{' '}
              {found.map((f) => `${f.label} ${toDisplay(fromFiles.values[f.key] as number, f.unit)} ${displayUnits[f.unit].symbol}`).join(' · ')}
              {fromFiles.xmax ? ` · Xmax ${toDisplay(fromFiles.xmax.value, 'mm')} mm, set by ${fromFiles.xmax.governedBy}` : ''}
            </Text>
            <ActionButton label="Use these" kind="secondary" onPress={useFileValues} testID="submit-large-use-files" />
          </View>
        ) : (
          <Text style={styles.meta}>Add Bl(x), Kms(x) or Le(x) files and the limits they give appear here.</Text>
        )}
        {fromFiles.notes.map((n) => (
          <Text key={n} style={styles.meta}>
            {n}
          </Text>
        ))}
        {off.map((m) => (
          <Text key={m} style={styles.error} testID="submit-large-disagrees">
            {m}
          </Text>
        ))}
        <FieldGrid>
          {LARGE_FIELDS.map((f) => (
            <NumberField
              key={f.key}
              label={f.label}
              unit={displayUnits[f.unit].symbol}
              value={large.text[f.key]}
              onChangeText={(t) => large.setText(f.key, t)}
              error={large.localErrors[f.key]}
              hint={f.hint || undefined}
              testID={`submit-large-${f.key}`}
            />
          ))}
        </FieldGrid>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.md },
  paste: { gap: space.sm, borderWidth: 1, borderColor: colors.rule, borderRadius: radius.md, padding: space.md, backgroundColor: colors.card },
  label: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  derived: { gap: space.sm, borderLeftWidth: 3, borderLeftColor: colors.accent, paddingLeft: space.sm },
  error: { fontFamily: fonts.semibold, fontSize: 13, color: colors.warn },
  textarea: {
    fontFamily: fonts.regular, fontSize: 14, color: colors.ink, backgroundColor: colors.paper, borderWidth: 1, borderColor: colors.rule,
    borderRadius: radius.sm, padding: space.sm, minHeight: 110, textAlignVertical: 'top',
  },
});
