import { isDbUnavailable } from '../../db/db-errors';
import { computeDerivedFigures } from '../../shared/catalogue/derived-figures';
import type { DriverDetail, DriverIdentity, DriverListQuery, DriverListResponse } from '../../shared/schemas/drivers';
import { availabilitySchema, referenceBandFor } from '../../shared/schemas/drivers';
import { roleAtLeast, type User } from '../../shared/schemas/users';
import { notFound } from '../http/api-error';
import type { DriverRow, DriversRepository } from './repository';
import { SearchIndex } from './search-index';

export interface DriversServiceOptions {
  /** How long a built index is trusted before the catalogue version is checked again, ms. */
  staleAfterMs?: number;
}

const toMm = (m: number | null) => (m === null ? null : Math.round(m * 10000) / 10);

/** A driver's naming fields, in the order both the driver page and the overlay send them. */
export function driverIdentity(row: DriverRow, requestedSlug: string): DriverIdentity {
  return {
    slug: row.slug,
    requestedSlug,
    model: row.model,
    maker: { slug: row.makerSlug, name: row.makerName },
    type: row.type,
    nominalSizeIn: row.nominalSizeIn,
    nominalImpedanceOhm: row.nominalImpedanceOhm,
  };
}

/** Who is asking, as far as pending entries go: moderators see them all, others those they submitted to. */
export interface Viewer {
  userId: number | null;
  seesPending: boolean;
}

export function viewerOf(user: User | null): Viewer {
  return { userId: user?.id ?? null, seesPending: user !== null && roleAtLeast(user.role, 'moderator') };
}

/**
 * Whether a driver with no approved set may be shown: a pending entry's name and maker stay with
 * its submitters and the moderators until one of its sets is approved.
 */
export async function maySeePending(repo: Pick<DriversRepository, 'hasSetSubmittedBy'>, driverId: number, viewer: Viewer): Promise<boolean> {
  return viewer.seesPending || (viewer.userId !== null && (await repo.hasSetSubmittedBy(driverId, viewer.userId)));
}

export function createDriversService(repo: DriversRepository, options: DriversServiceOptions = {}) {
  const staleAfterMs = options.staleAfterMs ?? 2000;
  let index: SearchIndex | null = null;
  let version = '';
  let checkedAt = 0;
  let building: Promise<SearchIndex> | null = null;

  async function currentIndex(): Promise<SearchIndex> {
    const now = Date.now();
    if (index && now - checkedAt < staleAfterMs) return index;
    let v: string;
    try {
      v = await repo.catalogueVersion();
    } catch (err) {
      // While the database is away, the last index built is a far better answer than none.
      if (index && isDbUnavailable(err)) return index;
      throw err;
    }
    checkedAt = Date.now();
    if (index && v === version) return index;
    if (!building) {
      building = repo
        .loadIndexRows()
        .then((rows) => {
          index = new SearchIndex(rows);
          version = v;
          return index;
        })
        .finally(() => {
          building = null;
        });
    }
    return building;
  }

  return {
    async list(query: DriverListQuery): Promise<DriverListResponse> {
      return (await currentIndex()).search(query);
    },

    /** Drops the cached index; the next search rebuilds it. Call after any catalogue write. */
    invalidate(): void {
      index = null;
      checkedAt = 0;
    },

    async get(slug: string, band: { lo: number; hi: number } | undefined, viewer: Viewer): Promise<DriverDetail> {
      const row = await repo.resolveSlug(slug);
      if (!row) throw notFound(`Driver "${slug}"`);
      const sets = await repo.setsForDriver(row.id);
      // The same answer as for a slug nobody uses, so a pending entry's existence does not show either.
      if (sets.length === 0 && !(await maySeePending(repo, row.id, viewer))) throw notFound(`Driver "${slug}"`);
      const setIds = sets.map((s) => s.id);
      const [params, curves, aliases, mounting, makerSpecs, sensitivityDb] = await Promise.all([
        repo.parametersForSets(setIds),
        repo.curvesForSets(setIds),
        repo.aliasesFor(row.id),
        repo.mountingFor(row.id),
        repo.makerSpecsFor(row.id),
        repo.listedSensitivity(row.id),
      ]);
      const measurementSets = sets.map((s) => ({
        id: s.id,
        label: s.label,
        reviewer: s.reviewer,
        sampleId: s.sampleId,
        burnIn: s.burnIn,
        driveVoltageV: s.driveVoltageV,
        distanceM: s.distanceM,
        baffle: s.baffle,
        gating: s.gating,
        temperatureC: s.temperatureC,
        measuredOn: s.measuredOn,
        anglesDeg: s.anglesDeg,
        parameters: params.filter((p) => p.setId === s.id).map(({ name, value, unit, signal }) => ({ name, value, unit, signal })),
        curves: curves.filter((c) => c.setId === s.id).map(({ setId: _setId, ...c }) => c),
      }));
      const figureBand = band ?? referenceBandFor(row.type);
      const figures = measurementSets.map((s) => computeDerivedFigures(s, row, figureBand));
      const first = measurementSets[0]?.parameters ?? [];
      const p = (n: string) => first.find((x) => x.name === n)?.value ?? null;
      const spread = spreadOf(measurementSets.map((s) => s.parameters));
      const availability = availabilitySchema.safeParse(row.availability);
      return {
        ...driverIdentity(row, slug),
        fsHz: p('fs'),
        qts: p('qts'),
        vasL: p('vas') === null ? null : (p('vas') as number) * 1000,
        xmaxMm: p('xmax') === null ? null : (p('xmax') as number) * 1000,
        sensitivityDb,
        price: row.price,
        currency: row.currency,
        aliases,
        diaphragm: row.diaphragm,
        surround: row.surround,
        voiceCoilDiameterMm: row.voiceCoilDiameterM === null ? null : row.voiceCoilDiameterM * 1000,
        magnet: row.magnet,
        availability: availability.success ? availability.data : null,
        mounting: mounting
          ? {
              cutoutDiameterMm: toMm(mounting.cutoutM),
              outerDiameterMm: toMm(mounting.outerM),
              mountingDepthMm: toMm(mounting.depthM),
              boltCircleMm: toMm(mounting.boltCircleM),
              holeCount: mounting.holes,
            }
          : null,
        makerSpecs,
        measurementSets,
        figures,
        spread,
      };
    },
  };
}
export type DriversService = ReturnType<typeof createDriversService>;

/** Sample-to-sample spread of each parameter measured in more than one set. */
export function spreadOf(sets: { name: string; value: number }[][]) {
  if (sets.length < 2) return [];
  const byName = new Map<string, number[]>();
  for (const s of sets) for (const p of s) byName.set(p.name, [...(byName.get(p.name) ?? []), p.value]);
  const out: { name: string; min: number; max: number; spreadPercent: number; sets: number }[] = [];
  for (const [name, values] of byName) {
    if (values.length < 2) continue;
    const min = Math.min(...values);
    const max = Math.max(...values);
    const mid = (min + max) / 2;
    // Half the range relative to its centre: the ± a builder reads as unit-to-unit tolerance.
    out.push({ name, min, max, spreadPercent: mid === 0 ? 0 : (100 * (max - min)) / 2 / Math.abs(mid), sets: values.length });
  }
  return out;
}
