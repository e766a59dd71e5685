/**
 * Excursion limits from large-signal parameter curves Bl(x), Cms(x) or Kms(x), Le(x).
 *
 * Default thresholds: Bl(x)/Bl(0) ≥ 82 %, Cms(x)/Cms(0) ≥ 75 %, |Le(x)/Le(0) − 1| ≤ 10 %, from
 * "Assessment of voice-coil peak displacement Xmax" (JAES vol. 51 no. 5, 2003), where those figures
 * correspond to about 10 % distortion; the same criteria are used by IEC 62458:2010 (values from memory).
 * The governing Xmax is the smallest of the three limits.
 */
import { AcousticsInputError } from './errors';

export interface ExcursionThresholds {
  /** Minimum Bl(x)/Bl(0); default 0.82. */
  blMin: number;
  /** Minimum Cms(x)/Cms(0); default 0.75. */
  cmsMin: number;
  /** Maximum |Le(x)/Le(0) − 1|; default 0.10. */
  leVariation: number;
}

export const DEFAULT_EXCURSION_THRESHOLDS: ExcursionThresholds = { blMin: 0.82, cmsMin: 0.75, leVariation: 0.1 };
export const EXCURSION_THRESHOLD_SOURCE =
  '"Assessment of voice-coil peak displacement Xmax", JAES 51(5), 2003; IEC 62458:2010';

export interface ExcursionInput {
  /** Displacement, m, strictly increasing, spanning 0. */
  x: readonly number[];
  bl?: readonly number[];
  cms?: readonly number[];
  kms?: readonly number[];
  le?: readonly number[];
  thresholds?: Partial<ExcursionThresholds>;
}

export interface CurveLimit {
  /** Symmetric limit: the smaller of the positive and negative crossings, m. */
  limit: number;
  /** First crossing on the positive side, m (the range end when none). */
  positive: number;
  /** First crossing on the negative side, m, a negative number (the range end when none). */
  negative: number;
  /** True when the criterion was never violated on one side inside the measured range. */
  beyondRange: boolean;
  /** Centre of the curve at the threshold, (positive + negative)/2, m: the asymmetry offset. */
  offset: number;
  /** Value at x = 0 the ratio is taken against. */
  reference: number;
}

export interface ExcursionResult {
  xBl: CurveLimit | null;
  xC: CurveLimit | null;
  xL: CurveLimit | null;
  /** Smallest available limit, m. */
  xmax: number;
  governedBy: 'bl' | 'cms' | 'le';
  thresholds: ExcursionThresholds;
  thresholdSource: string;
}

function interpAt(x: readonly number[], y: readonly number[], at: number): number {
  for (let i = 0; i < x.length - 1; i++) {
    if (at >= x[i] && at <= x[i + 1]) {
      const t = (at - x[i]) / (x[i + 1] - x[i]);
      return y[i] + t * (y[i + 1] - y[i]);
    }
  }
  throw new AcousticsInputError('x', 'x must span 0');
}

/**
 * Walk outwards from x = 0 along the margin m(x) (≥ 0 inside the criterion) and return the
 * first zero crossing on each side, interpolated linearly.
 */
function limitsOf(x: readonly number[], margin: readonly number[], reference: number): CurveLimit {
  const n = x.length;
  let positive = x[n - 1];
  let beyond = false;
  let found = false;
  const m0 = interpAt(x, margin, 0);
  let prevX = 0;
  let prevM = m0;
  for (let i = 0; i < n; i++) {
    if (x[i] <= 0) continue;
    if (margin[i] < 0) {
      positive = prevX + ((x[i] - prevX) * prevM) / (prevM - margin[i]);
      found = true;
      break;
    }
    prevX = x[i];
    prevM = margin[i];
  }
  if (!found) beyond = true;
  let negative = x[0];
  found = false;
  prevX = 0;
  prevM = m0;
  for (let i = n - 1; i >= 0; i--) {
    if (x[i] >= 0) continue;
    if (margin[i] < 0) {
      negative = prevX + ((x[i] - prevX) * prevM) / (prevM - margin[i]);
      found = true;
      break;
    }
    prevX = x[i];
    prevM = margin[i];
  }
  if (!found) beyond = true;
  return { limit: Math.min(positive, -negative), positive, negative, beyondRange: beyond, offset: (positive + negative) / 2, reference };
}

function checkArray(name: string, a: readonly number[] | undefined, n: number): void {
  if (a === undefined) return;
  if (a.length !== n) throw new AcousticsInputError(name, `${name} must have one value per x`);
  if (a.some((v) => !Number.isFinite(v))) throw new AcousticsInputError(name, `${name} must be finite numbers`);
}

export function excursionLimits(input: ExcursionInput): ExcursionResult {
  const { x } = input;
  const n = x.length;
  if (n < 3) throw new AcousticsInputError('x', 'at least 3 points are needed');
  for (let i = 1; i < n; i++) if (!(x[i] > x[i - 1])) throw new AcousticsInputError('x', 'x must be strictly increasing');
  if (!(x[0] < 0 && x[n - 1] > 0)) throw new AcousticsInputError('x', 'x must span both sides of 0');
  checkArray('bl', input.bl, n);
  checkArray('cms', input.cms, n);
  checkArray('kms', input.kms, n);
  checkArray('le', input.le, n);
  const th: ExcursionThresholds = { ...DEFAULT_EXCURSION_THRESHOLDS, ...input.thresholds };

  let xBl: CurveLimit | null = null;
  if (input.bl) {
    const ref = interpAt(x, input.bl, 0);
    if (!(ref > 0)) throw new AcousticsInputError('bl', 'Bl(0) must be positive');
    xBl = limitsOf(x, input.bl.map((b) => b / ref - th.blMin), ref);
  }
  let xC: CurveLimit | null = null;
  const cms = input.cms ?? input.kms?.map((k) => 1 / k);
  if (cms) {
    if (cms.some((c) => !(c > 0))) throw new AcousticsInputError(input.cms ? 'cms' : 'kms', 'compliance and stiffness must be positive');
    const ref = interpAt(x, cms, 0);
    xC = limitsOf(x, cms.map((c) => c / ref - th.cmsMin), ref);
  }
  let xL: CurveLimit | null = null;
  if (input.le) {
    const ref = interpAt(x, input.le, 0);
    if (!(ref > 0)) throw new AcousticsInputError('le', 'Le(0) must be positive');
    xL = limitsOf(x, input.le.map((l) => th.leVariation - Math.abs(l / ref - 1)), ref);
  }
  const candidates: [ExcursionResult['governedBy'], CurveLimit | null][] = [['bl', xBl], ['cms', xC], ['le', xL]];
  let governedBy: ExcursionResult['governedBy'] | null = null;
  let xmax = Infinity;
  for (const [k, c] of candidates) {
    if (c && c.limit < xmax) {
      xmax = c.limit;
      governedBy = k;
    }
  }
  if (governedBy === null) throw new AcousticsInputError('bl', 'give at least one of bl, cms/kms, le');
  return { xBl, xC, xL, xmax, governedBy, thresholds: th, thresholdSource: EXCURSION_THRESHOLD_SOURCE };
}
