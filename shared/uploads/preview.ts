import { interpolateLog, logFrequencyGrid } from '../acoustics/curves';
import { DEFAULT_MAX_BYTES } from './parse-measurement-file';
import type { CurveKind, ParsedPoints } from './types';
import { isAcoustic } from './units';

/**
 * What one upload request may carry. Files are read one at a time by the submit screen, so only
 * API clients sending many at once meet the totals; a full set (a dozen angles, impedance,
 * distortion and large-signal files) is typically well under 5 MB in all.
 */
export const UPLOAD_LIMITS = { fileBytes: DEFAULT_MAX_BYTES, files: 40, requestBytes: 20 * 1024 * 1024, curvesPerSubmission: 60 } as const;

/** Curves that are not on the frequency grid (large-signal x curves) are thinned to at most this many points. */
export const PREVIEW_MAX_POINTS = 400;

const GRID = logFrequencyGrid();

/**
 * Measured acoustic points resampled onto the catalogue's common grid (1/48 octave, 10 Hz to
 * 40 kHz), never extrapolated, with `yShift` added (dB; SPL referred to 2.83 V / 1 m). This is
 * what a submission stores, so a preview made with it shows what will land.
 */
export function onCommonGrid(points: ParsedPoints, yShift = 0): ParsedPoints {
  const x: number[] = [];
  const y: number[] = [];
  const phase: number[] = [];
  for (const f of GRID) {
    const v = interpolateLog(points.x, points.y, f);
    if (v === null) continue;
    x.push(Number(f.toPrecision(6)));
    y.push(Number((v + yShift).toPrecision(6)));
    if (points.phase) phase.push(Number((interpolateLog(points.x, points.phase, f) as number).toFixed(2)));
  }
  return { x, y, phase: points.phase ? phase : null };
}

/** At most `max` points, evenly spaced by index, always keeping the first and the last. */
export function thinPoints(points: ParsedPoints, max = PREVIEW_MAX_POINTS): ParsedPoints {
  const n = points.x.length;
  if (n <= max) return points;
  const pick = Array.from({ length: max }, (_, i) => Math.round((i * (n - 1)) / (max - 1)));
  const take = (a: number[]) => pick.map((i) => a[i]);
  return { x: take(points.x), y: take(points.y), phase: points.phase ? take(points.phase) : null };
}

/** The points an upload reply carries: acoustic curves on the common grid, others thinned. */
export function previewPoints(kind: CurveKind, points: ParsedPoints): ParsedPoints {
  return isAcoustic(kind) ? onCommonGrid(points) : thinPoints(points);
}
