import { randomBytes } from 'node:crypto';
import { normaliseSpl } from '../../shared/acoustics/levels';
import { parameterUnit } from '../../shared/catalogue/parameter-units';
import { errorCodes } from '../../shared/api/errors';
import { findNearDuplicates } from '../../shared/catalogue/near-duplicates';
import { slugOf } from '../../shared/catalogue/slug';
import { charCount, columnLimits } from '../../shared/schemas/column-limits';
import type { NearDuplicateQuery, NearDuplicatesResponse, UploadMeta } from '../../shared/schemas/submissions';
import type { submissionSchema } from '../../shared/schemas/submissions';
import type { User } from '../../shared/schemas/users';
import { ACOUSTIC_KINDS, onCommonGrid, parseMeasurementFile, parseSummary, previewPoints, type CurveKind, type ParseResult } from '../../shared/uploads';
import type { z } from 'zod';
import { viewerOf } from '../drivers/service';
import { ApiError, notFound } from '../http/api-error';
import type { SubmissionsRepository } from './repository';

/** How long a read file waits for its submission before it is dropped. */
export const STAGED_UPLOAD_HOURS = 24;

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

/** What submit does to every curve of a set measured at `driveVoltageV` and `distanceM`, and its record. */
export function normalisationPlan(driveVoltageV: number, distanceM: number) {
  // SPL at V volts and d metres to 2.83 V / 1 m: +20·log10(2.83/V) for drive, +20·log10(d/1 m) for inverse distance.
  const splShift = normaliseSpl(0, { drive: { voltage: driveVoltageV }, distance: distanceM });
  return {
    splShift,
    record: {
      grid: '1/48 octave, 10 Hz to 40 kHz (acoustic curves; no extrapolation)',
      reference: '2.83 V / 1 m',
      steps: [`SPL shifted ${splShift >= 0 ? '+' : ''}${splShift.toFixed(2)} dB from ${driveVoltageV} V at ${distanceM} m`, 'distortion converted to percent of the fundamental', 'large-signal x in metres'],
    },
  };
}

type StoredUpload = { fileName: string; kind: string; angleDeg: number | null; driveLevelV: number | null; bytes: Buffer; settings: { options?: object } };
type NormalisedCurve = { kind: string; angleDeg: number | null; driveLevelV: number | null; x: number[]; y: number[]; phase: number[] | null };

/** Reads one stored original with its saved settings and puts it on the common grid. */
export function normaliseUpload(u: StoredUpload, splShift: number): NormalisedCurve | { error: string } {
  const parsed = parseMeasurementFile({ name: u.fileName, bytes: u.bytes, kind: u.kind as CurveKind, options: u.settings.options });
  if (!parsed.ok) return { error: parsed.error.message };
  const p = parsed.points;
  if (!ACOUSTIC_KINDS.includes(u.kind as CurveKind)) return { kind: u.kind, angleDeg: null, driveLevelV: null, x: p.x, y: p.y, phase: p.phase };
  const onGrid = onCommonGrid(p, u.kind === 'spl' ? splShift : 0);
  return { kind: u.kind, angleDeg: u.kind === 'spl' ? (u.angleDeg ?? 0) : u.angleDeg, driveLevelV: u.driveLevelV, ...onGrid };
}

// Four characters spare for a numbered variant ("-2" … "-999") when the slug is taken.
const MAKER_SLUG_BASE = columnLimits.makers.slug - 4;

/** The new driver with its maker and model slugs, or a 400 naming the name that has no letter or digit. */
function withSlugs<D extends { makerName: string; model: string }>(d: D): D & { makerSlug: string; modelSlug: string } {
  const makerSlug = slugOf(d.makerName, MAKER_SLUG_BASE);
  const modelSlug = slugOf(d.model, columnLimits.drivers.slug);
  const fields = [
    ...(makerSlug ? [] : [{ field: 'driver.makerName', message: 'needs at least one letter or digit' }]),
    ...(modelSlug ? [] : [{ field: 'driver.model', message: 'needs at least one letter or digit' }]),
  ];
  if (fields.length) throw new ApiError(400, errorCodes.validation, `Invalid body: ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, { fields });
  return { ...d, makerSlug, modelSlug };
}

const FILE_NAME_MAX = columnLimits.upload_files.file_name;

/** Refuses file names longer than the stored column, naming each such file by its place and a shortened name. */
function checkFileNames(files: readonly UploadedFile[]): void {
  const fields = files.flatMap((f, i) =>
    charCount(f.originalname) > FILE_NAME_MAX ? [{ field: `files.${i}`, message: `"${Array.from(f.originalname).slice(0, 40).join('')}…": file name longer than ${FILE_NAME_MAX} characters; rename the file` }] : [],
  );
  if (fields.length) throw new ApiError(400, errorCodes.validation, fields.map((f) => `${f.field}: ${f.message}`).join('; '), { fields });
}
/** Lets other requests (health checks, pages) run between two files of a large upload. */
const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

export function createSubmissionsService(repo: SubmissionsRepository) {
  return {
    /**
     * Reads each file, stages the ones that parse (bytes kept) and reports each file on its own,
     * with a preview on the common grid rather than every point read. Takes the files over: each
     * one's bytes are let go once it is staged, so a large request never holds two copies of all.
     */
    async parse(user: User, files: UploadedFile[], meta: UploadMeta) {
      if (files.length !== meta.length) {
        throw new ApiError(400, errorCodes.validation, `meta describes ${meta.length} files but ${files.length} were sent`, { fields: [{ field: 'meta', message: 'one entry per file' }] });
      }
      checkFileNames(files);
      await repo.dropStaleUploads(user.id, STAGED_UPLOAD_HOURS);
      const queue = files.splice(0);
      const out = [];
      for (let i = 0; queue.length > 0; i++) {
        if (i > 0) await yieldToEventLoop();
        const f = queue.shift() as UploadedFile;
        const m = meta[i];
        const result: ParseResult = parseMeasurementFile({ name: f.originalname, bytes: f.buffer, kind: m.kind, options: m.options });
        if (!result.ok) {
          out.push({ fileName: f.originalname, ok: false as const, error: result.error });
          continue;
        }
        const token = randomBytes(16).toString('hex');
        await repo.stageUpload({ token, userId: user.id, fileName: f.originalname, kind: m.kind, angleDeg: m.angleDeg, driveLevelV: m.driveLevelV, bytes: f.buffer, settings: { options: m.options ?? {}, detected: result.settings } });
        out.push({
          fileName: f.originalname,
          ok: true as const,
          token,
          kind: m.kind,
          angleDeg: m.angleDeg,
          driveLevelV: m.driveLevelV,
          preview: previewPoints(m.kind, result.points),
          pointCount: result.points.x.length,
          summary: parseSummary(result),
          settings: result.settings,
          warnings: result.warnings,
        });
      }
      return { files: out };
    },

    /**
     * Re-reads the staged originals, resamples acoustic curves onto the common grid, refers SPL to
     * 2.83 V / 1 m from the declared drive and distance, and writes everything in one transaction.
     */
    async submit(user: User, input: z.infer<typeof submissionSchema>) {
      const driver = 'slug' in input.driver ? input.driver : withSlugs(input.driver);
      try {
        return await repo.transaction(async (trx) => {
          // In the order the reviewer listed them, so messages and curves follow that order, not the table's.
          const order = new Map(input.uploads.map((t, i) => [t, i]));
          const staged = (await repo.stagedUploads(trx, input.uploads, user.id)).sort((a, b) => (order.get(a.token) ?? 0) - (order.get(b.token) ?? 0));
          const missing = input.uploads.filter((t) => !staged.some((s) => s.token === t));
          if (missing.length) {
            throw new ApiError(400, errorCodes.validation, `${missing.length} upload(s) are unknown, not yours or already submitted`, {
              fields: missing.map((t) => ({ field: `uploads.${input.uploads.indexOf(t)}`, message: 'unknown upload' })),
            });
          }
          // Two files for the same curve (SPL at one angle, THD at one level) would leave the set ambiguous.
          const seen = new Map<string, string>();
          const clashes = [];
          for (const u of staged) {
            const key = `${u.kind}|${u.kind === 'spl' ? (u.angleDeg ?? 0) : u.angleDeg}|${u.driveLevelV}`;
            const other = seen.get(key);
            if (other) clashes.push({ field: `uploads.${order.get(u.token)}`, message: `${u.fileName}: the same curve as uploads.${order.get(other)}` });
            else seen.set(key, u.token);
          }
          if (clashes.length) throw new ApiError(400, errorCodes.validation, 'Two uploads give the same curve', { fields: clashes });
          const { driveVoltageV, distanceM } = input.method;
          const plan = normalisationPlan(driveVoltageV, distanceM);
          const anglesDeg = [...new Set(staged.filter((u) => u.kind === 'spl').map((u) => u.angleDeg ?? 0))];
          const created = await repo.createPendingSet(trx, { driver, userId: user.id, seesPending: viewerOf(user).seesPending, method: { ...input.method, reviewer: user.displayName }, anglesDeg, normalisation: plan.record });
          // Each original is read again from its stored bytes, so what lands is exactly what can be re-run.
          for (const u of staged) {
            const curve = normaliseUpload(u, plan.splShift);
            if ('error' in curve) throw new ApiError(400, errorCodes.validation, curve.error, { fields: [{ field: `uploads.${input.uploads.indexOf(u.token)}`, message: curve.error }] });
            await repo.insertCurve(trx, created.setId, curve);
          }
          const parameters = input.parameters.map((p) => ({ name: p.name, value: p.value, unit: parameterUnit(p.name), signal: p.signal }));
          await repo.finishSet(trx, created.setId, parameters, staged.map((s) => s.id));
          return created;
        });
      } catch (err) {
        if (err instanceof ApiError) throw err;
        const e = err as { code?: string; field?: string; message?: string; conflict?: boolean };
        if (e.conflict && e.field) throw new ApiError(409, errorCodes.conflict, `${e.field}: ${e.message}`, { fields: [{ field: e.field, message: e.message ?? 'already listed' }] });
        if (e.code === 'ER_DUP_ENTRY') throw new ApiError(409, errorCodes.conflict, 'A driver with that maker and model already exists; pick it instead', { fields: [{ field: 'driver', message: 'already listed' }] });
        if (e.field) throw new ApiError(400, errorCodes.validation, `${e.field}: ${e.message}`, { fields: [{ field: e.field, message: e.message ?? 'invalid' }] });
        throw err;
      }
    },

    mine: (user: User) => repo.mine(user.id),

    /**
     * Reads a set's kept originals again with their saved settings and replaces its curves, for a
     * moderator after the reader or the grid changes. All or nothing, like the submission itself.
     */
    async renormalise(setId: number) {
      return repo.transaction(async (trx) => {
        const set = await repo.setForRenormalise(trx, setId);
        if (!set) throw notFound(`Measurement set ${setId}`);
        const originals = await repo.originalsOfSet(trx, setId);
        if (originals.length === 0) throw new ApiError(409, errorCodes.conflict, `Set ${setId} has no kept originals to read again`);
        const plan = normalisationPlan(set.driveVoltageV, set.distanceM);
        const curves = [];
        for (const u of originals) {
          const curve = normaliseUpload(u, plan.splShift);
          if ('error' in curve) throw new ApiError(400, errorCodes.validation, curve.error, { fields: [{ field: u.fileName, message: curve.error }] });
          curves.push(curve);
        }
        await repo.replaceCurves(trx, setId, curves, plan.record);
        return { setId, curves: curves.length, normalisation: plan.record };
      });
    },

    /** Entries that may already be the driver a reviewer is about to create, strongest first. */
    async nearDuplicates(user: User, input: NearDuplicateQuery): Promise<NearDuplicatesResponse> {
      const { seesPending } = viewerOf(user);
      // Pending entries are private to their submitters and the moderators until approved.
      const visible = (await repo.nearDuplicateCandidates(user.id))
        .filter((c) => c.status === 'listed' || seesPending || c.submittedByUser)
        .map(({ submittedByUser: _mine, ...c }) => c);
      return { candidates: findNearDuplicates(input, visible) };
    },
  };
}
