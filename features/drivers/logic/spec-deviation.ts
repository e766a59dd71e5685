// Measured against the maker's published figure. A deviation beyond ±10 % is marked: the spread
// commonly accepted for production tolerance of Thiele-Small parameters (common practice, no source).
import type { MakerSpec, Parameter } from '../../../shared/schemas/drivers';
import { byParameterOrder, formatParameter } from '../components/parameter-format';

export const DEVIATION_LIMIT_PERCENT = 10;

export interface ParameterRow {
  name: string;
  label: string;
  unit: string;
  measured: string;
  spec: string | null;
  deviationPercent: number | null;
  deviationText: string | null;
  flagged: boolean;
}

export function deviationPercent(measured: number, spec: number): number | null {
  if (!Number.isFinite(measured) || !Number.isFinite(spec) || spec === 0) return null;
  return ((measured - spec) / Math.abs(spec)) * 100;
}

/** "+12 %", "−3 %", "0 %": whole percent, a real minus sign, as a reader would write it. */
export function formatDeviation(percent: number): string {
  const r = Math.round(percent);
  if (r === 0) return '0 %';
  return `${r > 0 ? '+' : '−'}${Math.abs(r)} %`;
}

/** One row per measured parameter of the given signal level, with the maker's figure beside it. */
export function parameterRows(parameters: readonly Parameter[], specs: readonly MakerSpec[], signal: 'small' | 'large', limit = DEVIATION_LIMIT_PERCENT): ParameterRow[] {
  const specByName = new Map(specs.map((s) => [s.name, s]));
  return byParameterOrder(parameters.filter((p) => p.signal === signal)).map((p) => {
    const f = formatParameter(p.name, p.value, p.unit);
    const s = specByName.get(p.name);
    const dev = s ? deviationPercent(p.value, s.value) : null;
    return {
      name: p.name,
      label: f.label,
      unit: f.unit,
      measured: f.text,
      spec: s ? formatParameter(s.name, s.value, s.unit).text : null,
      deviationPercent: dev,
      deviationText: dev == null ? null : formatDeviation(dev),
      flagged: dev != null && Math.abs(dev) > limit,
    };
  });
}
