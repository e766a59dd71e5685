import { z } from 'zod';
import type { NearDuplicate } from '../catalogue/near-duplicates';
import { UPLOAD_LIMITS } from '../uploads/preview';
import { columnLimits, columnText } from './column-limits';
import { burnInSchema, curveKindSchema, driverSlugSchema, driverTypeSchema } from './drivers';

const sets = columnLimits.measurement_sets;

/** One entry per uploaded file, in the same order as the files, sent as the `meta` form field. */
export const uploadMetaSchema = z.array(
  z
    .object({
      kind: curveKindSchema.exclude(['impedance_fit']),
      angleDeg: z.number().min(-180).max(180).nullable().default(null),
      driveLevelV: z.number().positive().nullable().default(null),
      options: z
        .object({
          columns: z.object({ x: z.number().int().min(0), y: z.number().int().min(0), phase: z.number().int().min(0).optional() }).strict().optional(),
          xUnit: z.enum(['Hz', 'kHz', 'mm', 'm']).optional(),
          distortionUnit: z.enum(['percent', 'db']).optional(),
        })
        .strict()
        .optional(),
    })
    .strict(),
);
export type UploadMeta = z.infer<typeof uploadMetaSchema>;

export const methodSchema = z
  .object({
    driveVoltageV: z.number().positive().max(100),
    distanceM: z.number().positive().max(20),
    baffle: columnText(sets.baffle).min(1, 'describe the baffle or enclosure'),
    gating: columnText(sets.gating).nullable().default(null),
    temperatureC: z.number().min(-30).max(60).nullable().default(null),
    measuredOn: z.iso.date().nullable().default(null),
    sampleId: columnText(sets.sample_id).nullable().default(null),
    burnIn: burnInSchema.default('out-of-box'),
    label: columnText(sets.label).default('Submitted set'),
  })
  .strict();

export const submissionSchema = z
  .object({
    driver: z.union([
      z.object({ slug: driverSlugSchema }).strict(),
      z
        .object({
          makerName: columnText(columnLimits.makers.name).min(2),
          model: columnText(columnLimits.drivers.model).min(1),
          type: driverTypeSchema,
          nominalSizeIn: z.number().positive().max(30),
          nominalImpedanceOhm: z.number().positive().max(100),
        })
        .strict(),
    ]),
    method: methodSchema,
    uploads: z.array(z.string().regex(/^[a-f0-9]{32}$/, 'not an upload token')).min(1, 'upload at least one curve').max(UPLOAD_LIMITS.curvesPerSubmission),
    parameters: z
      .array(z.object({ name: z.string().max(columnLimits.parameters.name).regex(/^[a-z0-9_]+$/), value: z.number().finite(), signal: z.enum(['small', 'large']).default('small') }).strict())
      .max(60)
      .default([])
      .refine((ps) => new Set(ps.map((p) => p.name)).size === ps.length, 'each parameter may appear once'),
  })
  .strict();
export type SubmissionInput = z.input<typeof submissionSchema>;

/** `GET /api/submissions/near-duplicates`: the maker and model a reviewer is about to enter. */
export const nearDuplicateQuerySchema = z
  .object({
    makerName: columnText(columnLimits.makers.name).min(1, 'name the maker'),
    model: columnText(columnLimits.drivers.model).min(1, 'name the model'),
  })
  .strict();
export type NearDuplicateQuery = z.infer<typeof nearDuplicateQuerySchema>;

/** Strongest first; empty when nothing in the catalogue looks like the same driver. */
export interface NearDuplicatesResponse {
  candidates: NearDuplicate[];
}

/** One of the reviewer's own submissions, newest first, as `GET /api/submissions/mine` lists them. */
export interface MySubmission {
  id: number;
  status: 'pending' | 'approved' | 'rejected';
  label: string;
  createdAt: string;
  driverSlug: string;
  model: string;
  makerName: string;
  curveCount: number;
}
