import type { FieldIssue } from '../../../shared/api/errors';
import type { CalcInputs, CalcName } from '../../../shared/schemas/calc';
import { ApiRequestError, postJson } from '../../ui';

export function calcPath(name: CalcName): string {
  return `/api/calc/${encodeURIComponent(name)}`;
}

/** Bodies go out in SI, exactly as the server's zod schema for the route expects. */
export function postCalc<T, K extends CalcName = CalcName>(name: K, body: CalcInputs[K], signal?: AbortSignal): Promise<T> {
  return postJson<T>(calcPath(name), body, { signal });
}

/** The per-field messages of a 400, keyed by field name; empty for any other failure. */
export function fieldErrorsOf(err: unknown): Record<string, string> {
  if (!(err instanceof ApiRequestError)) return {};
  const fields = (err.details as { fields?: FieldIssue[] } | undefined)?.fields;
  if (!Array.isArray(fields)) return {};
  const out: Record<string, string> = {};
  for (const f of fields) if (!(f.field in out)) out[f.field] = f.message;
  return out;
}

// The parts of each route's answer that the tools screen shows (shared/acoustics/calc.ts has the rest).
export interface ClosedBoxResult {
  alpha: number;
  fc: number;
  qtc: number;
  f3: number | null;
  peakDb: number;
  peakHz: number | null;
  vb: number;
}

export interface VentedBoxResult {
  alignment: 'QB3' | 'B4';
  vb: number;
  fb: number;
  f3: number | null;
  alpha: number;
  h: number;
  qtsB4: number;
  ql: number | null;
}

export interface ProvenanceEntry {
  source: 'input' | 'derived';
  from: string[];
  inputs: string[];
  formula: string;
}

export interface ThieleSmallResult {
  [key: string]: unknown;
  provenance: Record<string, ProvenanceEntry>;
  warnings: { relation: string; fields: string[]; relativeError: number; message: string }[];
  missing: string[];
  air: { c: number; rho: number; temperatureC: number };
}

export type LevelsResult = { db?: number; spl?: number; percent?: number; voltage?: number; distance?: number };
