import { z } from 'zod';
import { bandFields, refineBand } from './band';
import { columnLimits, columnText } from './column-limits';
import { derivedFiguresSchema, driverIdentitySchema, driverSlugSchema, measurementSetSchema, parameterSchema } from './drivers';

export const MAX_STACK = 4;

const slug = driverSlugSchema;

/** `drivers=a,b` and `sets=12,,15` (an empty place means the driver's first set). */
export const overlayQuerySchema = z
  .object({
    drivers: z
      .string()
      .transform((s) => s.split(',').map((x) => x.trim()).filter(Boolean))
      .pipe(z.array(slug).min(1, 'name at least one driver').max(MAX_STACK, `at most ${MAX_STACK} drivers`)),
    sets: z
      .string()
      .optional()
      .transform((s, ctx) => {
        if (!s) return [];
        return s.split(',').map((x) => {
          if (x.trim() === '') return null;
          const n = Number(x);
          if (!Number.isInteger(n) || n <= 0) {
            ctx.addIssue({ code: 'custom', message: `"${x}" is not a measurement set id` });
            return null;
          }
          return n;
        });
      }),
    ...bandFields(true),
  })
  .strict()
  .superRefine(refineBand);
export type OverlayQuery = z.infer<typeof overlayQuerySchema>;

export const overlaySetRefSchema = measurementSetSchema.pick({ id: true, label: true, reviewer: true, sampleId: true, burnIn: true });

/** Curves are sent on the response's shared grid: one y array per curve, no x arrays. */
export const overlayDriverSchema = driverIdentitySchema.extend({
  sets: z.array(overlaySetRefSchema),
  /** The set shown: its conditions without its data, which follows on the grid. */
  set: measurementSetSchema.omit({ anglesDeg: true, parameters: true, curves: true }),
  spl: z.array(z.object({ angleDeg: z.number(), y: z.array(z.number().nullable()) })),
  impedance: z.object({ magnitude: z.array(z.number().nullable()), phaseDeg: z.array(z.number().nullable()).nullable() }).nullable(),
  thd: z.array(z.object({ driveLevelV: z.number(), thd: z.array(z.number().nullable()), h2: z.array(z.number().nullable()).nullable(), h3: z.array(z.number().nullable()).nullable() })),
  parameters: z.array(parameterSchema),
  figures: derivedFiguresSchema,
});
export type OverlayDriver = z.infer<typeof overlayDriverSchema>;

export const overlayResponseSchema = z.object({
  grid: z.array(z.number()),
  band: z.object({ lo: z.number(), hi: z.number() }).nullable(),
  drivers: z.array(overlayDriverSchema),
});
export type OverlayResponse = z.infer<typeof overlayResponseSchema>;

/** Display choices a saved link keeps; the client owns their meaning. */
export const overlayOptionsSchema = z
  .object({
    level: z.enum(['raw', 'frequency', 'band']).default('raw'),
    alignHz: z.number().min(10).max(40000).optional(),
    smoothing: z.enum(['none', '1/12', '1/6', '1/3']).default('none'),
    ...bandFields(false),
    highlight: z.boolean().default(false),
    offAxis: z.boolean().default(false),
    thdLevelV: z.number().positive().optional(),
    thdUnit: z.enum(['percent', 'db']).default('percent'),
    harmonics: z.boolean().default(false),
  })
  .strict()
  .superRefine(refineBand);
export type OverlayOptions = z.infer<typeof overlayOptionsSchema>;

export const saveOverlaySchema = z
  .object({
    title: columnText(columnLimits.saved_overlays.title).min(1, 'give the comparison a title'),
    note: z.string().trim().max(2000).default(''),
    entries: z
      .array(z.object({ slug, setId: z.number().int().positive().nullable().default(null) }).strict())
      .min(1, 'add at least one driver')
      .max(MAX_STACK, `at most ${MAX_STACK} drivers`),
    options: overlayOptionsSchema.default({ level: 'raw', smoothing: 'none', highlight: false, offAxis: false, thdUnit: 'percent', harmonics: false }),
  })
  .strict();
export type SaveOverlayInput = z.input<typeof saveOverlaySchema>;

export const savedOverlaySchema = z.object({
  code: z.string(),
  title: z.string(),
  note: z.string(),
  /** Current slugs: renamed or merged drivers resolve to their surviving entry. */
  entries: z.array(z.object({ slug: z.string(), setId: z.number().int().nullable() })),
  options: overlayOptionsSchema,
  createdAt: z.string(),
});
export type SavedOverlay = z.infer<typeof savedOverlaySchema>;
