import type { Knex } from 'knex';
import { computeIndexRow } from '../../shared/catalogue/index-row';
import type { CurveKind, DriverType } from '../../shared/schemas/drivers';

const parseJson = (v: unknown) => (typeof v === 'string' ? JSON.parse(v) : v);

/**
 * Recomputes a driver's searchable figures from its primary (first approved) set. Called after
 * seeding, approval and merges so search never reads curves.
 */
export async function refreshDriverFigures(db: Knex, driverId: number): Promise<void> {
  const driver = await db('drivers').where({ id: driverId }).first('id', 'type');
  if (!driver) return;
  const set = await db('measurement_sets').where({ driver_id: driverId, status: 'approved' }).orderBy('id').first('id');
  if (!set) {
    await db('driver_figures').where({ driver_id: driverId }).delete();
    return;
  }
  const [parameters, curveRows] = await Promise.all([
    db('parameters').where({ set_id: set.id }).select('name', 'value'),
    db('curves').where({ set_id: set.id }).whereIn('kind', ['spl', 'thd']).select('kind', 'angle_deg', 'drive_level_v', 'x_values', 'y_values'),
  ]);
  const curves = curveRows.map((r: Record<string, unknown>) => ({
    kind: r.kind as CurveKind,
    angleDeg: r.angle_deg as number | null,
    driveLevelV: r.drive_level_v as number | null,
    x: parseJson(r.x_values) as number[],
    y: parseJson(r.y_values) as number[],
    phase: null,
  }));
  const row = computeIndexRow(driver.type as DriverType, { parameters, curves });
  await db('driver_figures')
    .insert({
      driver_id: driverId,
      set_id: set.id,
      fs_hz: row.fsHz,
      qts: row.qts,
      vas_m3: row.vasM3,
      xmax_m: row.xmaxM,
      sensitivity_db: row.sensitivityDb,
      bands: JSON.stringify(row.bands),
      updated_at: db.fn.now(),
    })
    .onConflict('driver_id')
    .merge();
}
