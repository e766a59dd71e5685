import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { LevelsCalcInput } from '../../../shared/schemas/calc';
import { ChoiceToggle, colors, FieldGrid, fonts, space } from '../../ui';
import type { LevelsResult } from '../api/calc-api';
import { useCalc } from '../hooks/use-calc';
import { useNumberFields, type FieldSpec } from '../hooks/use-number-fields';
import { CalcCard, FormError, ResultBlock } from './calc-card';
import { formatNumber } from './display-units';
import { fieldRenderer } from './field-renderer';
import { ResultRow } from './result-row';
import { LEVEL_CAUTION } from './safety';

type Key =
  | 'ratioV' | 'ratioRef'
  | 'distSpl' | 'distM'
  | 'normSpl' | 'normDist' | 'normV' | 'normW' | 'normOhm'
  | 'thdPercent' | 'thdDb';
const spec: FieldSpec<Key> = {
  ratioV: { unit: 'volt' }, ratioRef: { unit: 'volt', initial: '2.83' },
  distSpl: { unit: 'dbSpl' }, distM: { unit: 'm' },
  normSpl: { unit: 'dbSpl' }, normDist: { unit: 'm', initial: '1' }, normV: { unit: 'volt' }, normW: { unit: 'watt' }, normOhm: { unit: 'ohm', initial: '8' },
  thdPercent: { unit: 'percent' }, thdDb: { unit: 'db' },
};

// Which API field each input feeds, so the envelope's messages land beside the right box.
const apiField: Record<string, Partial<Record<string, Key>>> = {
  ratio: { voltage: 'ratioV', referenceVoltage: 'ratioRef' },
  distance: { spl: 'distSpl', distance: 'distM' },
  normalise: { spl: 'normSpl', distance: 'normDist', voltage: 'normV', power: 'normW', impedance: 'normOhm' },
  thd: { percent: 'thdPercent' },
  thdInverse: { db: 'thdDb' },
};

type Drive = 'voltage' | 'power';
const drives = [
  { value: 'voltage', label: 'Drive in volts' },
  { value: 'power', label: 'Drive in watts' },
] as const;

export function LevelConversions() {
  const f = useNumberFields(spec);
  const [drive, setDrive] = useState<Drive>('voltage');
  const v = f.values;
  const ok = (...keys: Key[]) => keys.every((k) => f.localErrors[k] === undefined && v[k] !== undefined);

  const ratio = useCalc<LevelsResult, 'levels'>('levels', ok('ratioV', 'ratioRef') ? { conversion: 'voltage-ratio', voltage: v.ratioV as number, referenceVoltage: v.ratioRef as number } : null);
  const dist = useCalc<LevelsResult, 'levels'>('levels', ok('distSpl', 'distM') ? { conversion: 'distance', spl: v.distSpl as number, distance: v.distM as number } : null);
  const normKeys: Key[] = drive === 'voltage' ? ['normSpl', 'normDist', 'normV'] : ['normSpl', 'normDist', 'normW', 'normOhm'];
  const normBody: LevelsCalcInput | null = ok(...normKeys)
    ? {
        conversion: 'normalise-spl', spl: v.normSpl as number, distance: v.normDist as number,
        ...(drive === 'voltage' ? { voltage: v.normV as number } : { power: v.normW as number, impedance: v.normOhm as number }),
      }
    : null;
  const norm = useCalc<LevelsResult, 'levels'>('levels', normBody);
  const thd = useCalc<LevelsResult, 'levels'>('levels', ok('thdPercent') ? { conversion: 'thd-to-db', percent: v.thdPercent as number } : null);
  const thdInv = useCalc<LevelsResult, 'levels'>('levels', ok('thdDb') ? { conversion: 'db-to-thd', db: v.thdDb as number } : null);

  const serverErrors: Partial<Record<Key, string>> = {};
  const forms = { ratio, distance: dist, normalise: norm, thd, thdInverse: thdInv };
  for (const [form, state] of Object.entries(forms)) {
    for (const [field, message] of Object.entries(state.fieldErrors)) {
      const k = apiField[form][field];
      if (k) serverErrors[k] = message;
    }
  }
  const field = fieldRenderer(f, spec, (k) => f.localErrors[k] ?? serverErrors[k], 'levels');
  const show = (value: number | undefined, digits = 2) => (value === undefined ? '—' : value.toFixed(digits));
  const pending = [ratio, dist, norm, thd, thdInv].some((s) => s.pending);

  return (
    <CalcCard
      title="Level conversions"
      lede="Voltage ratios, distance, sensitivity at 2.83 V / 1 m, and THD in % or dB."
      source="20·log10 for voltage and pressure ratios, inverse distance law (free field, far field), THD dB = 20·log10(%/100): common practice"
      constants="2.83 V (1 W into 8 Ω) and 1 m reference; power drive converted with V = √(P·R)"
      caution={LEVEL_CAUTION}
      pending={pending}
      testID="levels"
    >
      <Section title="Voltage ratio" form="ratio" error={ratio.error} results={<ResultRow label="Level difference" value={show(ratio.data?.db)} unit="dB" testID="levels-result-ratio" />}>
        <FieldGrid>
          {field('ratioV', 'Voltage', '4')}
          {field('ratioRef', 'Reference')}
        </FieldGrid>
      </Section>
      <Section title="Distance to 1 m" form="distance" error={dist.error} results={<ResultRow label="SPL at 1 m" value={show(dist.data?.spl, 1)} unit="dB SPL" testID="levels-result-distance" />}>
        <FieldGrid>
          {field('distSpl', 'Measured SPL', '80')}
          {field('distM', 'At distance', '2')}
        </FieldGrid>
      </Section>
      <Section
        title="SPL to 2.83 V / 1 m"
        form="normalise"
        error={norm.error}
        results={<ResultRow label="Sensitivity" value={show(norm.data?.spl, 1)} unit="dB SPL, 2.83 V / 1 m" testID="levels-result-normalise" />}
      >
        <FieldGrid>
          {field('normSpl', 'Measured SPL', '88')}
          {field('normDist', 'At distance')}
        </FieldGrid>
        <ChoiceToggle label="Drive given as" options={drives} value={drive} onChange={setDrive} testID="levels-drive" />
        <FieldGrid>
          {drive === 'voltage' ? field('normV', 'Drive voltage', '2') : (
            <>
              {field('normW', 'Drive power', '1')}
              {field('normOhm', 'Into impedance')}
            </>
          )}
        </FieldGrid>
      </Section>
      <Section
        title="THD"
        form="thd"
        error={thd.error ?? thdInv.error}
        results={
          <>
            <ResultRow label="THD in dB" value={show(thd.data?.db, 1)} unit="dB" testID="levels-result-thd-db" />
            <ResultRow
              label="THD in %"
              value={thdInv.data?.percent === undefined ? '—' : formatNumber(thdInv.data.percent, 3)}
              unit="%"
              testID="levels-result-thd-percent"
            />
          </>
        }
      >
        <FieldGrid>
          {field('thdPercent', 'THD', '1')}
          {field('thdDb', 'THD', '-40')}
        </FieldGrid>
      </Section>
    </CalcCard>
  );
}

/** One conversion: its inputs, then its error line and its results (test ids `levels-${form}-error` and `-results`). */
function Section({ title, form, error, results, children }: { title: string; form: string; error?: string; results: ReactNode; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Text style={styles.sectionTitle}>{title}</Text>
      {children}
      <FormError message={error} testID={`levels-${form}-error`} />
      <ResultBlock testID={`levels-${form}-results`}>{results}</ResultBlock>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  sectionTitle: { fontFamily: fonts.bold, fontSize: 12, color: colors.inkSoft, textTransform: 'uppercase', letterSpacing: 0.8 },
});
