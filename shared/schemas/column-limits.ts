import { z } from 'zod';

/**
 * The character limit of every string column the API writes, as db/migrations creates them. The
 * zod schemas take their maxima from here and the server checks values that arrive any other way
 * (multipart file names, provider profiles), so no string reaches the database longer than its
 * column. tests/api/column-limits.test.ts compares this table with the live schema.
 */
export const columnLimits = {
  makers: { slug: 120, name: 200, country: 80 },
  drivers: {
    slug: 160,
    model: 200,
    type: 20,
    diaphragm_material: 80,
    surround_material: 80,
    magnet_type: 80,
    currency: 3,
    availability: 20,
  },
  driver_aliases: { kind: 20, alias: 200, slug: 160 },
  maker_specs: { name: 40, unit: 20 },
  measurement_sets: { label: 200, status: 20, baffle: 200, gating: 200, sample_id: 80, reviewer: 120, burn_in: 20 },
  curves: { kind: 20 },
  parameters: { name: 40, unit: 20, signal: 10 },
  saved_overlays: { code: 16, title: 120 },
  users: { provider: 20, provider_id: 80, login: 80, display_name: 120, email: 200, role: 20 },
  role_audit: { old_role: 20, new_role: 20, reason: 200 },
  sessions: { session_id: 128 },
  upload_files: { token: 40, file_name: 255, kind: 20 },
} as const;

/** Characters as MariaDB counts them in a utf8mb4 column: code points, not UTF-16 units. */
export function charCount(s: string): number {
  let n = 0;
  for (const _ of s) n++;
  return n;
}

/** Cuts to at most `max` code points, never through a surrogate pair. */
export function truncateChars(s: string, max: number): string {
  if (s.length <= max) return s;
  return Array.from(s).slice(0, max).join('');
}

/** Trimmed text that fits a column of `max` characters; the message names the limit. */
export const columnText = (max: number) => z.string().trim().max(max, { error: `must be at most ${max} characters` });
