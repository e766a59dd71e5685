import { z } from 'zod';

export const driverTypes = ['woofer', 'mid-woofer', 'mid-range', 'tweeter', 'full-range', 'subwoofer'] as const;
export const driverTypeSchema = z.enum(driverTypes);
export type DriverType = z.infer<typeof driverTypeSchema>;

export const curveKinds = ['spl', 'impedance', 'thd', 'h2', 'h3', 'imd', 'bl_x', 'kms_x', 'le_x'] as const;
export const curveKindSchema = z.enum(curveKinds);
export type CurveKind = z.infer<typeof curveKindSchema>;

export const makerSchema = z.object({ slug: z.string(), name: z.string() });

export const driverSummarySchema = z.object({
  slug: z.string(),
  model: z.string(),
  maker: makerSchema,
  type: driverTypeSchema,
  nominalSizeIn: z.number(),
  nominalImpedanceOhm: z.number(),
  fsHz: z.number().nullable(),
  qts: z.number().nullable(),
  sensitivityDb: z.number().nullable(),
});
export type DriverSummary = z.infer<typeof driverSummarySchema>;

export const driverListQuerySchema = z
  .object({
    q: z.string().trim().max(100).optional(),
    type: driverTypeSchema.optional(),
    limit: z.coerce.number().int().min(1).max(100).default(50),
    offset: z.coerce.number().int().min(0).default(0),
  })
  .strict();
export type DriverListQuery = z.infer<typeof driverListQuerySchema>;

export const driverListResponseSchema = z.object({
  items: z.array(driverSummarySchema),
  total: z.number().int(),
});
export type DriverListResponse = z.infer<typeof driverListResponseSchema>;

/** x is frequency in Hz for acoustic curves and excursion in m for large-signal curves. */
export const curveSchema = z.object({
  kind: curveKindSchema,
  angleDeg: z.number().nullable(),
  driveLevelV: z.number().nullable(),
  x: z.array(z.number()),
  y: z.array(z.number()),
  phase: z.array(z.number()).nullable(),
});
export type Curve = z.infer<typeof curveSchema>;

export const parameterSchema = z.object({
  name: z.string(),
  value: z.number(),
  unit: z.string(),
});
export type Parameter = z.infer<typeof parameterSchema>;

export const measurementSetSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  driveVoltageV: z.number(),
  distanceM: z.number(),
  baffle: z.string(),
  gating: z.string().nullable(),
  temperatureC: z.number().nullable(),
  measuredOn: z.string().nullable(),
  sampleId: z.string().nullable(),
  parameters: z.array(parameterSchema),
  curves: z.array(curveSchema),
});
export type MeasurementSet = z.infer<typeof measurementSetSchema>;

export const driverDetailSchema = driverSummarySchema.extend({
  measurementSets: z.array(measurementSetSchema),
});
export type DriverDetail = z.infer<typeof driverDetailSchema>;

export const healthSchema = z.object({ ok: z.literal(true), db: z.literal('up') });
export type Health = z.infer<typeof healthSchema>;
