import { slugify } from 'transliteration';

// Kept out of the client bundle on purpose: the transliteration tables are ~190 kB, and only the
// server and the demo seed make slugs.
const options = { lowercase: true, separator: '-', allowedChars: 'a-zA-Z0-9', trim: true } as const;

/** Cuts a slug to `max` characters, at a dash when one is near the end, never leaving a dash last. */
function fit(slug: string, max: number): string {
  if (slug.length <= max) return slug;
  const cut = slug.slice(0, max);
  const dash = cut.lastIndexOf('-');
  return (dash >= max * 0.6 ? cut.slice(0, dash) : cut).replace(/-+$/, '');
}

/**
 * The URL slug of a name in any script: transliterated to Latin, lower case, runs of anything but
 * letters and digits turned into one dash. Empty when the name has no letter or digit at all.
 */
export function slugOf(text: string, max = Number.POSITIVE_INFINITY): string {
  return fit(slugify(text, options).replace(/-{2,}/g, '-'), max);
}

/** Joins slugs with dashes, the whole kept within `max` by shortening the last part. */
export function joinSlugs(first: string, last: string, max: number): string {
  return `${first}-${fit(last, max - first.length - 1)}`.replace(/-+$/, '');
}

/** The `n`th variant (2, 3, …) of a slug that is taken, still within `max`. */
export function slugVariant(slug: string, n: number, max: number): string {
  const suffix = `-${n}`;
  return `${fit(slug, max - suffix.length)}${suffix}`;
}
