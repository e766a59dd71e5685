import { useState } from 'react';
import { ChoiceToggle, FieldGrid } from '../../ui';
import type { ClosedBoxCalcInput } from '../../../shared/schemas/calc';
import type { ClosedBoxResult } from '../api/calc-api';
import { calcOutcome, useCalc } from '../hooks/use-calc';
import { useNumberFields, type FieldSpec } from '../hooks/use-number-fields';
import { CalcCard, FormError, ResultBlock, waitingMessage } from './calc-card';
import { toDisplay } from './display-units';
import { fieldRenderer } from './field-renderer';
import { ResultRow } from './result-row';
import { BOX_CAUTION } from './safety';

type Key = 'fs' | 'qts' | 'vas' | 'qtc' | 'vb';
const spec: FieldSpec<Key> = {
  fs: { unit: 'hz' }, qts: { unit: 'none' }, vas: { unit: 'litre' }, qtc: { unit: 'none' }, vb: { unit: 'litre' },
};
type Mode = 'qtc' | 'vb';
const modes = [
  { value: 'qtc', label: 'Target Qtc' },
  { value: 'vb', label: 'Box volume' },
] as const;

export function ClosedBoxCalculator() {
  const f = useNumberFields(spec);
  const [mode, setMode] = useState<Mode>('qtc');
  const { fs, qts, vas, qtc, vb } = f.values;
  const target = mode === 'qtc' ? qtc : vb;
  const ready = !f.hasLocalErrors && fs !== undefined && qts !== undefined && vas !== undefined && target !== undefined;
  const body: ClosedBoxCalcInput | null = ready ? { fs, qts, vas, ...(mode === 'qtc' ? { qtc: target } : { vb: target }) } : null;
  const calc = useCalc<ClosedBoxResult, 'closed-box'>('closed-box', body);
  const { error, result: r } = calcOutcome(f, body, calc);
  const field = fieldRenderer(f, spec, error, 'closed-box');

  return (
    <CalcCard
      title="Closed box"
      lede="Box volume for a target Qtc, or the Qtc and F3 of a given box."
      source="Small, JAES 1972 (closed-box system): α = Vas/Vb, fc = Fs·√(1+α), Qtc = Qts·√(1+α)"
      constants="none beyond the driver's Vas, which already carries the air it was measured in"
      caution={BOX_CAUTION}
      pending={calc.pending}
      testID="closed-box"
    >
      <FieldGrid>
        {field('fs', 'Fs', '30')}
        {field('qts', 'Qts', '0.35')}
        {field('vas', 'Vas', '50')}
      </FieldGrid>
      <ChoiceToggle label="Solve from" options={modes} value={mode} onChange={setMode} testID="closed-box-mode" />
      <FieldGrid>{mode === 'qtc' ? field('qtc', 'Target Qtc', '0.707') : field('vb', 'Box volume Vb', '20')}</FieldGrid>
      <FormError message={body ? calc.error : undefined} testID="closed-box-error" />
      <ResultBlock testID="closed-box-results" message={r ? undefined : waitingMessage(body !== null, calc, 'Enter Fs, Qts, Vas and a target to see the box.')}>
        {r ? (
          <>
            <ResultRow label="Box volume Vb" value={toDisplay(r.vb, 'litre')} unit="L" note="net, after driver and bracing" testID="closed-box-result-vb" />
            <ResultRow label="System resonance fc" value={toDisplay(r.fc, 'hz')} unit="Hz" testID="closed-box-result-fc" />
            <ResultRow label="Qtc" value={toDisplay(r.qtc, 'none', 3)} testID="closed-box-result-qtc" />
            <ResultRow label="F3 (−3 dB)" value={toDisplay(r.f3, 'hz')} unit="Hz" testID="closed-box-result-f3" />
            <ResultRow label="Compliance ratio α" value={toDisplay(r.alpha, 'none', 3)} testID="closed-box-result-alpha" />
            {r.peakHz !== null ? (
              <ResultRow label="Response peak" value={`+${toDisplay(r.peakDb, 'db', 2)}`} unit={`dB at ${toDisplay(r.peakHz, 'hz', 3)} Hz`} testID="closed-box-result-peak" />
            ) : null}
          </>
        ) : null}
      </ResultBlock>
    </CalcCard>
  );
}
