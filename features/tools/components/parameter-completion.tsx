import { StyleSheet, Text, View } from 'react-native';
import type { ThieleSmallCalcInput } from '../../../shared/schemas/calc';
import { colors, FieldGrid, fonts, NumberField, space } from '../../ui';
import type { ThieleSmallResult } from '../api/calc-api';
import { calcOutcome, useCalc } from '../hooks/use-calc';
import { useNumberFields, type FieldSpec, type NumberFields } from '../hooks/use-number-fields';
import { CalcCard, FormError, ResultBlock, waitingMessage } from './calc-card';
import { displayUnits, formatNumber, toDisplay, type DisplayUnit } from './display-units';
import { ResultRow } from './result-row';

type ParamKey = 'fs' | 'qms' | 'qes' | 'qts' | 're' | 'le' | 'bl' | 'mms' | 'mmd' | 'cms' | 'kms' | 'rms' | 'sd' | 'diameter' | 'vas' | 'xmax';
type Key = ParamKey | 'temperatureC';

const params: { key: ParamKey; label: string; unit: DisplayUnit; placeholder: string }[] = [
  { key: 'fs', label: 'Fs', unit: 'hz', placeholder: '40' },
  { key: 'qms', label: 'Qms', unit: 'none', placeholder: '4' },
  { key: 'qes', label: 'Qes', unit: 'none', placeholder: '0.4' },
  { key: 'qts', label: 'Qts', unit: 'none', placeholder: '0.36' },
  { key: 're', label: 'Re', unit: 'ohm', placeholder: '6' },
  { key: 'le', label: 'Le', unit: 'mh', placeholder: '0.5' },
  { key: 'bl', label: 'Bl', unit: 'tesla', placeholder: '5.5' },
  { key: 'mms', label: 'Mms', unit: 'gram', placeholder: '8' },
  { key: 'mmd', label: 'Mmd', unit: 'gram', placeholder: '6' },
  { key: 'cms', label: 'Cms', unit: 'mmPerN', placeholder: '2' },
  { key: 'kms', label: 'Kms', unit: 'nPerMm', placeholder: '0.5' },
  { key: 'rms', label: 'Rms', unit: 'kgPerS', placeholder: '0.5' },
  { key: 'sd', label: 'Sd', unit: 'cm2', placeholder: '133' },
  { key: 'diameter', label: 'Cone diameter', unit: 'cm', placeholder: '13' },
  { key: 'vas', label: 'Vas', unit: 'litre', placeholder: '50' },
  { key: 'xmax', label: 'Xmax', unit: 'mm', placeholder: '5' },
];

const spec = {
  ...Object.fromEntries(params.map((p) => [p.key, { unit: p.unit }])),
  temperatureC: { unit: 'celsius', initial: '20' },
} as FieldSpec<Key>;

const figures: { key: string; label: string; unit: DisplayUnit; scale?: number; suffix?: string }[] = [
  { key: 'eta0', label: 'Reference efficiency η0', unit: 'percent', scale: 100 },
  { key: 'spl1w', label: 'Sensitivity', unit: 'db', suffix: 'dB SPL, 1 W / 1 m' },
  { key: 'spl283v', label: 'Sensitivity', unit: 'db', suffix: 'dB SPL, 2.83 V / 1 m' },
  { key: 'ebp', label: 'EBP = Fs/Qes', unit: 'hz' },
  { key: 'vd', label: 'Displacement Vd = Sd·Xmax', unit: 'cm3' },
  { key: 'res', label: 'Motional resistance Res', unit: 'ohm' },
  { key: 'lces', label: 'Motional inductance Lces', unit: 'mh' },
  { key: 'cmes', label: 'Motional capacitance Cmes', unit: 'microfarad' },
];

const num = (v: unknown): number | undefined => (typeof v === 'number' ? v : undefined);

export type ParameterFieldKey = Key;
export type ParameterFields = NumberFields<Key>;

/** The fields' state, for a screen that fills them itself (a pasted block) and reads the values. */
export function useParameterFields(): ParameterFields {
  return useNumberFields(spec);
}

/** Writes SI values (from a pasted block) into the fields in their display units; returns the keys filled. */
export function fillParameterFields(fields: ParameterFields, si: Partial<Record<ParamKey, number>>): ParamKey[] {
  const filled: ParamKey[] = [];
  for (const p of params) {
    const v = si[p.key];
    if (v === undefined) continue;
    fields.setText(p.key, toDisplay(v, p.unit, 6));
    filled.push(p.key);
  }
  return filled;
}

export function ParameterCompletion({
  fields, testID = 'thiele-small', title = 'Parameter completion',
  lede = 'Enter whichever small-signal parameters you have; the rest follow where the relations allow.',
}: { fields?: ParameterFields; testID?: string; title?: string; lede?: string } = {}) {
  const own = useNumberFields(spec);
  const f = fields ?? own;
  const { temperatureC, ...given } = f.values;
  const hasAny = Object.values(given).some((v) => v !== undefined);
  const body: ThieleSmallCalcInput | null = !f.hasLocalErrors && hasAny ? { ...given, ...(temperatureC !== undefined ? { temperatureC } : {}) } : null;
  const calc = useCalc<ThieleSmallResult, 'thiele-small'>('thiele-small', body);
  const { error: err, result: r } = calcOutcome(f, body, calc);
  const air = r?.air;

  return (
    <CalcCard
      title={title}
      lede={lede}
      source="Thiele 1971; Small, JAES 1972 (efficiency, sensitivity, Vas); EBP and Vd are common practice"
      constants={
        air
          ? `ρ = ${formatNumber(air.rho)} kg/m³ (ISO 2533), c = ${formatNumber(air.c)} m/s (ISO 9613-1) at ${formatNumber(air.temperatureC)} °C; p_ref = 20 µPa; half-space radiation`
          : 'air density (ISO 2533) and speed of sound (ISO 9613-1) at the temperature given; p_ref = 20 µPa'
      }
      pending={calc.pending}
      testID={testID}
    >
      <FieldGrid>
        {params.map((p) => (
          <NumberField
            key={p.key}
            label={p.label}
            unit={displayUnits[p.unit].symbol}
            value={f.text[p.key]}
            onChangeText={(t) => f.setText(p.key, t)}
            error={err(p.key)}
            placeholder={p.placeholder}
            testID={`${testID}-${p.key}`}
          />
        ))}
        <NumberField
          label="Air temperature"
          unit="°C"
          value={f.text.temperatureC}
          onChangeText={(t) => f.setText('temperatureC', t)}
          error={err('temperatureC')}
          testID={`${testID}-temperatureC`}
        />
      </FieldGrid>
      <FormError message={body ? calc.error : undefined} testID={`${testID}-error`} />
      {r && r.warnings.length > 0 ? (
        <View style={styles.warnings} testID={`${testID}-warnings`}>
          <Text style={styles.warnTitle}>Consistency</Text>
          {r.warnings.map((w) => (
            <Text key={w.relation + w.message} style={styles.warn}>• {w.message}</Text>
          ))}
        </View>
      ) : null}
      <ResultBlock testID={`${testID}-results`} message={r ? undefined : waitingMessage(body !== null, calc, 'Enter at least one parameter.')}>
        {r ? (
          <>
            <Text style={styles.section}>Completed set</Text>
            {params.filter((p) => num(r[p.key]) !== undefined).map((p) => {
              const pv = r.provenance[p.key];
              const note = !pv || pv.source === 'input' ? 'given' : `from ${pv.from.join(', ')}: ${pv.formula}`;
              return (
                <ResultRow key={p.key} label={p.label} value={toDisplay(num(r[p.key]), p.unit)} unit={displayUnits[p.unit].symbol} note={note} testID={`${testID}-result-${p.key}`} />
              );
            })}
            {figures.some((g) => num(r[g.key]) !== undefined) ? <Text style={styles.section}>Figures</Text> : null}
            {figures.filter((g) => num(r[g.key]) !== undefined).map((g) => {
              const v = num(r[g.key]) as number;
              const text = g.scale ? formatNumber(v * g.scale, 3) : g.unit === 'db' ? v.toFixed(1) : toDisplay(v, g.unit);
              return (
                <ResultRow key={g.key} label={g.label} value={text} unit={g.suffix ?? displayUnits[g.unit].symbol} note={r.provenance[g.key]?.formula} testID={`${testID}-result-${g.key}`} />
              );
            })}
            {r.missing.length > 0 ? (
              <Text style={styles.missing} testID={`${testID}-missing`}>Not determined from these inputs: {r.missing.join(', ')}</Text>
            ) : null}
          </>
        ) : null}
      </ResultBlock>
    </CalcCard>
  );
}

const styles = StyleSheet.create({
  section: { fontFamily: fonts.bold, fontSize: 12, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8, marginTop: space.sm },
  warnings: { gap: 2, borderLeftWidth: 3, borderLeftColor: colors.warn, paddingLeft: space.sm },
  warnTitle: { fontFamily: fonts.semibold, fontSize: 13, color: colors.warn },
  warn: { fontFamily: fonts.regular, fontSize: 13, color: colors.ink },
  missing: { fontFamily: fonts.regular, fontSize: 12, color: colors.inkSoft, paddingVertical: space.sm },
});
