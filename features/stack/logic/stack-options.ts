// The stack's state as URL parameters: every display choice lives in the URL so a copied address
// reproduces the view. Only non-default values are written, which keeps shared links short.
import { BAND_MAX_HZ, BAND_MIN_HZ, isValidBand } from '../../../shared/schemas/band';
import { MAX_STACK, type OverlayOptions } from '../../../shared/schemas/overlay';

export type LevelMode = OverlayOptions['level'];
export type Smoothing = OverlayOptions['smoothing'];
export type ThdUnit = OverlayOptions['thdUnit'];

export interface StackEntry {
  slug: string;
  /** null: the driver's first (default) measurement set. */
  setId: number | null;
}

export const DEFAULT_OPTIONS: OverlayOptions = {
  level: 'raw', smoothing: 'none', highlight: false, offAxis: false, thdUnit: 'percent', harmonics: false,
};
/** The band a mid-range is usually judged over (common practice, no source). */
export const DEFAULT_BAND = { lo: 300, hi: 3000 } as const;
export const DEFAULT_ALIGN_HZ = 1000;

export type StackParams = Partial<Record<'drivers' | 'sets' | 'level' | 'alignHz' | 'smoothing' | 'bandLo' | 'bandHi' | 'highlight' | 'offAxis' | 'thdLevelV' | 'thdUnit' | 'harmonics', string>>;

const slugPattern = /^[a-z0-9-]{1,160}$/;
const levels: readonly LevelMode[] = ['raw', 'frequency', 'band'];
const smoothings: readonly Smoothing[] = ['none', '1/12', '1/6', '1/3'];

function num(v: string | undefined, min: number, max: number): number | undefined {
  if (v == null || v === '') return undefined;
  const n = Number(v);
  return Number.isFinite(n) && n >= min && n <= max ? n : undefined;
}

/** Reads drivers and sets; bad or repeated slugs are dropped rather than failing the page. */
export function parseEntries(drivers: string | undefined, sets: string | undefined): StackEntry[] {
  const slugs = (drivers ?? '').split(',').map((s) => s.trim()).filter((s) => slugPattern.test(s));
  const ids = (sets ?? '').split(',');
  const out: StackEntry[] = [];
  slugs.forEach((slug, i) => {
    if (out.some((e) => e.slug === slug) || out.length >= MAX_STACK) return;
    const n = Number(ids[i]);
    out.push({ slug, setId: ids[i] && Number.isInteger(n) && n > 0 ? n : null });
  });
  return out;
}

export function parseOptions(p: StackParams): OverlayOptions {
  const o: OverlayOptions = { ...DEFAULT_OPTIONS };
  if (p.level && (levels as readonly string[]).includes(p.level)) o.level = p.level as LevelMode;
  if (p.smoothing && (smoothings as readonly string[]).includes(p.smoothing)) o.smoothing = p.smoothing as Smoothing;
  const alignHz = num(p.alignHz, 10, 40000);
  if (alignHz != null) o.alignHz = alignHz;
  const lo = num(p.bandLo, BAND_MIN_HZ, BAND_MAX_HZ);
  const hi = num(p.bandHi, BAND_MIN_HZ, BAND_MAX_HZ);
  if (lo != null && hi != null && isValidBand(lo, hi)) {
    o.bandLo = lo;
    o.bandHi = hi;
  }
  const thd = num(p.thdLevelV, 1e-6, 1e4);
  if (thd != null) o.thdLevelV = thd;
  if (p.thdUnit === 'db') o.thdUnit = 'db';
  o.highlight = p.highlight === '1';
  o.offAxis = p.offAxis === '1';
  o.harmonics = p.harmonics === '1';
  return o;
}

/**
 * Every key is present (undefined clears it), so router.setParams removes options that went back
 * to their defaults instead of leaving stale values in the address.
 */
export function toParams(entries: readonly StackEntry[], o: OverlayOptions): StackParams {
  const sets = entries.map((e) => (e.setId == null ? '' : String(e.setId))).join(',');
  return {
    drivers: entries.length ? entries.map((e) => e.slug).join(',') : undefined,
    sets: entries.some((e) => e.setId != null) ? sets : undefined,
    level: o.level !== 'raw' ? o.level : undefined,
    alignHz: o.level === 'frequency' && o.alignHz != null ? String(o.alignHz) : undefined,
    smoothing: o.smoothing !== 'none' ? o.smoothing : undefined,
    bandLo: o.bandLo != null ? String(o.bandLo) : undefined,
    bandHi: o.bandHi != null ? String(o.bandHi) : undefined,
    highlight: o.highlight ? '1' : undefined,
    offAxis: o.offAxis ? '1' : undefined,
    thdLevelV: o.thdLevelV != null ? String(o.thdLevelV) : undefined,
    thdUnit: o.thdUnit !== 'percent' ? o.thdUnit : undefined,
    harmonics: o.harmonics ? '1' : undefined,
  };
}

/** The band used for band alignment, the highlight and the server's figures. */
export function bandOf(o: OverlayOptions): { lo: number; hi: number } {
  return o.bandLo != null && o.bandHi != null ? { lo: o.bandLo, hi: o.bandHi } : { ...DEFAULT_BAND };
}

export function smoothingFraction(s: Smoothing): number | null {
  return s === 'none' ? null : Number(s.slice(2));
}

/** The words a reader sees for the normalisation in use (source lines, PNG captions). */
export function describeNormalisation(o: OverlayOptions, firstName?: string): string {
  const band = bandOf(o);
  const ref = firstName ? `the first driver (${firstName})` : 'the first driver';
  const level =
    o.level === 'raw'
      ? 'levels as measured'
      : o.level === 'frequency'
        ? `levels aligned to ${ref} at ${fmtHz(o.alignHz ?? DEFAULT_ALIGN_HZ)}`
        : `levels aligned to ${ref} on the mean over ${fmtHz(band.lo)}–${fmtHz(band.hi)}`;
  const smooth = o.smoothing === 'none' ? 'no smoothing' : `${o.smoothing} octave smoothing`;
  return `${level}, ${smooth}`;
}

export function fmtHz(f: number): string {
  return f >= 1000 ? `${Number((f / 1000).toPrecision(3))} kHz` : `${Number(f.toPrecision(3))} Hz`;
}
