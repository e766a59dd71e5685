import { z } from 'zod';

/** Band edges the figures are computed between, Hz: the measured range with room on either side. */
export const BAND_MIN_HZ = 10;
export const BAND_MAX_HZ = 40000;
// A band narrower than 5 % holds one or two grid points: no mean or spread is worth showing over it.
const MIN_RATIO = 1.05;

export interface Band {
  lo: number;
  hi: number;
}

/** Why a band is unusable, or null when it is fine. The one rule search, driver page, overlay and client share. */
export function bandProblem(lo: number, hi: number, names = { lo: 'bandLo', hi: 'bandHi' }): string | null {
  for (const [name, v] of [[names.lo, lo], [names.hi, hi]] as const) {
    if (!Number.isFinite(v) || v < BAND_MIN_HZ || v > BAND_MAX_HZ) return `${name} must be between ${BAND_MIN_HZ} and ${BAND_MAX_HZ} Hz`;
  }
  return hi > lo * MIN_RATIO ? null : `${names.hi} must be above ${names.lo} (by at least 5 %)`;
}

export const isValidBand = (lo: number, hi: number): boolean => bandProblem(lo, hi) === null;

const edge = (coerce: boolean) =>
  (coerce ? z.coerce.number() : z.number())
    .finite()
    .min(BAND_MIN_HZ, { error: `must be at least ${BAND_MIN_HZ} Hz` })
    .max(BAND_MAX_HZ, { error: `must be at most ${BAND_MAX_HZ} Hz` })
    .optional();

/** bandLo and bandHi as optional fields: coerced from text for queries, plain numbers for JSON bodies. */
export const bandFields = (coerce: boolean) => ({ bandLo: edge(coerce), bandHi: edge(coerce) });

/** Both edges or neither, and the high one above the low one; the issue names the field to fix. */
export function refineBand(v: { bandLo?: number; bandHi?: number }, ctx: z.RefinementCtx): void {
  if ((v.bandLo === undefined) !== (v.bandHi === undefined)) {
    ctx.addIssue({ code: 'custom', path: [v.bandLo === undefined ? 'bandLo' : 'bandHi'], message: 'a band needs both bandLo and bandHi' });
    return;
  }
  if (v.bandLo === undefined || v.bandHi === undefined) return;
  // An edge out of range has its own issue already (zod runs refinements after non-fatal ones).
  const inRange = (x: number) => x >= BAND_MIN_HZ && x <= BAND_MAX_HZ;
  const problem = bandProblem(v.bandLo, v.bandHi);
  if (problem && inRange(v.bandLo) && inRange(v.bandHi)) ctx.addIssue({ code: 'custom', path: ['bandHi'], message: problem });
}

/** The band of a parsed query, or null when none was given. */
export function bandOfQuery(v: { bandLo?: number; bandHi?: number }): Band | null {
  return v.bandLo !== undefined && v.bandHi !== undefined ? { lo: v.bandLo, hi: v.bandHi } : null;
}
