import { useCallback, useMemo, useState } from 'react';
import { parseDisplay, type DisplayUnit } from '../components/display-units';

export type FieldSpec<K extends string> = Record<K, { unit: DisplayUnit; initial?: string }>;

export interface NumberFields<K extends string> {
  text: Record<K, string>;
  setText: (key: K, value: string) => void;
  /** SI values of the fields that hold a number. */
  values: Partial<Record<K, number>>;
  /** Fields whose text is not a number, checked here because no request can carry it. */
  localErrors: Partial<Record<K, string>>;
  hasLocalErrors: boolean;
}

export function useNumberFields<K extends string>(spec: FieldSpec<K>): NumberFields<K> {
  const [text, setAll] = useState<Record<K, string>>(() => {
    const out = {} as Record<K, string>;
    for (const k of Object.keys(spec) as K[]) out[k] = spec[k].initial ?? '';
    return out;
  });
  const setText = useCallback((key: K, value: string) => setAll((prev) => ({ ...prev, [key]: value })), []);
  const parsed = useMemo(() => {
    const values: Partial<Record<K, number>> = {};
    const localErrors: Partial<Record<K, string>> = {};
    for (const k of Object.keys(spec) as K[]) {
      const p = parseDisplay(text[k], spec[k].unit);
      if (p.error) localErrors[k] = p.error;
      else if (p.value !== undefined) values[k] = p.value;
    }
    return { values, localErrors, hasLocalErrors: Object.keys(localErrors).length > 0 };
  }, [spec, text]);
  return { text, setText, ...parsed };
}
