import type { Knex } from 'knex';
import type { RoleBands } from '../../shared/catalogue/role-index';
import type { BurnInState, CurveKind, DriverType } from '../../shared/schemas/drivers';
import type { IndexedDriver } from './search-index';

export interface DriverRow {
  id: number;
  slug: string;
  model: string;
  type: DriverType;
  nominalSizeIn: number;
  nominalImpedanceOhm: number;
  makerSlug: string;
  makerName: string;
  canonicalId: number | null;
  diaphragm: string | null;
  surround: string | null;
  voiceCoilDiameterM: number | null;
  magnet: string | null;
  price: number | null;
  currency: string | null;
  availability: string | null;
}

export interface SetRow {
  id: number;
  driverId: number;
  label: string;
  reviewer: string;
  burnIn: BurnInState;
  driveVoltageV: number;
  distanceM: number;
  baffle: string;
  gating: string | null;
  temperatureC: number | null;
  measuredOn: string | null;
  sampleId: string | null;
  anglesDeg: number[];
}

export interface ParameterRow {
  setId: number;
  name: string;
  value: number;
  unit: string;
  signal: 'small' | 'large';
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
  'd.id', 'd.slug', 'd.model', 'd.type', 'd.canonical_id as canonicalId',
  'd.nominal_size_in as nominalSizeIn', 'd.nominal_impedance_ohm as nominalImpedanceOhm',
  'd.diaphragm_material as diaphragm', 'd.surround_material as surround', 'd.voice_coil_diameter_m as voiceCoilDiameterM',
  'd.magnet_type as magnet', 'd.price', 'd.currency', 'd.availability',
  'm.slug as makerSlug', 'm.name as makerName',
];

const MAX_MERGE_HOPS = 8;

function parseJson<T>(value: unknown): T {
  return (typeof value === 'string' ? JSON.parse(value) : value) as T;
}

function toDriver(r: Record<string, unknown> | undefined): DriverRow | undefined {
  if (!r) return undefined;
  // DECIMAL arrives as a string from mysql2.
  return { ...(r as unknown as DriverRow), price: r.price == null ? null : Number(r.price) };
}

export function createDriversRepository(db: Knex) {
  return {
    /** Every canonical driver with its searchable figures, for the in-memory index. */
    async loadIndexRows(): Promise<IndexedDriver[]> {
      const rows = await db('drivers as d')
        .join('makers as m', 'm.id', 'd.maker_id')
        // Only drivers with approved measurements (which is when figures exist) are searchable; an
        // entry created by a pending submission waits for moderation.
        .join('driver_figures as f', 'f.driver_id', 'd.id')
        .whereNull('d.canonical_id')
        .orderBy('d.id')
        .select(
          'd.id', 'd.slug', 'd.model', 'd.type', 'd.nominal_size_in as nominalSizeIn', 'd.nominal_impedance_ohm as nominalImpedanceOhm',
          'd.price', 'd.currency', 'm.slug as makerSlug', 'm.name as makerName',
          'f.fs_hz as fsHz', 'f.qts', 'f.vas_m3 as vasM3', 'f.xmax_m as xmaxM', 'f.sensitivity_db as sensitivityDb', 'f.bands',
        );
      const aliases = await db('driver_aliases').select('driver_id as driverId', 'alias');
      const byDriver = new Map<number, string[]>();
      for (const a of aliases as { driverId: number; alias: string }[]) {
        const list = byDriver.get(a.driverId) ?? [];
        list.push(a.alias);
        byDriver.set(a.driverId, list);
      }
      return rows.map((r: Record<string, unknown>) => ({
        id: r.id as number,
        slug: r.slug as string,
        model: r.model as string,
        makerSlug: r.makerSlug as string,
        makerName: r.makerName as string,
        type: r.type as DriverType,
        nominalSizeIn: r.nominalSizeIn as number,
        nominalImpedanceOhm: r.nominalImpedanceOhm as number,
        fsHz: (r.fsHz as number | null) ?? null,
        qts: (r.qts as number | null) ?? null,
        vasL: r.vasM3 == null ? null : Number(((r.vasM3 as number) * 1000).toFixed(3)),
        xmaxMm: r.xmaxM == null ? null : Number(((r.xmaxM as number) * 1000).toFixed(3)),
        sensitivityDb: (r.sensitivityDb as number | null) ?? null,
        price: r.price == null ? null : Number(r.price),
        currency: (r.currency as string | null) ?? null,
        aliases: byDriver.get(r.id as number) ?? [],
        bands: r.bands == null ? null : parseJson<RoleBands>(r.bands),
      }));
    },

    /** Cheap fingerprint of the catalogue; it changes whenever drivers or their figures do. */
    async catalogueVersion(): Promise<string> {
      const [[row]] = (await db.raw(
        'select (select count(*) from drivers) as n, (select max(updated_at) from drivers) as d, (select max(updated_at) from driver_figures) as u, (select count(*) from driver_aliases) as a',
      )) as [[{ n: number; d: string | null; u: string | null; a: number }]];
      return `${row.n}:${row.d}:${row.u}:${row.a}`;
    },

    async findDriverBySlug(slug: string): Promise<DriverRow | undefined> {
      return toDriver(await db('drivers as d').join('makers as m', 'm.id', 'd.maker_id').where('d.slug', slug).first(driverColumns));
    },

    async findDriverById(id: number): Promise<DriverRow | undefined> {
      return toDriver(await db('drivers as d').join('makers as m', 'm.id', 'd.maker_id').where('d.id', id).first(driverColumns));
    },

    async findDriverIdByAliasSlug(slug: string): Promise<number | undefined> {
      const row = await db('driver_aliases').where({ slug }).first('driver_id');
      return row?.driver_id;
    },

    /** The surviving entry for an id, following merge pointers (bounded in case bad data loops). */
    async canonicalById(id: number): Promise<DriverRow | undefined> {
      let row = await this.findDriverById(id);
      for (let hops = 0; row && row.canonicalId !== null && hops < MAX_MERGE_HOPS; hops++) row = await this.findDriverById(row.canonicalId);
      return row;
    },

    /** The surviving entry for a slug or an old slug. */
    async resolveSlug(slug: string): Promise<DriverRow | undefined> {
      const direct = await this.findDriverBySlug(slug);
      const id = direct?.id ?? (await this.findDriverIdByAliasSlug(slug));
      return id === undefined ? undefined : this.canonicalById(id);
    },

    /** Listed: at least one set a moderator has approved. Until then the entry is pending. */
    async hasApprovedSet(driverId: number): Promise<boolean> {
      return Boolean(await db('measurement_sets').where({ driver_id: driverId, status: 'approved' }).first('id'));
    },

    async hasSetSubmittedBy(driverId: number, userId: number): Promise<boolean> {
      return Boolean(await db('measurement_sets').where({ driver_id: driverId, submitted_by: userId }).first('id'));
    },

    /** Sensitivity at the type's reference band, as search shows it. */
    async listedSensitivity(driverId: number): Promise<number | null> {
      return (await db('driver_figures').where({ driver_id: driverId }).first('sensitivity_db'))?.sensitivity_db ?? null;
    },

    async aliasesFor(driverId: number): Promise<string[]> {
      return (await db('driver_aliases').where({ driver_id: driverId }).orderBy('id').select('alias')).map((r: { alias: string }) => r.alias);
    },

    async mountingFor(driverId: number) {
      return db('driver_mounting')
        .where({ driver_id: driverId })
        .first('cutout_diameter_m as cutoutM', 'outer_diameter_m as outerM', 'mounting_depth_m as depthM', 'bolt_circle_m as boltCircleM', 'hole_count as holes');
    },

    async makerSpecsFor(driverId: number): Promise<{ name: string; value: number; unit: string }[]> {
      return db('maker_specs').where({ driver_id: driverId }).orderBy('id').select('name', 'value', 'unit');
    },

    async setsForDriver(driverId: number): Promise<SetRow[]> {
      const rows = await db('measurement_sets')
        .where({ driver_id: driverId, status: 'approved' })
        .orderBy('id')
        .select(
          'id', 'driver_id as driverId', 'label', 'reviewer', 'burn_in as burnIn', 'drive_voltage_v as driveVoltageV', 'distance_m as distanceM',
          'baffle', 'gating', 'temperature_c as temperatureC', 'measured_on as measuredOn', 'sample_id as sampleId', 'angles_deg',
        );
      return rows.map(({ angles_deg, ...r }: Record<string, unknown>) => ({ ...(r as unknown as SetRow), anglesDeg: angles_deg == null ? [] : parseJson<number[]>(angles_deg) }));
    },

    async parametersForSets(setIds: number[]): Promise<ParameterRow[]> {
      if (setIds.length === 0) return [];
      return db('parameters').whereIn('set_id', setIds).orderBy('id').select('set_id as setId', 'name', 'value', 'unit', 'signal');
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
        x: parseJson<number[]>(r.x_values),
        y: parseJson<number[]>(r.y_values),
        phase: r.phase_values == null ? null : parseJson<number[]>(r.phase_values),
      }));
    },
  };
}
export type DriversRepository = ReturnType<typeof createDriversRepository>;
