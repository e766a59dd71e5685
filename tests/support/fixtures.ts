import type { Knex } from 'knex';
import { refreshDriverFigures } from '../../server/drivers/figures-repository';
import { slugOf } from '../../shared/catalogue/slug';

/** A 1/24-octave grid from 20 Hz to 20 kHz: fine enough for band means, small enough to read. */
export const fixtureGrid = Array.from({ length: 24 * 10 + 1 }, (_, i) => Number((20 * 2 ** (i / 24)).toFixed(4)));

export interface FixtureDriver {
  model: string;
  type?: string;
  sizeIn?: number;
  impedance?: number;
  /** Flat on-axis level, dB at 2.83 V / 1 m. */
  level: number;
  /** Flat 60° level; defaults to 2 dB under on-axis (no beaming in the band). */
  offLevel?: number;
  /** Flat THD at 2.83 V, percent. */
  thd?: number;
  params?: Record<string, number>;
  aliases?: { kind: string; alias: string; slug?: string }[];
}

/**
 * Inserts an invented maker with the given drivers, each with one approved set of flat curves, and
 * computes their search figures. Everything is keyed by `prefix` so test files never collide.
 */
export async function insertFixtureCatalogue(db: Knex, prefix: string, drivers: FixtureDriver[]) {
  await cleanupFixture(db, prefix);
  const [makerId] = await db('makers').insert({ slug: `${prefix}-maker`, name: `Fixture Maker ${prefix}` });
  const out: { id: number; slug: string; setId: number }[] = [];
  for (const d of drivers) {
    const slug = `${prefix}-${slugOf(d.model)}`;
    const [id] = await db('drivers').insert({
      slug, maker_id: makerId, model: d.model, type: d.type ?? 'mid-range', nominal_size_in: d.sizeIn ?? 3, nominal_impedance_ohm: d.impedance ?? 4,
      price: 50, currency: 'EUR',
    });
    const [setId] = await db('measurement_sets').insert({
      driver_id: id, label: 'Fixture set', reviewer: 'Fixture bench', status: 'approved', drive_voltage_v: 2.83, distance_m: 1, baffle: 'test baffle',
      angles_deg: JSON.stringify([0, 60]),
    });
    const params = { fs: 100, qts: 0.6, vas: 0.002, xmax: 0.002, ...(d.params ?? {}) };
    await db('parameters').insert(Object.entries(params).map(([name, value]) => ({ set_id: setId, name, value, unit: '', signal: 'small' })));
    const curve = (kind: string, angle: number | null, level: number | null, y: number[]) => ({
      set_id: setId, kind, angle_deg: angle, drive_level_v: level, x_values: JSON.stringify(fixtureGrid), y_values: JSON.stringify(y), phase_values: null,
    });
    await db('curves').insert([
      curve('spl', 0, 2.83, fixtureGrid.map(() => d.level)),
      curve('spl', 60, 2.83, fixtureGrid.map(() => d.offLevel ?? d.level - 2)),
      curve('thd', 0, 2.83, fixtureGrid.map(() => d.thd ?? 0.3)),
    ]);
    if (d.aliases?.length) await db('driver_aliases').insert(d.aliases.map((a) => ({ driver_id: id, kind: a.kind, alias: a.alias, slug: a.slug ?? null })));
    await refreshDriverFigures(db, id);
    out.push({ id, slug, setId });
  }
  return { makerId, drivers: out };
}

export async function cleanupFixture(db: Knex, prefix: string): Promise<void> {
  const maker = await db('makers').where({ slug: `${prefix}-maker` }).first('id');
  if (!maker) return;
  await db('drivers').where({ maker_id: maker.id }).update({ canonical_id: null });
  await db('drivers').where({ maker_id: maker.id }).delete();
  await db('makers').where({ id: maker.id }).delete();
}
