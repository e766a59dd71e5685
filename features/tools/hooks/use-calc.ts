import { useEffect, useState } from 'react';
import type { CalcInputs, CalcName } from '../../../shared/schemas/calc';
import { fieldErrorsOf, postCalc } from '../api/calc-api';

export const CALC_DEBOUNCE_MS = 250;

export interface CalcState<T> {
  data?: T;
  /** Server messages keyed by field, from the 400 envelope. */
  fieldErrors: Record<string, string>;
  /** A failure not tied to one field (network, 500, a root-level 400). */
  error?: string;
  /** True while the answer on screen is for older inputs than the ones typed. */
  pending: boolean;
}

interface Settled<T> {
  key: string;
  data?: T;
  fieldErrors: Record<string, string>;
  error?: string;
}

const idle = { fieldErrors: {}, pending: false };

/**
 * Posts the body to the calculator once typing pauses. A null body means the inputs are not
 * complete yet, so nothing is sent. Older requests are aborted so a slow answer never replaces a newer one.
 */
export function useCalc<T, K extends CalcName = CalcName>(name: K, body: CalcInputs[K] | null, delayMs = CALC_DEBOUNCE_MS): CalcState<T> {
  const key = body === null ? null : JSON.stringify(body);
  const [settled, setSettled] = useState<Settled<T> | null>(null);

  useEffect(() => {
    if (key === null) return;
    const controller = new AbortController();
    const timer = setTimeout(() => {
      postCalc<T, K>(name, JSON.parse(key) as CalcInputs[K], controller.signal).then(
        (data) => setSettled({ key, data, fieldErrors: {} }),
        (err: unknown) => {
          if (controller.signal.aborted) return;
          const fieldErrors = fieldErrorsOf(err);
          const rootMessage = fieldErrors['(root)'];
          const named = Object.keys(fieldErrors).filter((f) => f !== '(root)').length > 0;
          const message = rootMessage ?? (named ? undefined : err instanceof Error ? err.message : 'The calculation failed');
          setSettled({ key, fieldErrors, error: message });
        },
      );
    }, delayMs);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
  }, [name, key, delayMs]);

  if (key === null) return idle;
  if (!settled) return { ...idle, pending: true };
  return { data: settled.data, fieldErrors: settled.fieldErrors, error: settled.error, pending: settled.key !== key };
}

/**
 * What a calculator form shows for its state: a field's message (its own parse error first, then the
 * server's for the body sent) and the result, held back while any error stands.
 */
export function calcOutcome<T, K extends string>(fields: { localErrors: Partial<Record<K, string>> }, body: object | null, calc: CalcState<T>) {
  return {
    error: (k: K): string | undefined => fields.localErrors[k] ?? (body ? calc.fieldErrors[k] : undefined),
    result: body && !calc.error && Object.keys(calc.fieldErrors).length === 0 ? calc.data : undefined,
  };
}
