import type { Knex } from 'knex';
import { refreshDriverFigures } from '../../server/drivers/figures-repository';
import { demoMakers, generateDemoCatalogue, type DemoDriver } from './catalogue';
import { buildSet, makerSheet } from './build-set';

async function insertDriver(trx: Knex.Transaction, d: DemoDriver, makerId: number): Promise<number> {
  const [driverId] = await trx('drivers').insert({
    slug: d.slug,
    maker_id: makerId,
    model: d.model,
    type: d.type,
    nominal_size_in: d.nominalSizeIn,
    nominal_impedance_ohm: d.nominalImpedanceOhm,
    diaphragm_material: d.diaphragm,
    surround_material: d.surround,
    voice_coil_diameter_m: d.voiceCoilDiameterM,
    magnet_type: d.magnet,
    price: d.price,
    currency: 'EUR',
    availability: d.availability,
  });
  await trx('driver_mounting').insert({
    driver_id: driverId,
    cutout_diameter_m: d.mounting.cutoutM,
    outer_diameter_m: d.mounting.outerM,
    mounting_depth_m: d.mounting.depthM,
    bolt_circle_m: d.mounting.boltCircleM,
    hole_count: d.mounting.holes,
  });
  if (d.aliases.length) {
    await trx('driver_aliases').insert(d.aliases.map((a) => ({ driver_id: driverId, kind: a.kind, alias: a.alias, slug: a.kind === 'old-slug' ? a.alias : null })));
  }
  let sheetDone = false;
  for (const s of d.sets) {
    const built = buildSet(d, s);
    const [setId] = await trx('measurement_sets').insert({
      driver_id: driverId,
      label: s.label,
      reviewer: s.reviewer,
      status: 'approved',
      burn_in: s.burnIn,
      drive_voltage_v: 2.83,
      distance_m: 1,
      baffle: 'IEC 60268-5 standard baffle',
      gating: '6 ms gate above 400 Hz, near-field spliced below',
      temperature_c: s.temperatureC,
      measured_on: s.measuredOn,
      sample_id: s.sampleId,
      angles_deg: JSON.stringify(built.anglesDeg),
      normalisation: JSON.stringify({ grid: '1/48 octave, 10 Hz to 40 kHz', reference: '2.83 V / 1 m', steps: ['demo data computed from the driver parameters'] }),
    });
    await trx('parameters').insert(built.parameters.map((p) => ({ set_id: setId, ...p })));
    // Batches keep each INSERT well under max_allowed_packet.
    const rows = built.curves.map((c) => ({
      set_id: setId,
      kind: c.kind,
      angle_deg: c.angleDeg,
      drive_level_v: c.driveLevelV,
      x_values: JSON.stringify(c.x),
      y_values: JSON.stringify(c.y),
      phase_values: c.phase ? JSON.stringify(c.phase) : null,
    }));
    for (let i = 0; i < rows.length; i += 6) await trx('curves').insert(rows.slice(i, i + 6));
    if (!sheetDone) {
      await trx('maker_specs').insert(makerSheet(d, built.parameters).map((p) => ({ driver_id: driverId, ...p })));
      sheetDone = true;
    }
  }
  return driverId;
}

/**
 * Loads the demo catalogue. Safe to re-run: drivers already present (by slug) are left alone, so
 * saved links and their set ids survive. `reset` removes the demo drivers first and rebuilds them.
 */
export async function seedDemo(db: Knex, options: { reset?: boolean } = {}): Promise<{ drivers: number; added: number }> {
  const catalogue = generateDemoCatalogue();
  let added = 0;
  for (const m of demoMakers) {
    await db('makers').insert({ slug: m.slug, name: m.name, country: m.country }).onConflict('slug').merge(['name', 'country']);
  }
  if (options.reset) {
    await db('drivers').whereIn('slug', catalogue.map((d) => d.slug)).delete();
  }
  const makers = await db('makers').whereIn('slug', demoMakers.map((m) => m.slug)).select('id', 'slug');
  const makerId = new Map(makers.map((m: { id: number; slug: string }) => [m.slug, m.id]));
  const existing = new Set((await db('drivers').whereIn('slug', catalogue.map((d) => d.slug)).select('slug')).map((r: { slug: string }) => r.slug));
  for (const d of catalogue) {
    if (existing.has(d.slug)) continue;
    // One transaction per driver: a failure leaves no half-written driver behind.
    const id = await db.transaction((trx) => insertDriver(trx, d, makerId.get(d.makerSlug) as number));
    await refreshDriverFigures(db, id);
    added++;
  }
  const missing = await db('drivers as d').leftJoin('driver_figures as f', 'f.driver_id', 'd.id').whereNull('f.driver_id').select('d.id');
  for (const r of missing) await refreshDriverFigures(db, r.id);
  return { drivers: catalogue.length, added };
}
