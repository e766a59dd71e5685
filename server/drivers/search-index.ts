// The catalogue held in memory for search: fuzzy text with fuse.js, facet filters with counts, and
// role ranking from precomputed band summaries. Built from the repository's rows, rebuilt when the
// catalogue changes. Pure: no Knex here.
import Fuse, { type Expression } from 'fuse.js';
import { scoreRole, type RoleBands } from '../../shared/catalogue/role-index';
import type { DriverFacets, DriverListQuery, DriverSummary, DriverType, RoleFit } from '../../shared/schemas/drivers';

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

type Range = [number | undefined, number | undefined];

function outside(v: number | null, [lo, hi]: Range): boolean {
  if (lo === undefined && hi === undefined) return false;
  if (v === null) return true;
  return (lo !== undefined && v < lo) || (hi !== undefined && v > hi);
}

function rangeOf(values: (number | null)[]): { min: number | null; max: number | null } {
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (v === null) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return Number.isFinite(min) ? { min, max } : { min: null, max: null };
}

const fmtNum = (n: number) => String(Number(n.toFixed(2)));

function countsOf(map: Map<string, number>, order: (a: string, b: string) => number) {
  return [...map.entries()].sort(([a], [b]) => order(a, b)).map(([value, count]) => ({ value, count }));
}

export class SearchIndex {
  private fuse: Fuse<IndexedDriver> | null = null;

  constructor(readonly drivers: readonly IndexedDriver[]) {}

  get size(): number {
    return this.drivers.length;
  }

  private textMatches(q: string): Map<number, number> {
    if (!this.fuse) {
      this.fuse = new Fuse(this.drivers as IndexedDriver[], {
        keys: [
          { name: 'model', weight: 2 },
          { name: 'makerName', weight: 1 },
          { name: 'aliases', weight: 1.5 },
        ],
        includeScore: true,
        threshold: 0.34,
        ignoreLocation: true,
        minMatchCharLength: 2,
      });
    }
    const tokens = q.toLowerCase().split(/[\s,]+/).filter((t) => t.length > 0).slice(0, 6);
    // Every word must match some field, so "kestrl 80" can span maker and model.
    const either = (t: string): Expression[] => [{ model: t }, { makerName: t }, { aliases: t }];
    const query: Expression = { $and: tokens.map((t) => ({ $or: either(t) })) };
    const out = new Map<number, number>();
    for (const r of this.fuse.search(query)) out.set(r.refIndex, r.score ?? 1);
    return out;
  }

  search(query: DriverListQuery): SearchResult {
    const text = query.q ? this.textMatches(query.q) : null;
    const types = query.type && query.type.length ? new Set(query.type) : null;
    const size: Range = [query.sizeMin, query.sizeMax];
    const ranges: [keyof IndexedDriver, Range][] = [
      ['fsHz', [query.fsMin, query.fsMax]],
      ['qts', [query.qtsMin, query.qtsMax]],
      ['vasL', [query.vasMinL, query.vasMaxL]],
      ['sensitivityDb', [query.sensMin, query.sensMax]],
      ['xmaxMm', [query.xmaxMinMm, query.xmaxMaxMm]],
      ['price', [query.priceMin, query.priceMax]],
    ];
    const activeRanges = ranges.filter(([, [lo, hi]]) => lo !== undefined || hi !== undefined);
    const role = query.bandLo !== undefined && query.bandHi !== undefined ? { bandLo: query.bandLo, bandHi: query.bandHi, level: query.level ?? 90 } : null;

    const typeCounts = new Map<string, number>();
    const sizeCounts = new Map<string, number>();
    const impCounts = new Map<string, number>();
    const hits: number[] = [];
    for (let i = 0; i < this.drivers.length; i++) {
      const d = this.drivers[i];
      if (text && !text.has(i)) continue;
      let mask = 0;
      if (types && !types.has(d.type)) mask |= TYPE;
      if (outside(d.nominalSizeIn, size)) mask |= SIZE;
      if (query.impedance !== undefined && d.nominalImpedanceOhm !== query.impedance) mask |= IMPEDANCE;
      for (const [key, r] of activeRanges) {
        if (outside(d[key] as number | null, r)) {
          mask |= OTHER;
          break;
        }
      }
      // Each facet counts what the other filters let through, so its options stay selectable.
      if ((mask & ~TYPE) === 0) typeCounts.set(d.type, (typeCounts.get(d.type) ?? 0) + 1);
      if ((mask & ~SIZE) === 0) sizeCounts.set(fmtNum(d.nominalSizeIn), (sizeCounts.get(fmtNum(d.nominalSizeIn)) ?? 0) + 1);
      if ((mask & ~IMPEDANCE) === 0) impCounts.set(fmtNum(d.nominalImpedanceOhm), (impCounts.get(fmtNum(d.nominalImpedanceOhm)) ?? 0) + 1);
      if (mask === 0) hits.push(i);
    }

    const roleFits = new Map<number, RoleFit>();
    if (role) {
      for (const i of hits) {
        const b = this.drivers[i].bands;
        const s = b ? scoreRole(b, role) : { score: -Infinity, sensitivityDb: null, linearityDb: null, thdPercent: null, beamingHz: null, reasons: ['no measurements yet'] };
        roleFits.set(i, { ...s, rank: 0 });
      }
      const ranked = [...hits].sort((a, b) => (roleFits.get(b)!.score - roleFits.get(a)!.score) || a - b);
      ranked.forEach((i, r) => {
        roleFits.get(i)!.rank = r + 1;
      });
    }

    const sort = query.sort ?? (role ? 'role' : text ? 'relevance' : 'maker');
    const dir = query.order === 'desc' ? -1 : 1;
    const key = (i: number): number | string | null => {
      const d = this.drivers[i];
      switch (sort) {
        case 'relevance':
          return text?.get(i) ?? 1;
        case 'role':
          return roleFits.get(i)?.rank ?? Infinity;
        case 'model':
          return d.model.toLowerCase();
        case 'maker':
          return `${d.makerName.toLowerCase()}\u0000${d.model.toLowerCase()}`;
        case 'size':
          return d.nominalSizeIn;
        case 'fs':
          return d.fsHz;
        case 'qts':
          return d.qts;
        case 'vas':
          return d.vasL;
        case 'sensitivity':
          return d.sensitivityDb;
        case 'xmax':
          return d.xmaxMm;
        case 'price':
          return d.price;
        default:
          return i;
      }
    };
    const keyed = hits.map((i) => ({ i, k: key(i) }));
    keyed.sort((a, b) => {
      // Missing values go last whatever the direction.
      if (a.k === null || b.k === null) return a.k === b.k ? a.i - b.i : a.k === null ? 1 : -1;
      const c = a.k < b.k ? -1 : a.k > b.k ? 1 : 0;
      return c * dir || a.i - b.i;
    });

    const page = keyed.slice(query.offset, query.offset + query.limit).map(({ i }) => {
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
      const fit = roleFits.get(i);
      if (fit) item.role = { ...fit, score: Number.isFinite(fit.score) ? fit.score : -999 };
      return item;
    });

    const hitDrivers = hits.map((i) => this.drivers[i]);
    return {
      items: page,
      total: hits.length,
      facets: {
        type: countsOf(typeCounts, (a, b) => a.localeCompare(b)),
        size: countsOf(sizeCounts, (a, b) => Number(a) - Number(b)),
        impedance: countsOf(impCounts, (a, b) => Number(a) - Number(b)),
        fsHz: rangeOf(hitDrivers.map((d) => d.fsHz)),
        qts: rangeOf(hitDrivers.map((d) => d.qts)),
        vasL: rangeOf(hitDrivers.map((d) => d.vasL)),
        sensitivityDb: rangeOf(hitDrivers.map((d) => d.sensitivityDb)),
        xmaxMm: rangeOf(hitDrivers.map((d) => d.xmaxMm)),
        price: rangeOf(hitDrivers.map((d) => d.price)),
      },
      role,
    };
  }
}
