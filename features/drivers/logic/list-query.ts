// The search screen's whole state lives in the URL, with the same names the API takes, so a link
// reproduces a search and the URL can be passed to the API almost unchanged. Values stay strings
// here: the server parses and validates them and answers a 400 the screen shows.
import { bandProblem } from '../../../shared/schemas/band';
import { driverTypes, sortKeys, type DriverType, type SortKey } from '../../../shared/schemas/drivers';

export const rangeFilters = [
  { key: 'size', label: 'Size', unit: 'in', min: 'sizeMin', max: 'sizeMax', facet: null },
  { key: 'fs', label: 'Fs', unit: 'Hz', min: 'fsMin', max: 'fsMax', facet: 'fsHz' },
  { key: 'qts', label: 'Qts', unit: '', min: 'qtsMin', max: 'qtsMax', facet: 'qts' },
  { key: 'vas', label: 'Vas', unit: 'L', min: 'vasMinL', max: 'vasMaxL', facet: 'vasL' },
  { key: 'sens', label: 'Sensitivity', unit: 'dB', min: 'sensMin', max: 'sensMax', facet: 'sensitivityDb' },
  { key: 'xmax', label: 'Xmax', unit: 'mm', min: 'xmaxMinMm', max: 'xmaxMaxMm', facet: 'xmaxMm' },
  { key: 'price', label: 'Price', unit: '', min: 'priceMin', max: 'priceMax', facet: 'price' },
] as const;

export const filterParamNames = [
  'type', 'impedance', ...rangeFilters.flatMap((r) => [r.min, r.max]),
] as const;
export const roleParamNames = ['bandLo', 'bandHi', 'level'] as const;
export const listParamNames = ['q', ...filterParamNames, ...roleParamNames, 'sort', 'order', 'offset'] as const;
export type ListParamName = (typeof listParamNames)[number];
export type ListParams = Partial<Record<ListParamName, string>>;

export const PAGE_SIZE = 24;

/** Reads Expo Router search params: keeps known names, first value of arrays, drops empties. */
export function paramsFromSearch(search: Readonly<Record<string, string | string[] | undefined>>): ListParams {
  const out: ListParams = {};
  for (const name of listParamNames) {
    const raw = search[name];
    const v = (Array.isArray(raw) ? raw[0] : raw)?.trim();
    if (v) out[name] = v;
  }
  return out;
}

/**
 * The params to hand to the router: every known name present, `undefined` for the unset ones, so
 * setParams removes stale values instead of merging them with the new ones.
 */
export function routerParams(params: ListParams): Record<ListParamName, string | undefined> {
  const out = {} as Record<ListParamName, string | undefined>;
  for (const name of listParamNames) out[name] = params[name] || undefined;
  return out;
}

export function hasRole(params: ListParams): boolean {
  return Boolean(params.bandLo && params.bandHi);
}

/** What is wrong with the role band as typed, in the form's words; null when it is usable or not complete. */
export function roleBandProblem(params: ListParams): string | null {
  if (!hasRole(params)) return null;
  return bandProblem(Number(params.bandLo), Number(params.bandHi), { lo: 'Band low', hi: 'Band high' });
}

/**
 * The API query string for a search, in a fixed order so equal searches share a cache entry. A band
 * the server would refuse stays out: the role form says what is wrong while the list stays usable.
 */
export function listApiPath(params: ListParams, limit = PAGE_SIZE): string {
  const qs = new URLSearchParams();
  const badBand = roleBandProblem(params) !== null;
  for (const name of listParamNames) {
    const v = params[name];
    if (v && !(badBand && (name === 'bandLo' || name === 'bandHi'))) qs.set(name, v);
  }
  // A role band ranks by fit unless the user picked another order.
  if (hasRole(params) && !badBand && !params.sort) qs.set('sort', 'role');
  qs.set('limit', String(limit));
  return `/api/drivers?${qs.toString()}`;
}

/** A new state with one value changed. Any change but paging returns to the first page. */
export function withParams(params: ListParams, changes: ListParams | Partial<Record<ListParamName, string | undefined>>): ListParams {
  const next: ListParams = { ...params };
  for (const [k, v] of Object.entries(changes) as [ListParamName, string | undefined][]) {
    if (v === undefined || v.trim() === '') delete next[k];
    else next[k] = v.trim();
  }
  if (!('offset' in changes)) delete next.offset;
  return next;
}

export function selectedTypes(params: ListParams): DriverType[] {
  return (params.type ?? '').split(',').filter((t): t is DriverType => (driverTypes as readonly string[]).includes(t));
}

/** Adds or removes one type from the comma-joined `type` list, in the schema's order. */
export function toggleType(params: ListParams, type: DriverType): ListParams {
  const on = new Set(selectedTypes(params));
  if (on.has(type)) on.delete(type);
  else on.add(type);
  return withParams(params, { type: driverTypes.filter((t) => on.has(t)).join(',') || undefined });
}

/**
 * How many filters are set: the count on the phone's button. Search text, order, page and the role
 * band have their own controls outside the filter sheet, so they do not count.
 */
export function activeFilterCount(params: ListParams): number {
  let n = selectedTypes(params).length;
  if (params.impedance) n++;
  for (const r of rangeFilters) if (params[r.min] || params[r.max]) n++;
  return n;
}

/** Clears what the filter sheet sets; search text, role band and order stay. */
export function clearFilters(params: ListParams): ListParams {
  const next: ListParams = { ...params };
  for (const name of filterParamNames) delete next[name];
  delete next.offset;
  return next;
}

export function pageOf(params: ListParams, total: number, limit = PAGE_SIZE): { offset: number; from: number; to: number; prev: number | null; next: number | null } {
  const offset = Math.max(0, Math.floor(Number(params.offset) || 0));
  const to = Math.min(total, offset + limit);
  return {
    offset,
    from: total === 0 ? 0 : offset + 1,
    to,
    prev: offset > 0 ? Math.max(0, offset - limit) : null,
    next: offset + limit < total ? offset + limit : null,
  };
}

export interface RolePreset {
  id: string;
  label: string;
  params: { bandLo: string; bandHi: string; level: string; type?: string; sizeMin?: string; sizeMax?: string };
}

/** Common starting points for a role search (common practice, no source). */
export const rolePresets: readonly RolePreset[] = [
  { id: 'mid3', label: '3″ mid, 300 Hz–3 kHz, 90 dB', params: { bandLo: '300', bandHi: '3000', level: '90', type: 'mid-range', sizeMin: '2.5', sizeMax: '3.5' } },
  { id: 'tweeter', label: 'Tweeter above 3 kHz', params: { bandLo: '3000', bandHi: '20000', level: '90', type: 'tweeter' } },
  { id: 'midwoofer', label: 'Mid-woofer 80 Hz–2 kHz', params: { bandLo: '80', bandHi: '2000', level: '95', type: 'mid-woofer' } },
  { id: 'sub', label: 'Sub 30–80 Hz', params: { bandLo: '30', bandHi: '80', level: '100', type: 'subwoofer' } },
];

/** Replaces the role and the filters a preset sets; other filters and the search text stay. */
export function applyPreset(params: ListParams, preset: RolePreset): ListParams {
  return withParams(params, {
    type: preset.params.type,
    sizeMin: preset.params.sizeMin,
    sizeMax: preset.params.sizeMax,
    bandLo: preset.params.bandLo,
    bandHi: preset.params.bandHi,
    level: preset.params.level,
    sort: 'role',
    order: undefined,
  });
}

export function clearRole(params: ListParams): ListParams {
  return withParams(params, { bandLo: undefined, bandHi: undefined, level: undefined, sort: params.sort === 'role' ? undefined : params.sort });
}

export const sortLabels: Record<SortKey, string> = {
  relevance: 'Best match', role: 'Fit for role', model: 'Model', maker: 'Maker', size: 'Size', fs: 'Fs', qts: 'Qts', vas: 'Vas',
  sensitivity: 'Sensitivity', xmax: 'Xmax', price: 'Price',
};

/** Orders that make sense now: relevance needs search text, role needs a band. */
export function sortChoices(params: ListParams): SortKey[] {
  return sortKeys.filter((k) => (k === 'relevance' ? Boolean(params.q) : k === 'role' ? hasRole(params) : true));
}
