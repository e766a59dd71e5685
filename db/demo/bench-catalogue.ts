// Large invented catalogues for benchmarks: the demo drivers' searchable figures, replicated with
// shifted levels and new invented names. Only what search reads is written (no curves).
import type { Knex } from 'knex';
import { computeIndexRow, type IndexRow } from '../../shared/catalogue/index-row';
import { slugOf } from '../../shared/catalogue/slug';
import { generateDemoCatalogue, prng } from './catalogue';
import { buildSet } from './build-set';

const syllables = ['ka', 'lo', 'mi', 'ra', 'ven', 'tor', 'sil', 'bre', 'dun', 'ox', 'quel', 'stra', 'mon', 'ari', 'vek', 'zul'];

export async function growBenchCatalogue(db: Knex, target: number, seed = 7): Promise<number> {
  const have = (await db('drivers').count({ n: '*' }).first())?.n as number;
  if (have >= target) return have;
  const base = generateDemoCatalogue().map((d) => ({ d, row: computeIndexRow(d.type, buildSet(d, d.sets[0])) as IndexRow }));
  const rnd = prng(seed + have);
  const makerCount = 60;
  for (let m = 0; m < makerCount; m++) {
    const name = `${syllables[m % 16]}${syllables[(m * 7 + 3) % 16]} Bench ${m + 1}`.replace(/^\w/, (c) => c.toUpperCase());
    await db('makers').insert({ slug: `bench-${m + 1}`, name }).onConflict('slug').ignore();
  }
  const makers = await db('makers').where('slug', 'like', 'bench-%').select('id', 'name');
  for (let start = have; start < target; start += 1000) {
    const n = Math.min(1000, target - start);
    const drivers: { slug: string; maker_id: number; model: string; type: string; nominal_size_in: number; nominal_impedance_ohm: number; price: number; currency: string }[] = [];
    const extras: { figures: IndexRow; shift: number }[] = [];
    for (let i = 0; i < n; i++) {
      const k = start + i;
      const { d, row } = base[k % base.length];
      const maker = makers[k % makers.length];
      const model = `${syllables[k % 16].toUpperCase()}${syllables[(k >> 4) % 16]}-${Math.floor(k / 256)}${d.model.split(' ')[0].slice(-3)}`;
      drivers.push({ slug: `bench-${k}-${slugOf(model)}`, maker_id: maker.id, model, type: d.type, nominal_size_in: d.nominalSizeIn, nominal_impedance_ohm: d.nominalImpedanceOhm, price: d.price, currency: 'EUR' });
      extras.push({ figures: row, shift: (rnd() - 0.5) * 6 });
    }
    await db.transaction(async (trx) => {
      await trx('drivers').insert(drivers);
      const ids = await trx('drivers').whereIn('slug', drivers.map((r) => r.slug)).select('id', 'slug');
      const idBySlug = new Map(ids.map((r: { id: number; slug: string }) => [r.slug, r.id]));
      await trx('driver_figures').insert(
        drivers.map((r, i) => {
          const { figures, shift } = extras[i];
          const bands = { ...figures.bands, spl: figures.bands.spl.map((v) => (v === null ? null : Number((v + shift).toFixed(2)))) };
          return {
            driver_id: idBySlug.get(r.slug), fs_hz: figures.fsHz, qts: figures.qts, vas_m3: figures.vasM3, xmax_m: figures.xmaxM,
            sensitivity_db: figures.sensitivityDb === null ? null : figures.sensitivityDb + shift, bands: JSON.stringify(bands),
          };
        }),
      );
      await trx('driver_aliases').insert(drivers.map((r) => ({ driver_id: idBySlug.get(r.slug), kind: 'model-code', alias: r.model.replace(/[^A-Za-z0-9]/g, '').toUpperCase() })));
    });
  }
  return target;
}
