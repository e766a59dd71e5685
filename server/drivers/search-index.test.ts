import fc from 'fast-check';
import Fuse from 'fuse.js';
import { driverListQuerySchema } from '../../shared/schemas/drivers';
import { SearchIndex, topK, type IndexedDriver } from './search-index';

const words = ['alder', 'basalt', 'cobalt', 'dune', 'ember', 'fjord', 'granite', 'harbour', 'iris', 'juniper', 'kelp', 'lumen'];

function driver(i: number, model: string, maker = 'Fixture Works'): IndexedDriver {
  return {
    id: i, slug: `d-${i}`, model, makerSlug: 'fixture', makerName: maker, type: i % 2 ? 'mid-range' : 'woofer', nominalSizeIn: 3 + (i % 3),
    nominalImpedanceOhm: i % 2 ? 4 : 8, fsHz: 50 + i, qts: 0.3 + (i % 5) / 10, vasL: null, xmaxMm: 2, sensitivityDb: 80 + (i % 9), price: 10 + i,
    currency: 'EUR', aliases: [`AX${i}`], bands: null,
  };
}

describe('topK', () => {
  it('returns the same first k as a full sort', () => {
    // Checked against Array.prototype.sort, the reference ordering.
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 50 }), { maxLength: 300 }), fc.integer({ min: 0, max: 40 }), (keys, k) => {
        const idx = keys.map((_, i) => i);
        const cmp = (a: number, b: number) => keys[a] - keys[b] || a - b;
        expect(topK(idx, cmp, k)).toEqual([...idx].sort(cmp).slice(0, k));
      }),
      { numRuns: 300 },
    );
  });
});

describe('SearchIndex text search', () => {
  const drivers = Array.from({ length: 400 }, (_, i) => driver(i, `${words[i % 12]} ${words[(i * 5) % 12]} ${100 + i}`.replace(/^\w/, (c) => c.toUpperCase())));
  const index = new SearchIndex(drivers);
  const fuse = new Fuse(drivers, { keys: ['model', 'makerName', 'aliases'], threshold: 0.34, ignoreLocation: true });

  it('loses none of the single-typo matches a full fuzzy pass finds for the exact model', () => {
    // The trigram pre-filter must keep every driver the plain fuse.js pass ranks first.
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 399 }), fc.integer({ min: 1, max: 5 }), (i, cut) => {
        const model = drivers[i].model;
        const first = model.split(' ')[0];
        const typo = first.slice(0, cut) + first.slice(cut + 1);
        const q = `${typo} ${model.split(' ').slice(1).join(' ')}`;
        const found = index.search(driverListQuerySchema.parse({ q, limit: 100 })).items.map((d) => d.slug);
        expect(found).toContain(drivers[i].slug);
        expect(fuse.search(model)[0].item.slug).toBe(drivers[i].slug);
      }),
      { numRuns: 200 },
    );
  });

  it('needs two-letter words to start a word', () => {
    const res = index.search(driverListQuerySchema.parse({ q: 'ax 12', limit: 100 }));
    expect(res.items.every((d) => d.aliases.some((a) => a.toLowerCase().startsWith('ax')))).toBe(true);
  });

  it('sorts by a numeric column with missing values last', () => {
    const res = index.search(driverListQuerySchema.parse({ sort: 'price', order: 'desc', limit: 5 }));
    expect(res.items.map((d) => d.price)).toEqual([409, 408, 407, 406, 405]);
    const vas = index.search(driverListQuerySchema.parse({ sort: 'vas', limit: 3 }));
    expect(vas.total).toBe(400);
  });
});
