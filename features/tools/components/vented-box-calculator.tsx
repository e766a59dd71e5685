import { useState } from 'react';
import { ChoiceToggle, FieldGrid } from '../../ui';
import type { VentedBoxCalcInput } from '../../../shared/schemas/calc';
import type { VentedBoxResult } from '../api/calc-api';
import { calcOutcome, useCalc } from '../hooks/use-calc';
import { useNumberFields, type FieldSpec } from '../hooks/use-number-fields';
import { CalcCard, FormError, ResultBlock, waitingMessage } from './calc-card';
import { toDisplay } from './display-units';
import { fieldRenderer } from './field-renderer';
import { ResultRow } from './result-row';
import { BOX_CAUTION } from './safety';

type Key = 'fs' | 'qts' | 'vas' | 'ql';
const spec: FieldSpec<Key> = { fs: { unit: 'hz' }, qts: { unit: 'none' }, vas: { unit: 'litre' }, ql: { unit: 'none' } };
type Alignment = VentedBoxCalcInput['alignment'];
const alignments = [
  { value: 'QB3', label: 'QB3 (Qts below B4)' },
  { value: 'B4', label: 'B4 (maximally flat)' },
] as const;

export function VentedBoxCalculator() {
  const f = useNumberFields(spec);
  const [alignment, setAlignment] = useState<Alignment>('QB3');
  const { fs, qts, vas, ql } = f.values;
  const ready = !f.hasLocalErrors && fs !== undefined && qts !== undefined && vas !== undefined;
  const body: VentedBoxCalcInput | null = ready ? { fs, qts, vas, alignment, ...(ql !== undefined ? { ql } : {}) } : null;
  const calc = useCalc<VentedBoxResult, 'vented-box'>('vented-box', body);
  const { error, result: r } = calcOutcome(f, body, calc);
  const field = fieldRenderer(f, spec, error, 'vented-box');

  return (
    <CalcCard
      title="Vented box"
      lede="Box volume and port tuning for a fourth-order alignment."
      source="Small, JAES 1973 (vented-box system); alignments after Thiele 1971"
      constants="none beyond Vas; QL is the box leakage loss (blank = lossless, ∞)"
      caution={BOX_CAUTION}
      pending={calc.pending}
      testID="vented-box"
    >
      <FieldGrid>
        {field('fs', 'Fs', '30')}
        {field('qts', 'Qts', '0.3')}
        {field('vas', 'Vas', '50')}
        {field('ql', 'QL', '7')}
      </FieldGrid>
      <ChoiceToggle label="Alignment" options={alignments} value={alignment} onChange={setAlignment} testID="vented-box-alignment" />
      <FormError message={body ? (calc.error ?? calc.fieldErrors.alignment) : undefined} testID="vented-box-error" />
      <ResultBlock testID="vented-box-results" message={r ? undefined : waitingMessage(body !== null, calc, 'Enter Fs, Qts and Vas to see the box.')}>
        {r ? (
          <>
            <ResultRow label="Box volume Vb" value={toDisplay(r.vb, 'litre')} unit="L" note="net, after driver, port and bracing" testID="vented-box-result-vb" />
            <ResultRow label="Port tuning Fb" value={toDisplay(r.fb, 'hz')} unit="Hz" testID="vented-box-result-fb" />
            <ResultRow label="F3 (−3 dB)" value={toDisplay(r.f3, 'hz')} unit="Hz" testID="vented-box-result-f3" />
            <ResultRow label="Tuning ratio h = Fb/Fs" value={toDisplay(r.h, 'none', 3)} testID="vented-box-result-h" />
            <ResultRow label="Qts for B4 at this QL" value={toDisplay(r.qtsB4, 'none', 3)} testID="vented-box-result-qtsb4" />
          </>
        ) : null}
      </ResultBlock>
    </CalcCard>
  );
}
