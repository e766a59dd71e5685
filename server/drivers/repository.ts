import type { Knex } from 'knex';
import type { CurveKind, DriverType } from '../../shared/schemas/drivers';

export interface DriverRow {
  id: number;
  slug: string;
  model: string;
  type: DriverType;
  nominalSizeIn: number;
  nominalImpedanceOhm: number;
  makerSlug: string;
  makerName: string;
}

export interface SetRow {
  id: number;
  driverId: number;
  label: string;
  driveVoltageV: number;
  distanceM: number;
  baffle: string;
  gating: string | null;
  temperatureC: number | null;
  measuredOn: string | null;
  sampleId: string | null;
}

export interface ParameterRow {
  setId: number;
  name: string;
  value: number;
  unit: string;
}

export interface CurveRow {
  setId: number;
  kind: CurveKind;
  angleDeg: number | null;
  driveLevelV: number | null;
  x: number[];
  y: number[];
  phase: number[] | null;
}

const driverColumns = [
  'd.id', 'd.slug', 'd.model', 'd.type',
  'd.nominal_size_in as nominalSizeIn', 'd.nominal_impedance_ohm as nominalImpedanceOhm',
  'm.slug as makerSlug', 'm.name as makerName',
];

function parseJson(value: unknown): number[] {
  return typeof value === 'string' ? (JSON.parse(value) as number[]) : (value as number[]);
}

export function createDriversRepository(db: Knex) {
  return {
    async listDrivers(filter: { type?: DriverType }): Promise<DriverRow[]> {
      const q = db('drivers as d').join('makers as m', 'm.id', 'd.maker_id').whereNull('d.canonical_id').select(driverColumns);
      if (filter.type) q.where('d.type', filter.type);
      return q.orderBy([{ column: 'm.name' }, { column: 'd.model' }]);
    },

    async findDriverBySlug(slug: string): Promise<DriverRow | undefined> {
      return db('drivers as d').join('makers as m', 'm.id', 'd.maker_id').where('d.slug', slug).first(driverColumns);
    },

    /** Headline parameters per driver from its first approved set, for list cards. */
    async headlineParameters(driverIds: number[], names: string[]): Promise<(ParameterRow & { driverId: number })[]> {
      if (driverIds.length === 0) return [];
      return db('parameters as p')
        .join('measurement_sets as s', 's.id', 'p.set_id')
        .whereIn('s.driver_id', driverIds)
        .where('s.status', 'approved')
        .whereIn('p.name', names)
        .orderBy('s.id')
        .select('s.driver_id as driverId', 'p.set_id as setId', 'p.name', 'p.value', 'p.unit');
    },

    async setsForDriver(driverId: number): Promise<SetRow[]> {
      return db('measurement_sets')
        .where({ driver_id: driverId, status: 'approved' })
        .orderBy('id')
        .select(
          'id', 'driver_id as driverId', 'label', 'drive_voltage_v as driveVoltageV', 'distance_m as distanceM', 'baffle', 'gating',
          'temperature_c as temperatureC', 'measured_on as measuredOn', 'sample_id as sampleId',
        );
    },

    async parametersForSets(setIds: number[]): Promise<ParameterRow[]> {
      if (setIds.length === 0) return [];
      return db('parameters').whereIn('set_id', setIds).orderBy('id').select('set_id as setId', 'name', 'value', 'unit');
    },

    async curvesForSets(setIds: number[]): Promise<CurveRow[]> {
      if (setIds.length === 0) return [];
      const rows = await db('curves')
        .whereIn('set_id', setIds)
        .orderBy('id')
        .select('set_id as setId', 'kind', 'angle_deg as angleDeg', 'drive_level_v as driveLevelV', 'x_values', 'y_values', 'phase_values');
      return rows.map((r: Record<string, unknown>) => ({
        setId: r.setId as number,
        kind: r.kind as CurveKind,
        angleDeg: r.angleDeg as number | null,
        driveLevelV: r.driveLevelV as number | null,
        x: parseJson(r.x_values),
        y: parseJson(r.y_values),
        phase: r.phase_values == null ? null : parseJson(r.phase_values),
      }));
    },
  };
}
export type DriversRepository = ReturnType<typeof createDriversRepository>;
