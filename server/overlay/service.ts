import { createHash, randomBytes } from 'node:crypto';
import { isDbUnavailable } from '../../db/db-errors';
import { interpolateLog, logFrequencyGrid } from '../../shared/acoustics/curves';
import { errorCodes } from '../../shared/api/errors';
import { computeDerivedFigures } from '../../shared/catalogue/derived-figures';
import type { Curve } from '../../shared/schemas/drivers';
import { referenceBandFor } from '../../shared/schemas/drivers';
import { bandOfQuery } from '../../shared/schemas/band';
import type { OverlayDriver, OverlayOptions, OverlayQuery, OverlayResponse, SavedOverlay } from '../../shared/schemas/overlay';
import { overlayOptionsSchema, type saveOverlaySchema } from '../../shared/schemas/overlay';
import type { z } from 'zod';
import type { DriversRepository } from '../drivers/repository';
import { driverIdentity } from '../drivers/service';
import { ApiError, notFound } from '../http/api-error';
import type { OverlayRepository } from './repository';

/** The display grid: the storage grid's 1/48-octave points from 20 Hz to 20 kHz. */
export const OVERLAY_GRID = logFrequencyGrid(48, 20, 20000).map((f) => Number(f.toPrecision(6)));

const CODE_ALPHABET = 'abcdefghijkmnpqrstuvwxyz23456789';

/**
 * A curve on the display grid, rounded for the wire: levels to 0.1 dB or ohm and phase to 1°
 * (finer than any chart shows), distortion to three significant figures.
 */
function onGrid(c: Curve, values: readonly number[] = c.y, digits: number | 'sig3' = 1): (number | null)[] {
  const scale = typeof digits === 'number' ? 10 ** digits : 1;
  return OVERLAY_GRID.map((f) => {
    const v = interpolateLog(c.x, values, f);
    if (v === null) return null;
    return digits === 'sig3' ? Number(v.toPrecision(3)) : Math.round(v * scale) / scale;
  });
}

/** Options saved before today's rules (a band upside down, say) lose the part that no longer passes rather than failing the link. */
function storedOptions(raw: unknown): OverlayOptions {
  const parsed = overlayOptionsSchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const { bandLo: _lo, bandHi: _hi, ...rest } = (raw ?? {}) as Record<string, unknown>;
  return overlayOptionsSchema.safeParse(rest).data ?? overlayOptionsSchema.parse({});
}

export interface CachedBody {
  bytes: Buffer;
  etag: string;
}

export interface OverlayServiceOptions {
  /** How long a cached comparison is served before the catalogue version is checked again, ms. */
  staleAfterMs?: number;
  /** Until sign-in is enforced, anyone may save links; set false to require a signed-in member. */
  allowAnonymousSave?: boolean;
}

export function createOverlayService(drivers: DriversRepository, repo: OverlayRepository, options: OverlayServiceOptions = {}) {
  async function one(slug: string, setId: number | null, band: { lo: number; hi: number } | null, place: number): Promise<OverlayDriver> {
    const row = await drivers.resolveSlug(slug);
    const sets = row ? await drivers.setsForDriver(row.id) : [];
    // One answer for both, so a comparison never tells whether a pending entry exists.
    if (!row || sets.length === 0) {
      throw new ApiError(404, errorCodes.notFound, `Driver "${slug}" was not found or has no approved measurements yet`, { fields: [{ field: `drivers.${place}`, message: 'no such listed driver' }] });
    }
    const set = setId === null ? sets[0] : sets.find((s) => s.id === setId);
    if (!set) throw new ApiError(400, errorCodes.validation, `Set ${setId} is not an approved set of "${slug}"`, { fields: [{ field: `sets.${place}`, message: 'not a set of this driver' }] });
    const [params, curves] = await Promise.all([drivers.parametersForSets([set.id]), drivers.curvesForSets([set.id])]);
    const parameters = params.map(({ name, value, unit, signal }) => ({ name, value, unit, signal }));
    const cs: Curve[] = curves.map(({ setId: _s, ...c }) => c);
    const figures = computeDerivedFigures({ id: set.id, parameters, curves: cs }, row, band ?? referenceBandFor(row.type));
    const imp = cs.find((c) => c.kind === 'impedance');
    const levels = [...new Set(cs.filter((c) => c.kind === 'thd').map((c) => c.driveLevelV ?? 0))].sort((a, b) => a - b);
    const ref = (s: (typeof sets)[number]) => ({ id: s.id, label: s.label, reviewer: s.reviewer, sampleId: s.sampleId, burnIn: s.burnIn });
    return {
      ...driverIdentity(row, slug),
      sets: sets.map(ref),
      set: { ...ref(set), driveVoltageV: set.driveVoltageV, distanceM: set.distanceM, baffle: set.baffle, gating: set.gating, temperatureC: set.temperatureC, measuredOn: set.measuredOn },
      spl: cs.filter((c) => c.kind === 'spl').sort((a, b) => (a.angleDeg ?? 0) - (b.angleDeg ?? 0)).map((c) => ({ angleDeg: c.angleDeg ?? 0, y: onGrid(c) })),
      impedance: imp ? { magnitude: onGrid(imp), phaseDeg: imp.phase ? onGrid(imp, imp.phase, 0) : null } : null,
      thd: levels.map((level) => {
        const pick = (kind: Curve['kind']) => cs.find((c) => c.kind === kind && (c.driveLevelV ?? 0) === level);
        const thd = pick('thd')!;
        const h2 = pick('h2');
        const h3 = pick('h3');
        return { driveLevelV: level, thd: onGrid(thd, thd.y, 'sig3'), h2: h2 ? onGrid(h2, h2.y, 'sig3') : null, h3: h3 ? onGrid(h3, h3.y, 'sig3') : null };
      }),
      parameters,
      figures,
    };
  }

  // Comparisons are read far more often than the catalogue changes (a linked write-up is opened by
  // every reader), so built responses are kept, serialised, until the catalogue version moves.
  const cache = new Map<string, CachedBody>();
  const CACHE_MAX = 500;
  let cacheVersion = '';
  let checkedAt = 0;
  const staleAfterMs = options.staleAfterMs ?? 2000;

  async function freshCache(): Promise<void> {
    if (Date.now() - checkedAt < staleAfterMs) return;
    const v = await drivers.catalogueVersion();
    checkedAt = Date.now();
    if (v !== cacheVersion) {
      cache.clear();
      cacheVersion = v;
    }
  }

  return {
    /** The comparison as JSON bytes with its ETag, from the cache when the catalogue has not changed. */
    async overlayJson(q: OverlayQuery): Promise<CachedBody> {
      const key = JSON.stringify([q.drivers, q.sets, q.bandLo, q.bandHi]);
      try {
        await freshCache();
      } catch (err) {
        // While the database is away, a comparison already built is served as it was.
        const kept = cache.get(key);
        if (kept && isDbUnavailable(err)) return kept;
        throw err;
      }
      const hit = cache.get(key);
      if (hit !== undefined) {
        cache.delete(key);
        cache.set(key, hit);
        return hit;
      }
      const bytes = Buffer.from(JSON.stringify(await this.overlay(q)));
      // Hashing once here spares Express from hashing the same bytes on every response.
      const body = { bytes, etag: `"${createHash('sha1').update(bytes).digest('base64url')}"` };
      cache.set(key, body);
      if (cache.size > CACHE_MAX) cache.delete(cache.keys().next().value as string);
      return body;
    },

    async overlay(q: OverlayQuery): Promise<OverlayResponse> {
      const band = bandOfQuery(q);
      const list = await Promise.all(q.drivers.map((slug, i) => one(slug, q.sets[i] ?? null, band, i)));
      return { grid: OVERLAY_GRID, band, drivers: list };
    },

    async save(input: z.infer<typeof saveOverlaySchema>, userId: number | null): Promise<{ code: string; url: string }> {
      if (userId === null && options.allowAnonymousSave === false) {
        throw new ApiError(401, errorCodes.unauthenticated, 'Sign in to save a comparison link');
      }
      const entries: { driverId: number; setId: number | null }[] = [];
      for (const [i, e] of input.entries.entries()) {
        const row = await drivers.resolveSlug(e.slug);
        // A saved link is public, and its slugs name maker and model: only listed drivers go in.
        if (!row || !(await drivers.hasApprovedSet(row.id))) {
          throw new ApiError(400, errorCodes.validation, `Driver "${e.slug}" was not found`, { fields: [{ field: `entries.${i}.slug`, message: 'no such driver' }] });
        }
        if (e.setId !== null && !(await repo.setBelongsTo(e.setId, row.id))) {
          throw new ApiError(400, errorCodes.validation, `Set ${e.setId} is not an approved set of "${e.slug}"`, { fields: [{ field: `entries.${i}.setId`, message: 'not a set of this driver' }] });
        }
        entries.push({ driverId: row.id, setId: e.setId });
      }
      let code = '';
      for (let attempt = 0; attempt < 5; attempt++) {
        const bytes = randomBytes(8);
        code = Array.from(bytes, (b) => CODE_ALPHABET[b % CODE_ALPHABET.length]).join('');
        if (!(await repo.codeExists(code))) break;
      }
      await repo.insertSaved({ code, title: input.title, note: input.note, entries, options: input.options, createdBy: userId });
      return { code, url: `/o/${code}` };
    },

    listMine: (userId: number) => repo.listSavedBy(userId),

    async getSaved(code: string): Promise<SavedOverlay> {
      const row = await repo.findSaved(code);
      if (!row) throw notFound(`Saved comparison "${code}"`);
      const entries = [];
      for (const e of row.entries) {
        // A set follows its driver through a merge; use wherever the set now lives.
        const driverId = e.setId !== null ? ((await repo.driverOfSet(e.setId)) ?? e.driverId) : e.driverId;
        const current = await drivers.canonicalById(driverId);
        if (current && (await drivers.hasApprovedSet(current.id))) entries.push({ slug: current.slug, setId: e.setId });
      }
      return { code: row.code, title: row.title, note: row.note, entries, options: storedOptions(row.options), createdAt: row.createdAt };
    },
  };
}
