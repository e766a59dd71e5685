// The catalogue held in memory for search: fuzzy text with fuse.js, facet filters with counts, and
// role ranking from precomputed band summaries. Built from the repository's rows, rebuilt when the
// catalogue changes. Pure: no Knex here.
import Fuse, { type Expression } from 'fuse.js';
import { RoleMatrix, scoreRole, type RoleBands } from '../../shared/catalogue/role-index';
import type { DriverFacets, DriverListQuery, DriverSummary, DriverType } from '../../shared/schemas/drivers';

export interface IndexedDriver {
  id: number;
  slug: string;
  model: string;
  makerSlug: string;
  makerName: string;
  type: DriverType;
  nominalSizeIn: number;
  nominalImpedanceOhm: number;
  fsHz: number | null;
  qts: number | null;
  vasL: number | null;
  xmaxMm: number | null;
  sensitivityDb: number | null;
  price: number | null;
  currency: string | null;
  aliases: string[];
  bands: RoleBands | null;
}

export interface SearchResult {
  items: DriverSummary[];
  total: number;
  facets: DriverFacets;
  role: { bandLo: number; bandHi: number; level: number } | null;
}

const TYPE = 1;
const SIZE = 2;
const IMPEDANCE = 4;
const OTHER = 8;

const fmtNum = (n: number) => String(Number(n.toFixed(2)));

function countsOf(map: Map<string, number>, order: (a: string, b: string) => number) {
  return [...map.entries()].sort(([a], [b]) => order(a, b)).map(([value, count]) => ({ value, count }));
}

const fuseOptions = {
  keys: [
    { name: 'model', weight: 2 },
    { name: 'makerName', weight: 1 },
    { name: 'aliases', weight: 1.5 },
  ],
  includeScore: true,
  threshold: 0.34,
  ignoreLocation: true,
  minMatchCharLength: 2,
};

function trigrams(text: string): string[] {
  const t = ` ${text.toLowerCase().replace(/[^a-z0-9]+/g, ' ').trim()} `;
  const out = new Set<string>();
  for (let i = 0; i + 3 <= t.length; i++) out.add(t.slice(i, i + 3));
  return [...out];
}

/** The first k of `items` in `cmp` order, without sorting everything when k is small. */
export function topK(items: readonly number[], cmp: (a: number, b: number) => number, k: number): number[] {
  if (k <= 0) return [];
  if (k * 8 >= items.length) return [...items].sort(cmp).slice(0, k);
  const buf: number[] = [];
  for (const x of items) {
    if (buf.length === k && cmp(x, buf[k - 1]) >= 0) continue;
    let lo = 0;
    let hi = buf.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (cmp(buf[mid], x) <= 0) lo = mid + 1;
      else hi = mid;
    }
    buf.splice(lo, 0, x);
    if (buf.length > k) buf.pop();
  }
  return buf;
}

export class SearchIndex {
  private fuse: Fuse<IndexedDriver> | null = null;
  private grams: Map<string, Int32Array> | null = null;

  constructor(readonly drivers: readonly IndexedDriver[]) {}

  /** Trigram postings, so fuzzy matching runs on a few candidates instead of the whole catalogue. */
  private postings(): Map<string, Int32Array> {
    if (this.grams) return this.grams;
    const lists = new Map<string, number[]>();
    this.drivers.forEach((d, i) => {
      for (const g of trigrams(`${d.makerName} ${d.model} ${d.aliases.join(' ')}`)) {
        const l = lists.get(g);
        if (l) l.push(i);
        else lists.set(g, [i]);
      }
    });
    this.grams = new Map([...lists].map(([g, l]) => [g, Int32Array.from(l)]));
    return this.grams;
  }

  /**
   * Drivers that could match every word: one typo changes at most three trigrams of a word, so a
   * candidate must share all but three per typo allowed (one, plus one per six letters; at least
   * one trigram). Null when no word is long enough.
   */
  private candidates(tokens: string[]): number[] | null {
    let result: Set<number> | null = null;
    for (const token of tokens) {
      const plain = token.replace(/[^a-z0-9]+/g, '');
      if (plain.length < 2) continue;
      // Two letters are too short to be fuzzy: they must start a word.
      const g = plain.length === 2 ? [` ${plain}`] : trigrams(token);
      const typos = 1 + Math.floor(token.length / 6);
      const need = plain.length === 2 ? 1 : Math.max(1, g.length - 3 * typos);
      const post = this.postings();
      this.counts ??= new Int32Array(this.drivers.length);
      const counts = this.counts;
      const touched: number[] = [];
      for (const gram of g) {
        const list = post.get(gram);
        if (!list) continue;
        for (let k = 0; k < list.length; k++) {
          if (counts[list[k]]++ === 0) touched.push(list[k]);
        }
      }
      const next = new Set<number>();
      for (const i of touched) {
        if (counts[i] >= need && (result === null || result.has(i))) next.add(i);
        counts[i] = 0;
      }
      result = next;
    }
    return result === null ? null : [...result];
  }

  get size(): number {
    return this.drivers.length;
  }

  private textMatches(q: string): Map<number, number> {
    const tokens = q.toLowerCase().split(/[\s,]+/).filter((t) => t.length > 0).slice(0, 6);
    const cands = this.candidates(tokens);
    // Every word must match some field, so "kestrl 80" can span maker and model.
    const either = (t: string): Expression[] => [{ model: t }, { makerName: t }, { aliases: t }];
    const query: Expression = { $and: tokens.map((t) => ({ $or: either(t) })) };
    const out = new Map<number, number>();
    if (cands === null) {
      this.fuse ??= new Fuse(this.drivers as IndexedDriver[], fuseOptions);
      for (const r of this.fuse.search(query)) out.set(r.refIndex, r.score ?? 1);
    } else if (cands.length > 0) {
      const subset = new Fuse(cands.map((i) => this.drivers[i]), fuseOptions);
      for (const r of subset.search(query)) out.set(cands[r.refIndex], r.score ?? 1);
    }
    return out;
  }

  private columns: Record<string, Float64Array> | null = null;
  private matrix: RoleMatrix | null = null;
  private counts: Int32Array | null = null;
  private nameRanks: { maker: Int32Array; model: Int32Array } | null = null;
  private facetKeys: { size: string[]; impedance: string[] } | null = null;

  /** Numeric columns (NaN for missing) so filters and sorts never touch objects or strings. */
  private numeric(): Record<string, Float64Array> {
    if (this.columns) return this.columns;
    const col = (f: (d: IndexedDriver) => number | null) => Float64Array.from(this.drivers, (d) => f(d) ?? NaN);
    this.columns = {
      size: col((d) => d.nominalSizeIn),
      impedance: col((d) => d.nominalImpedanceOhm),
      fs: col((d) => d.fsHz),
      qts: col((d) => d.qts),
      vas: col((d) => d.vasL),
      sensitivity: col((d) => d.sensitivityDb),
      xmax: col((d) => d.xmaxMm),
      price: col((d) => d.price),
    };
    return this.columns;
  }

  private ranks(): { maker: Int32Array; model: Int32Array } {
    if (this.nameRanks) return this.nameRanks;
    const rankBy = (key: (d: IndexedDriver) => string) => {
      const keys = this.drivers.map(key);
      const order = keys.map((_, i) => i).sort((a, b) => (keys[a] < keys[b] ? -1 : keys[a] > keys[b] ? 1 : a - b));
      const r = new Int32Array(keys.length);
      order.forEach((i, pos) => (r[i] = pos));
      return r;
    };
    this.nameRanks = {
      maker: rankBy((d) => `${d.makerName.toLowerCase()}\u0000${d.model.toLowerCase()}`),
      model: rankBy((d) => d.model.toLowerCase()),
    };
    return this.nameRanks;
  }

  private keys(): { size: string[]; impedance: string[] } {
    this.facetKeys ??= { size: this.drivers.map((d) => fmtNum(d.nominalSizeIn)), impedance: this.drivers.map((d) => fmtNum(d.nominalImpedanceOhm)) };
    return this.facetKeys;
  }

  search(query: DriverListQuery): SearchResult {
    const text = query.q ? this.textMatches(query.q) : null;
    const cols = this.numeric();
    const keys = this.keys();
    const types = query.type && query.type.length ? new Set(query.type) : null;
    const ranges: [Float64Array, number | undefined, number | undefined][] = (
      [
        [cols.fs, query.fsMin, query.fsMax],
        [cols.qts, query.qtsMin, query.qtsMax],
        [cols.vas, query.vasMinL, query.vasMaxL],
        [cols.sensitivity, query.sensMin, query.sensMax],
        [cols.xmax, query.xmaxMinMm, query.xmaxMaxMm],
        [cols.price, query.priceMin, query.priceMax],
      ] as [Float64Array, number | undefined, number | undefined][]
    ).filter(([, lo, hi]) => lo !== undefined || hi !== undefined);
    const sizeLo = query.sizeMin ?? -Infinity;
    const sizeHi = query.sizeMax ?? Infinity;
    const role = query.bandLo !== undefined && query.bandHi !== undefined ? { bandLo: query.bandLo, bandHi: query.bandHi, level: query.level ?? 90 } : null;

    const typeCounts = new Map<string, number>();
    const sizeCounts = new Map<string, number>();
    const impCounts = new Map<string, number>();
    const statCols = ['fs', 'qts', 'vas', 'sensitivity', 'xmax', 'price'].map((k) => cols[k]);
    const mins = statCols.map(() => Infinity);
    const maxs = statCols.map(() => -Infinity);
    const hits: number[] = [];
    const candidates = text ? [...text.keys()].sort((a, b) => a - b) : null;
    const n = candidates ? candidates.length : this.drivers.length;
    for (let j = 0; j < n; j++) {
      const i = candidates ? candidates[j] : j;
      const d = this.drivers[i];
      let mask = 0;
      if (types && !types.has(d.type)) mask |= TYPE;
      const sz = cols.size[i];
      if (sz < sizeLo || sz > sizeHi) mask |= SIZE;
      if (query.impedance !== undefined && cols.impedance[i] !== query.impedance) mask |= IMPEDANCE;
      for (let r = 0; r < ranges.length; r++) {
        const [c, lo, hi] = ranges[r];
        const v = c[i];
        // NaN (missing) fails every bound.
        if (!(v >= (lo ?? -Infinity) && v <= (hi ?? Infinity))) {
          mask |= OTHER;
          break;
        }
      }
      // Each facet counts what the other filters let through, so its options stay selectable.
      if ((mask & ~TYPE) === 0) typeCounts.set(d.type, (typeCounts.get(d.type) ?? 0) + 1);
      if ((mask & ~SIZE) === 0) sizeCounts.set(keys.size[i], (sizeCounts.get(keys.size[i]) ?? 0) + 1);
      if ((mask & ~IMPEDANCE) === 0) impCounts.set(keys.impedance[i], (impCounts.get(keys.impedance[i]) ?? 0) + 1);
      if (mask === 0) {
        hits.push(i);
        for (let c = 0; c < statCols.length; c++) {
          const v = statCols[c][i];
          if (v < mins[c]) mins[c] = v;
          if (v > maxs[c]) maxs[c] = v;
        }
      }
    }

    const scoreOf = new Float64Array(role ? this.drivers.length : 0);
    if (role) {
      this.matrix ??= new RoleMatrix(this.drivers.map((d) => d.bands));
      const sc = this.matrix.scores(hits, role);
      hits.forEach((i, k) => (scoreOf[i] = sc[k]));
    }

    const sort = query.sort ?? (role ? 'role' : text ? 'relevance' : 'maker');
    const dir = query.order === 'desc' ? -1 : 1;
    let keyOf: (i: number) => number;
    if (sort === 'role') keyOf = role ? (i) => -scoreOf[i] : (i) => i;
    else if (sort === 'relevance') keyOf = text ? (i) => text.get(i) ?? 1 : (i) => i;
    else if (sort === 'maker' || sort === 'model') {
      const r = this.ranks()[sort];
      keyOf = (i) => r[i];
    } else {
      const c = cols[sort];
      keyOf = c ? (i) => c[i] : (i) => i;
    }
    const cmp = (a: number, b: number) => {
      const ka = keyOf(a);
      const kb = keyOf(b);
      // Missing values go last whatever the direction.
      const na = Number.isNaN(ka) || ka === Infinity || ka === -Infinity;
      const nb = Number.isNaN(kb) || kb === Infinity || kb === -Infinity;
      if (na || nb) return na === nb ? a - b : na ? 1 : -1;
      return (ka - kb) * dir || a - b;
    };
    const pageIdx = topK(hits, cmp, query.offset + query.limit).slice(query.offset);

    const rankOf = (i: number): number => {
      if (sort === 'role' && dir === 1) return query.offset + pageIdx.indexOf(i) + 1;
      const s = scoreOf[i];
      let better = 0;
      for (const h of hits) if (scoreOf[h] > s || (scoreOf[h] === s && h < i)) better++;
      return better + 1;
    };

    const items = pageIdx.map((i) => {
      const d = this.drivers[i];
      const item: DriverSummary = {
        slug: d.slug,
        model: d.model,
        maker: { slug: d.makerSlug, name: d.makerName },
        type: d.type,
        nominalSizeIn: d.nominalSizeIn,
        nominalImpedanceOhm: d.nominalImpedanceOhm,
        fsHz: d.fsHz,
        qts: d.qts,
        vasL: d.vasL,
        xmaxMm: d.xmaxMm,
        sensitivityDb: d.sensitivityDb,
        price: d.price,
        currency: d.currency,
        aliases: d.aliases,
      };
      if (role) {
        const full = d.bands
          ? scoreRole(d.bands, role)
          : { score: -Infinity, sensitivityDb: null, linearityDb: null, thdPercent: null, beamingHz: null, reasons: ['no measurements yet'] };
        item.role = { ...full, score: Number.isFinite(full.score) ? full.score : -999, rank: rankOf(i) };
      }
      return item;
    });

    const range = (c: number) => (Number.isFinite(mins[c]) ? { min: mins[c], max: maxs[c] } : { min: null, max: null });
    return {
      items,
      total: hits.length,
      facets: {
        type: countsOf(typeCounts, (a, b) => a.localeCompare(b)),
        size: countsOf(sizeCounts, (a, b) => Number(a) - Number(b)),
        impedance: countsOf(impCounts, (a, b) => Number(a) - Number(b)),
        fsHz: range(0),
        qts: range(1),
        vasL: range(2),
        sensitivityDb: range(3),
        xmaxMm: range(4),
        price: range(5),
      },
      role,
    };
  }
}
