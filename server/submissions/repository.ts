import type { Knex } from 'knex';
import { normaliseName, type NearDuplicateCandidate } from '../../shared/catalogue/near-duplicates';
import { joinSlugs, slugVariant } from '../../shared/catalogue/slug';
import { columnLimits } from '../../shared/schemas/column-limits';
import type { MySubmission } from '../../shared/schemas/submissions';

const isDuplicate = (err: unknown) => (err as { code?: string }).code === 'ER_DUP_ENTRY';
/** A conflict the service reports as 409 naming `field`. */
const conflict = (field: string, message: string) => Object.assign(new Error(message), { field, conflict: true });

/**
 * After a duplicate-key retry the row that won was committed after this transaction's snapshot;
 * a locking read sees it. The first try reads plainly, so concurrent submissions do not lock gaps.
 */
const latest = <T extends Knex.QueryBuilder>(q: T, attempt: number): T => (attempt > 0 ? (q.forShare() as T) : q);

/** The first of slug, slug-2, slug-3, … that is not in `taken`. */
function freeSlug(base: string, taken: ReadonlySet<string>, max: number): string {
  let slug = base;
  for (let n = 2; taken.has(slug); n++) slug = slugVariant(base, n, max);
  return slug;
}

/**
 * The maker a submission names. A maker whose slug is this one (or a numbered variant of it) and
 * whose name reads the same once case, accents, spaces and punctuation are ignored is reused; any
 * other name gets its own maker under the next free variant, so two names that transliterate alike
 * are never filed together.
 */
async function makerFor(trx: Knex.Transaction, name: string, baseSlug: string): Promise<{ id: number; slug: string }> {
  const key = normaliseName(name);
  for (let attempt = 0; ; attempt++) {
    const near: { id: number; slug: string; name: string }[] = await latest(trx('makers').where('slug', baseSlug).orWhere('slug', 'like', `${baseSlug}-%`).select('id', 'slug', 'name'), attempt);
    const same = near.find((m) => normaliseName(m.name) === key);
    if (same) return { id: same.id, slug: same.slug };
    const slug = freeSlug(baseSlug, new Set(near.map((m) => m.slug)), columnLimits.makers.slug);
    try {
      const [id] = await trx('makers').insert({ slug, name });
      return { id, slug };
    } catch (err) {
      // Another submission took the slug between the read and the insert: look again.
      if (!isDuplicate(err) || attempt >= 3) throw err;
    }
  }
}

/**
 * A new driver under `maker`. The same model under the same maker is a conflict (pick the listed
 * one); a different model whose slug comes out alike gets the next free variant. Old slugs kept as
 * aliases count as taken, since they still lead to their driver.
 */
async function insertDriver(
  trx: Knex.Transaction,
  maker: { id: number; slug: string },
  d: { model: string; modelSlug: string; type: string; nominalSizeIn: number; nominalImpedanceOhm: number },
): Promise<{ id: number; slug: string }> {
  const max = columnLimits.drivers.slug;
  // Room for a "-999" variant, so every variant still starts with the base and the prefix search finds it.
  const base = joinSlugs(maker.slug, d.modelSlug, max - 4);
  for (let attempt = 0; ; attempt++) {
    const near: { makerId: number; slug: string; model: string }[] = await latest(trx('drivers').where('slug', base).orWhere('slug', 'like', `${base}-%`).select('maker_id as makerId', 'slug', 'model'), attempt);
    if (near.some((n) => n.makerId === maker.id && normaliseName(n.model) === normaliseName(d.model))) {
      throw conflict('driver.model', 'this maker already has a driver with that model; pick it instead');
    }
    const aliases: { slug: string }[] = await trx('driver_aliases').where('slug', base).orWhere('slug', 'like', `${base}-%`).select('slug');
    const slug = freeSlug(base, new Set([...near, ...aliases].map((n) => n.slug)), max);
    try {
      const [id] = await trx('drivers').insert({
        slug, maker_id: maker.id, model: d.model, type: d.type, nominal_size_in: d.nominalSizeIn, nominal_impedance_ohm: d.nominalImpedanceOhm,
      });
      return { id, slug };
    } catch (err) {
      if (!isDuplicate(err) || attempt >= 3) throw err;
    }
  }
}

export function createSubmissionsRepository(db: Knex) {
  return {
    /** Runs `fn` in one transaction: a submission lands whole or not at all. */
    transaction: <T,>(fn: (trx: Knex.Transaction) => Promise<T>) => db.transaction(fn),

    async stageUpload(row: { token: string; userId: number; fileName: string; kind: string; angleDeg: number | null; driveLevelV: number | null; bytes: Buffer; settings: unknown }): Promise<void> {
      await db('upload_files').insert({
        token: row.token, uploaded_by: row.userId, file_name: row.fileName, kind: row.kind, angle_deg: row.angleDeg, drive_level_v: row.driveLevelV,
        bytes: row.bytes, parse_settings: JSON.stringify(row.settings),
      });
    },

    /** Staged files never submitted; a draft left for a day is abandoned, and its bytes go. */
    async dropStaleUploads(userId: number, olderThanHours: number): Promise<number> {
      return db('upload_files')
        .where({ uploaded_by: userId })
        .whereNull('set_id')
        .where('created_at', '<', db.raw('NOW() - INTERVAL ? HOUR', [olderThanHours]))
        .delete();
    },

    async stagedUploads(trx: Knex.Transaction, tokens: string[], userId: number) {
      const rows = await trx('upload_files').whereIn('token', tokens).where({ uploaded_by: userId }).whereNull('set_id').forUpdate()
        .select('id', 'token', 'file_name as fileName', 'kind', 'angle_deg as angleDeg', 'drive_level_v as driveLevelV', 'bytes', 'parse_settings as settings');
      return rows.map((r: Record<string, unknown>) => ({ ...r, settings: typeof r.settings === 'string' ? JSON.parse(r.settings) : r.settings })) as {
        id: number; token: string; fileName: string; kind: string; angleDeg: number | null; driveLevelV: number | null; bytes: Buffer; settings: { options?: object };
      }[];
    },

    /**
     * Creates the pending set, inside the caller's transaction, for a driver the submitter may see
     * or for a new one under its maker. `makerSlug` and `modelSlug` are already non-empty.
     */
    async createPendingSet(
      trx: Knex.Transaction,
      s: {
        driver: { slug: string } | { makerName: string; makerSlug: string; model: string; modelSlug: string; type: string; nominalSizeIn: number; nominalImpedanceOhm: number };
        userId: number;
        /** Moderators may add sets to entries still waiting for approval; others only to their own. */
        seesPending: boolean;
        method: Record<string, unknown>;
        anglesDeg: number[];
        normalisation: unknown;
      },
    ): Promise<{ setId: number; driverSlug: string }> {
      let driverId: number;
      let driverSlug: string;
      if ('slug' in s.driver) {
        const d = await trx('drivers as d').where({ 'd.slug': s.driver.slug })
          .where((q) => {
            if (s.seesPending) return;
            void q.whereExists(trx('measurement_sets as s').whereRaw('s.driver_id = d.id').where((w) => void w.where('s.status', 'approved').orWhere('s.submitted_by', s.userId)));
          })
          .first('d.id', 'd.slug');
        if (!d) throw Object.assign(new Error('no driver has this slug'), { field: 'driver.slug' });
        driverId = d.id;
        driverSlug = d.slug;
      } else {
        const maker = await makerFor(trx, s.driver.makerName, s.driver.makerSlug);
        const created = await insertDriver(trx, maker, s.driver);
        driverId = created.id;
        driverSlug = created.slug;
      }
      const m = s.method;
      const [setId] = await trx('measurement_sets').insert({
        driver_id: driverId, label: m.label, reviewer: m.reviewer, status: 'pending', burn_in: m.burnIn, drive_voltage_v: m.driveVoltageV, distance_m: m.distanceM,
        baffle: m.baffle, gating: m.gating, temperature_c: m.temperatureC, measured_on: m.measuredOn, sample_id: m.sampleId, submitted_by: s.userId,
        angles_deg: JSON.stringify(s.anglesDeg), normalisation: JSON.stringify(s.normalisation),
      });
      return { setId, driverSlug };
    },

    async insertCurve(trx: Knex.Transaction, setId: number, c: { kind: string; angleDeg: number | null; driveLevelV: number | null; x: number[]; y: number[]; phase: number[] | null }): Promise<void> {
      await trx('curves').insert({
        set_id: setId, kind: c.kind, angle_deg: c.angleDeg, drive_level_v: c.driveLevelV, x_values: JSON.stringify(c.x), y_values: JSON.stringify(c.y), phase_values: c.phase ? JSON.stringify(c.phase) : null,
      });
    },

    async finishSet(trx: Knex.Transaction, setId: number, parameters: { name: string; value: number; unit: string; signal: string }[], uploadIds: number[]): Promise<void> {
      if (parameters.length) await trx('parameters').insert(parameters.map((p) => ({ set_id: setId, ...p })));
      await trx('upload_files').whereIn('id', uploadIds).update({ set_id: setId });
    },

    /**
     * Every driver, merged ones included (their slugs still redirect), as id, slug, model, maker
     * name, aliases and status only: no curves, parameters or figures. The catalogue is small (tens
     * of drivers), so the fuzzy comparison runs in memory rather than behind a SQL prefilter.
     */
    async nearDuplicateCandidates(userId: number): Promise<(NearDuplicateCandidate & { submittedByUser: boolean })[]> {
      const rows: { id: number; slug: string; model: string; makerName: string; listed: number | string; mine: number | string }[] = await db('drivers as d')
        .join('makers as m', 'm.id', 'd.maker_id')
        .orderBy('d.id')
        .select('d.id', 'd.slug', 'd.model', 'm.name as makerName')
        // A driver created by a submission stays pending until a moderator approves one of its sets.
        .select(db.raw('exists (select 1 from measurement_sets s where s.driver_id = d.id and s.status = ?) as listed', ['approved']))
        .select(db.raw('exists (select 1 from measurement_sets s where s.driver_id = d.id and s.submitted_by = ?) as mine', [userId]));
      const aliases: { driverId: number; alias: string }[] = await db('driver_aliases').orderBy('id').select('driver_id as driverId', 'alias');
      const byDriver = new Map<number, string[]>();
      for (const a of aliases) byDriver.set(a.driverId, [...(byDriver.get(a.driverId) ?? []), a.alias]);
      return rows.map((r) => ({
        id: r.id, slug: r.slug, model: r.model, makerName: r.makerName, aliases: byDriver.get(r.id) ?? [],
        status: Number(r.listed) ? 'listed' : 'pending',
        submittedByUser: Boolean(Number(r.mine)),
      }));
    },

    async setForRenormalise(trx: Knex.Transaction, setId: number): Promise<{ driveVoltageV: number; distanceM: number } | null> {
      const row = await trx('measurement_sets').where({ id: setId }).forUpdate().first('drive_voltage_v as driveVoltageV', 'distance_m as distanceM');
      return row ? { driveVoltageV: Number(row.driveVoltageV), distanceM: Number(row.distanceM) } : null;
    },

    async originalsOfSet(trx: Knex.Transaction, setId: number) {
      const rows = await trx('upload_files').where({ set_id: setId }).orderBy('id')
        .select('file_name as fileName', 'kind', 'angle_deg as angleDeg', 'drive_level_v as driveLevelV', 'bytes', 'parse_settings as settings');
      return rows.map((r: Record<string, unknown>) => ({ ...r, settings: typeof r.settings === 'string' ? JSON.parse(r.settings) : r.settings })) as {
        fileName: string; kind: string; angleDeg: number | null; driveLevelV: number | null; bytes: Buffer; settings: { options?: object };
      }[];
    },

    /** Swaps a set's curves for freshly normalised ones; the fitted impedance model is derived, not an original, so it stays. */
    async replaceCurves(trx: Knex.Transaction, setId: number, curves: { kind: string; angleDeg: number | null; driveLevelV: number | null; x: number[]; y: number[]; phase: number[] | null }[], normalisation: unknown): Promise<void> {
      await trx('curves').where({ set_id: setId }).whereNot({ kind: 'impedance_fit' }).delete();
      for (const c of curves) await this.insertCurve(trx, setId, c);
      await trx('measurement_sets').where({ id: setId }).update({ normalisation: JSON.stringify(normalisation) });
    },

    async mine(userId: number): Promise<MySubmission[]> {
      return db('measurement_sets as s')
        .join('drivers as d', 'd.id', 's.driver_id')
        .join('makers as m', 'm.id', 'd.maker_id')
        .where({ 's.submitted_by': userId })
        .orderBy('s.id', 'desc')
        .select('s.id', 's.status', 's.label', 's.created_at as createdAt', 'd.slug as driverSlug', 'd.model', 'm.name as makerName')
        .select(db.raw('(select count(*) from curves c where c.set_id = s.id) as curveCount'))
        .then((rows: Record<string, unknown>[]) => rows.map((r) => ({ ...r, curveCount: Number(r.curveCount) }) as MySubmission));
    },
  };
}
export type SubmissionsRepository = ReturnType<typeof createSubmissionsRepository>;
