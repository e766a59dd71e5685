import type { Knex } from 'knex';

/** Inserts an invented maker and driver with one approved set, unique to the calling test file. */
export async function insertDriverFixture(db: Knex, prefix: string) {
  const makerSlug = `${prefix}-maker`;
  await db('makers').where({ slug: makerSlug }).delete().catch(() => undefined);
  await cleanupFixture(db, prefix);
  const [makerId] = await db('makers').insert({ slug: makerSlug, name: `Fixture Maker ${prefix}` });
  const [driverId] = await db('drivers').insert({
    slug: `${prefix}-m3`, maker_id: makerId, model: `Fixture ${prefix} M3`, type: 'mid-range', nominal_size_in: 3, nominal_impedance_ohm: 4,
  });
  const [setId] = await db('measurement_sets').insert({
    driver_id: driverId, label: 'Fixture set', status: 'approved', drive_voltage_v: 2.83, distance_m: 1, baffle: 'test baffle',
  });
  await db('parameters').insert([
    { set_id: setId, name: 'fs', value: 101.5, unit: 'Hz' },
    { set_id: setId, name: 'qts', value: 0.62, unit: '' },
  ]);
  await db('curves').insert({
    set_id: setId, kind: 'spl', angle_deg: 0, drive_level_v: 2.83,
    x_values: JSON.stringify([100, 1000, 10000]), y_values: JSON.stringify([80, 86.5, 84]), phase_values: null,
  });
  return { makerId, driverId, setId, slug: `${prefix}-m3` };
}

export async function cleanupFixture(db: Knex, prefix: string): Promise<void> {
  const maker = await db('makers').where({ slug: `${prefix}-maker` }).first('id');
  if (!maker) return;
  await db('drivers').where({ maker_id: maker.id }).delete();
  await db('makers').where({ id: maker.id }).delete();
}
