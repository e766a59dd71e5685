import { z } from 'zod';
import { bandFields, refineBand } from './band';
import { columnLimits } from './column-limits';

export const driverTypes = ['woofer', 'mid-woofer', 'mid-range', 'tweeter', 'full-range', 'subwoofer'] as const;
export const driverTypeSchema = z.enum(driverTypes);
export type DriverType = z.infer<typeof driverTypeSchema>;

/**
 * Curve kinds. x is frequency (Hz) for acoustic and electrical curves and excursion (m) for the
 * large-signal ones. SPL is dB re 20 µPa at 2.83 V / 1 m after normalisation; impedance in ohms with
 * phase in degrees; distortion in percent of the fundamental.
 */
export const curveKinds = ['spl', 'impedance', 'impedance_fit', 'thd', 'h2', 'h3', 'imd', 'bl_x', 'kms_x', 'le_x'] as const;
export const curveKindSchema = z.enum(curveKinds);
export type CurveKind = z.infer<typeof curveKindSchema>;

export const burnInStates = ['out-of-box', 'burned-in'] as const;
export const burnInSchema = z.enum(burnInStates);
export type BurnInState = z.infer<typeof burnInSchema>;

export const availabilityStates = ['in-production', 'limited', 'discontinued'] as const;
export const availabilitySchema = z.enum(availabilityStates);

/** A driver's address: lower-case letters, digits and dashes, as long as the column allows. */
export const driverSlugSchema = z
  .string()
  .min(1, 'must be a driver slug')
  .max(columnLimits.drivers.slug, `must be at most ${columnLimits.drivers.slug} characters`)
  .regex(/^[a-z0-9-]+$/, 'must be lower-case letters, digits and dashes');

export const makerSchema = z.object({ slug: z.string(), name: z.string() });

/** A driver's standing in a role search, with the figures behind it. */
export const roleFitSchema = z.object({
  score: z.number(),
  rank: z.number().int(),
  sensitivityDb: z.number().nullable(),
  linearityDb: z.number().nullable(),
  thdPercent: z.number().nullable(),
  beamingHz: z.number().nullable(),
  reasons: z.array(z.string()),
});
export type RoleFit = z.infer<typeof roleFitSchema>;

export const driverSummarySchema = z.object({
  slug: z.string(),
  model: z.string(),
  maker: makerSchema,
  type: driverTypeSchema,
  nominalSizeIn: z.number(),
  nominalImpedanceOhm: z.number(),
  fsHz: z.number().nullable(),
  qts: z.number().nullable(),
  vasL: z.number().nullable(),
  xmaxMm: z.number().nullable(),
  /** Mean on-axis level at 2.83 V / 1 m over the type's reference band (see referenceBandFor). */
  sensitivityDb: z.number().nullable(),
  price: z.number().nullable(),
  currency: z.string().nullable(),
  aliases: z.array(z.string()),
  role: roleFitSchema.optional(),
});
export type DriverSummary = z.infer<typeof driverSummarySchema>;

export const sortKeys = ['relevance', 'role', 'model', 'maker', 'size', 'fs', 'qts', 'vas', 'sensitivity', 'xmax', 'price'] as const;
export type SortKey = (typeof sortKeys)[number];

const num = () => z.coerce.number().finite();
const positive = () => z.coerce.number().finite().positive();

export const driverListQuerySchema = z
  .object({
    q: z.string().trim().max(100).optional(),
    type: z
      .union([driverTypeSchema, z.string().transform((s, ctx) => {
        const parts = s.split(',').filter(Boolean);
        for (const p of parts) {
          if (!(driverTypes as readonly string[]).includes(p)) {
            ctx.addIssue({ code: 'custom', message: `unknown driver type "${p}"` });
            return z.NEVER;
          }
        }
        return parts;
      })])
      .transform((v) => (Array.isArray(v) ? (v as DriverType[]) : [v]))
      .optional(),
    sizeMin: positive().optional(),
    sizeMax: positive().optional(),
    impedance: z.coerce.number().finite().positive().optional(),
    fsMin: num().optional(),
    fsMax: num().optional(),
    qtsMin: num().optional(),
    qtsMax: num().optional(),
    vasMinL: num().optional(),
    vasMaxL: num().optional(),
    sensMin: num().optional(),
    sensMax: num().optional(),
    xmaxMinMm: num().optional(),
    xmaxMaxMm: num().optional(),
    priceMin: num().optional(),
    priceMax: num().optional(),
    /** Intended band for a role, Hz. Both ends are needed for role ranking. */
    ...bandFields(true),
    /** Intended listening level, dB SPL at 1 m. */
    level: z.coerce.number().finite().min(60).max(130).optional(),
    sort: z.enum(sortKeys).optional(),
    order: z.enum(['asc', 'desc']).optional(),
    limit: z.coerce.number().int().min(1).max(100).default(24),
    offset: z.coerce.number().int().min(0).default(0),
  })
  .strict()
  .superRefine((v, ctx) => {
    refineBand(v, ctx);
    const pairs: [string, string][] = [['sizeMin', 'sizeMax'], ['fsMin', 'fsMax'], ['qtsMin', 'qtsMax'], ['vasMinL', 'vasMaxL'], ['sensMin', 'sensMax'], ['xmaxMinMm', 'xmaxMaxMm'], ['priceMin', 'priceMax']];
    const rec = v as Record<string, unknown>;
    for (const [lo, hi] of pairs) {
      if (typeof rec[lo] === 'number' && typeof rec[hi] === 'number' && (rec[lo] as number) > (rec[hi] as number)) {
        ctx.addIssue({ code: 'custom', path: [hi], message: `${hi} must not be below ${lo}` });
      }
    }
  });
export type DriverListQueryInput = z.input<typeof driverListQuerySchema>;
export type DriverListQuery = z.infer<typeof driverListQuerySchema>;

export const facetCountSchema = z.object({ value: z.string(), count: z.number().int() });
export const rangeFacetSchema = z.object({ min: z.number().nullable(), max: z.number().nullable() });

export const driverFacetsSchema = z.object({
  type: z.array(facetCountSchema),
  size: z.array(facetCountSchema),
  impedance: z.array(facetCountSchema),
  fsHz: rangeFacetSchema,
  qts: rangeFacetSchema,
  vasL: rangeFacetSchema,
  sensitivityDb: rangeFacetSchema,
  xmaxMm: rangeFacetSchema,
  price: rangeFacetSchema,
});
export type DriverFacets = z.infer<typeof driverFacetsSchema>;

export const driverListResponseSchema = z.object({
  items: z.array(driverSummarySchema),
  total: z.number().int(),
  facets: driverFacetsSchema,
  role: z.object({ bandLo: z.number(), bandHi: z.number(), level: z.number() }).nullable(),
});
export type DriverListResponse = z.infer<typeof driverListResponseSchema>;

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
  signal: z.enum(['small', 'large']),
});
export type Parameter = z.infer<typeof parameterSchema>;

export const measurementSetSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  reviewer: z.string(),
  sampleId: z.string().nullable(),
  burnIn: burnInSchema,
  driveVoltageV: z.number(),
  distanceM: z.number(),
  baffle: z.string(),
  gating: z.string().nullable(),
  temperatureC: z.number().nullable(),
  measuredOn: z.string().nullable(),
  anglesDeg: z.array(z.number()),
  parameters: z.array(parameterSchema),
  curves: z.array(curveSchema),
});
export type MeasurementSet = z.infer<typeof measurementSetSchema>;

export const mountingSchema = z.object({
  cutoutDiameterMm: z.number().nullable(),
  outerDiameterMm: z.number().nullable(),
  mountingDepthMm: z.number().nullable(),
  boltCircleMm: z.number().nullable(),
  holeCount: z.number().int().nullable(),
});
export type Mounting = z.infer<typeof mountingSchema>;

export const makerSpecSchema = z.object({ name: z.string(), value: z.number(), unit: z.string() });
export type MakerSpec = z.infer<typeof makerSpecSchema>;

export const bandReasonSchema = z.object({
  edge: z.enum(['low', 'high']),
  frequency: z.number(),
  figure: z.string(),
  reason: z.string(),
  governs: z.boolean(),
});

/** Figures derived by the server from one measurement set, for one band. */
export const derivedFiguresSchema = z.object({
  setId: z.number().int(),
  band: z.object({ lo: z.number(), hi: z.number() }),
  sensitivityDb: z.number().nullable(),
  linearity: z.object({ maxUpDb: z.number(), maxDownDb: z.number(), spanDb: z.number() }).nullable(),
  beaming: z.object({ halfWaveHz: z.number(), ka1Hz: z.number(), measuredHz: z.number().nullable(), dropDb: z.number(), angleDeg: z.number().nullable() }),
  breakup: z.object({ frequency: z.number(), level: z.number() }).nullable(),
  thdLimit: z.object({ limitPercent: z.number(), driveLevelV: z.number(), fromHz: z.number().nullable() }).nullable(),
  imd: z.object({ driveLevelV: z.number().nullable(), meanPercent: z.number(), maxPercent: z.number() }).nullable(),
  usableBand: z.object({ lowHz: z.number(), highHz: z.number(), reasons: z.array(bandReasonSchema) }).nullable(),
  closedBox: z.object({ qtc: z.number(), vbL: z.number(), fc: z.number(), f3: z.number(), source: z.string() }).nullable(),
  ventedBox: z.object({ alignment: z.string(), vbL: z.number(), fb: z.number(), f3: z.number(), source: z.string() }).nullable(),
  excursion: z
    .object({ xBlMm: z.number().nullable(), xCMm: z.number().nullable(), xLMm: z.number().nullable(), xmaxMm: z.number(), governedBy: z.string(), offsetMm: z.number().nullable(), source: z.string() })
    .nullable(),
  vdCm3: z.number().nullable(),
});
export type DerivedFigures = z.infer<typeof derivedFiguresSchema>;

export const parameterSpreadSchema = z.object({ name: z.string(), min: z.number(), max: z.number(), spreadPercent: z.number(), sets: z.number().int() });

export const driverDetailSchema = driverSummarySchema.extend({
  /** Set when the requested slug was an old name; the client replaces its URL with the canonical one. */
  requestedSlug: z.string(),
  diaphragm: z.string().nullable(),
  surround: z.string().nullable(),
  voiceCoilDiameterMm: z.number().nullable(),
  magnet: z.string().nullable(),
  availability: availabilitySchema.nullable(),
  mounting: mountingSchema.nullable(),
  makerSpecs: z.array(makerSpecSchema),
  measurementSets: z.array(measurementSetSchema),
  figures: z.array(derivedFiguresSchema),
  spread: z.array(parameterSpreadSchema),
});
export type DriverDetail = z.infer<typeof driverDetailSchema>;

/** The fields that name a driver, first in both the driver page and each overlay driver. */
export const driverIdentitySchema = driverDetailSchema.pick({
  slug: true,
  requestedSlug: true,
  model: true,
  maker: true,
  type: true,
  nominalSizeIn: true,
  nominalImpedanceOhm: true,
});
export type DriverIdentity = z.infer<typeof driverIdentitySchema>;

export const driverDetailQuerySchema = z.object(bandFields(true)).strict().superRefine(refineBand);

export const healthSchema = z.object({ ok: z.literal(true), db: z.literal('up') });
export type Health = z.infer<typeof healthSchema>;

/** The band a type is judged over when no role is given (common practice, no source). */
export function referenceBandFor(type: DriverType): { lo: number; hi: number } {
  switch (type) {
    case 'tweeter':
      return { lo: 2000, hi: 10000 };
    case 'subwoofer':
      return { lo: 30, hi: 150 };
    case 'woofer':
      return { lo: 100, hi: 1000 };
    case 'mid-woofer':
      return { lo: 200, hi: 2000 };
    default:
      return { lo: 300, hi: 3000 };
  }
}
