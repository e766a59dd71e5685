import type { Knex } from 'knex';
import { demoDrivers, demoMakers } from './catalogue';
import { logGrid, onAxisSpl } from './skeleton-curves';

/** Loads the demo catalogue. Re-running replaces each demo driver's data instead of duplicating it. */
export async function seedDemo(db: Knex): Promise<{ drivers: number }> {
  const grid = logGrid();
  await db.transaction(async (trx) => {
    for (const m of demoMakers) {
      await trx('makers').insert(m).onConflict('slug').merge();
    }
    const makers = await trx('makers').select('id', 'slug');
    const makerId = new Map(makers.map((m: { id: number; slug: string }) => [m.slug, m.id]));
    for (const d of demoDrivers) {
      const row = {
        slug: d.slug,
        maker_id: makerId.get(d.makerSlug),
        model: d.model,
        type: d.type,
        nominal_size_in: d.nominalSizeIn,
        nominal_impedance_ohm: d.nominalImpedanceOhm,
      };
      await trx('drivers').insert(row).onConflict('slug').merge();
      const { id: driverId } = await trx('drivers').where({ slug: d.slug }).first('id');
      await trx('measurement_sets').where({ driver_id: driverId }).delete();
      const [setId] = await trx('measurement_sets').insert({
        driver_id: driverId,
        label: 'Demo bench, sample A',
        status: 'approved',
        drive_voltage_v: 2.83,
        distance_m: 1,
        baffle: 'IEC 60268-5 standard baffle',
        gating: '5 ms gate, merged with near-field below 300 Hz',
        temperature_c: 21,
        measured_on: '2026-10-14',
        sample_id: 'A',
      });
      const qts = (d.ts.qms * d.ts.qes) / (d.ts.qms + d.ts.qes);
      const params: [string, number, string][] = [
        ['fs', d.ts.fs, 'Hz'], ['qms', d.ts.qms, ''], ['qes', d.ts.qes, ''], ['qts', qts, ''],
        ['re', d.ts.re, 'ohm'], ['le', d.ts.le, 'H'], ['bl', d.ts.bl, 'T·m'], ['mms', d.ts.mms, 'kg'],
        ['sd', d.ts.sd, 'm^2'], ['xmax', d.ts.xmax, 'm'],
      ];
      await trx('parameters').insert(params.map(([name, value, unit]) => ({ set_id: setId, name, value, unit })));
      const spl = onAxisSpl(d, grid);
      await trx('curves').insert({
        set_id: setId,
        kind: 'spl',
        angle_deg: 0,
        drive_level_v: 2.83,
        x_values: JSON.stringify(grid.map((f) => Number(f.toFixed(3)))),
        y_values: JSON.stringify(spl.map((v) => Number(v.toFixed(2)))),
        phase_values: null,
      });
    }
  });
  return { drivers: demoDrivers.length };
}
