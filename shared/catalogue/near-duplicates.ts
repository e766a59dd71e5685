// Warns a reviewer, before a new driver entry is created, that the catalogue may already hold it.
// Reviewers type the same driver many ways ("KM-80 Mk2", "km80mk2", "KM 80 MK2"), so every
// comparison runs on a normalised form that keeps only letters and digits. Matching is plain edit
// distance rather than fuse.js: the lists are short, and a pairwise score is easier to explain in
// the reasons shown to the reviewer than a Bitap search score.

export type NearDuplicateStrength = 'strong' | 'possible';

export interface NearDuplicateCandidate {
  id: number;
  slug: string;
  makerName: string;
  model: string;
  /** Former names, alternate model codes and old slugs. */
  aliases: string[];
  /** 'pending' while the driver has no approved measurement set yet. */
  status: 'listed' | 'pending';
}

export interface NearDuplicate extends NearDuplicateCandidate {
  /** Plain-English grounds for the warning, model first, then maker. */
  reasons: string[];
  strength: NearDuplicateStrength;
}

/** Lower-cased, accents folded, everything but letters and digits dropped. */
export function normaliseName(s: string): string {
  return s.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase().replace(/[^\p{L}\p{N}]/gu, '');
}

// Below this similarity (1 − edits / longer length) two names are treated as different. 0.8 lets
// one slip in five characters through, e.g. a dropped trailing "s" on a maker name.
const MIN_SIMILARITY = 0.8;
// On names shorter than this a single edit changes too much of the name to call it a typo.
const MIN_FUZZY_LENGTH = 4;

function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    prev = cur;
  }
  return prev[b.length];
}

function similarity(a: string, b: string): number {
  return 1 - editDistance(a, b) / Math.max(a.length, b.length);
}

const digitRuns = (s: string) => (s.match(/\p{N}+/gu) ?? []).join(' ');

/**
 * How close two normalised model names are, 0 when not close. Exact is 1. A different number is
 * a different driver (80 vs 100, Mk2 vs Mk3), so fuzzy matches need the same digit runs. A code
 * typed without its cone suffix ("sw80c" for "SW-80C Coated") counts as a prefix match.
 */
function modelCloseness(a: string, b: string): number {
  if (!a || !b) return 0;
  if (a === b) return 1;
  const [short, long] = a.length <= b.length ? [a, b] : [b, a];
  if (short.length < MIN_FUZZY_LENGTH || digitRuns(a) !== digitRuns(b)) return 0;
  const sim = similarity(a, b);
  if (sim >= MIN_SIMILARITY) return sim;
  // Kept under MIN_SIMILARITY so a near-exact spelling always ranks above a bare prefix.
  if (/\p{N}/u.test(short) && long.startsWith(short)) return 0.5 + 0.25 * (short.length / long.length);
  return 0;
}

const words = (s: string) => s.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase().split(/[^\p{L}\p{N}]+/u).filter(Boolean);

/** 1 for the same maker, a fraction for a close one, 0 otherwise. */
function makerCloseness(input: string, candidate: string): number {
  const a = normaliseName(input);
  const b = normaliseName(candidate);
  if (!a || !b) return 0;
  if (a === b) return 1;
  if (Math.min(a.length, b.length) >= MIN_FUZZY_LENGTH) {
    const sim = similarity(a, b);
    if (sim >= MIN_SIMILARITY) return sim;
  }
  // "Kestrel" for "Kestrel Acoustics Ltd": the shorter name is the longer one's leading words.
  const [wa, wb] = [words(input), words(candidate)];
  const [short, long] = wa.length <= wb.length ? [wa, wb] : [wb, wa];
  if (short.join('').length >= MIN_FUZZY_LENGTH && short.every((w, i) => long[i] === w)) return 0.5 + 0.25 * (short.length / long.length);
  return 0;
}

interface ModelMatch {
  closeness: number;
  /** The alias that matched, or null when the model name itself did. */
  alias: string | null;
}

function bestModelMatch(normalisedInput: string, c: NearDuplicateCandidate): ModelMatch | null {
  let best: ModelMatch | null = null;
  const names: [string, string | null][] = [[c.model, null], ...c.aliases.map((a): [string, string | null] => [a, a])];
  for (const [name, alias] of names) {
    const closeness = modelCloseness(normalisedInput, normaliseName(name));
    // Ties go to the model name, which is listed first.
    if (closeness > 0 && (!best || closeness > best.closeness)) best = { closeness, alias };
  }
  return best;
}

function modelReason(input: string, c: NearDuplicateCandidate, m: ModelMatch): string {
  if (m.alias !== null) return m.closeness === 1 ? `matches the alias "${m.alias}"` : `model name close to the alias "${m.alias}"`;
  if (m.closeness < 1) return `model name close to "${c.model}"`;
  return input.trim() === c.model.trim() ? 'same model name' : 'same model code once spaces, dashes and case are ignored';
}

function makerReason(c: NearDuplicateCandidate, closeness: number): string {
  if (closeness === 1) return 'same maker';
  if (closeness > 0) return `maker name close to "${c.makerName}"`;
  return `listed under a different maker, "${c.makerName}"`;
}

/**
 * The entries most likely to be the driver described by `input`, strongest first, at most `limit`.
 * Strong: the same model (or an alias) under the same or a close maker, or a close model under the
 * same maker. Possible: the same model under another maker, or a close model under a close maker.
 */
export function findNearDuplicates(input: { makerName: string; model: string }, candidates: readonly NearDuplicateCandidate[], limit = 5): NearDuplicate[] {
  const model = normaliseName(input.model);
  if (!model || limit <= 0) return [];
  const scored: { result: NearDuplicate; score: number }[] = [];
  for (const c of candidates) {
    const m = bestModelMatch(model, c);
    if (!m) continue;
    const maker = makerCloseness(input.makerName, c.makerName);
    const exact = m.closeness === 1;
    let strength: NearDuplicateStrength | null = null;
    if ((exact && maker > 0) || maker === 1) strength = 'strong';
    else if (exact || maker > 0) strength = 'possible';
    if (!strength) continue;
    scored.push({
      result: { ...c, aliases: [...c.aliases], reasons: [modelReason(input.model, c, m), makerReason(c, maker)], strength },
      // The model decides closeness; the maker only breaks near-ties.
      score: m.closeness * 2 + maker,
    });
  }
  scored.sort((a, b) => (a.result.strength === b.result.strength ? 0 : a.result.strength === 'strong' ? -1 : 1) || b.score - a.score || a.result.id - b.result.id);
  return scored.slice(0, limit).map((s) => s.result);
}
