import { readTypedNumber } from '../../../shared/input/typed-number';

// Inputs and results use the trade's display units; everything sent to the API is SI.
export const displayUnits = {
  none: { symbol: '', toSi: 1 },
  hz: { symbol: 'Hz', toSi: 1 },
  litre: { symbol: 'L', toSi: 1e-3 },
  mm: { symbol: 'mm', toSi: 1e-3 },
  cm: { symbol: 'cm', toSi: 1e-2 },
  m: { symbol: 'm', toSi: 1 },
  gram: { symbol: 'g', toSi: 1e-3 },
  cm2: { symbol: 'cm²', toSi: 1e-4 },
  cm3: { symbol: 'cm³', toSi: 1e-6 },
  mh: { symbol: 'mH', toSi: 1e-3 },
  microfarad: { symbol: 'µF', toSi: 1e-6 },
  ohm: { symbol: 'Ω', toSi: 1 },
  mmPerN: { symbol: 'mm/N', toSi: 1e-3 },
  nPerMm: { symbol: 'N/mm', toSi: 1e3 },
  kgPerS: { symbol: 'kg/s', toSi: 1 },
  tesla: { symbol: 'T·m', toSi: 1 },
  celsius: { symbol: '°C', toSi: 1 },
  volt: { symbol: 'V', toSi: 1 },
  watt: { symbol: 'W', toSi: 1 },
  db: { symbol: 'dB', toSi: 1 },
  dbSpl: { symbol: 'dB SPL', toSi: 1 },
  percent: { symbol: '%', toSi: 1 },
} as const;
export type DisplayUnit = keyof typeof displayUnits;


/** Reads what the user typed, in SI; text that is not a number is a local error. */
export function parseDisplay(text: string, unit: DisplayUnit): { value?: number; error?: string } {
  const r = readTypedNumber(text);
  if (r.invalid) return { error: 'enter a number' };
  return r.value === undefined ? {} : { value: r.value * displayUnits[unit].toSi };
}

/** Four significant figures, plain notation in the everyday range. */
export function formatNumber(value: number, significant = 4): string {
  if (!Number.isFinite(value)) return '—';
  const a = Math.abs(value);
  if (a !== 0 && (a >= 1e6 || a < 1e-3)) return value.toExponential(significant - 1);
  return String(Number(value.toPrecision(significant)));
}

export function toDisplay(si: number | null | undefined, unit: DisplayUnit, significant = 4): string {
  if (si === null || si === undefined) return '—';
  return formatNumber(si / displayUnits[unit].toSi, significant);
}
