import { z } from 'zod';

/**
 * Inputs of the calculator routes POST /api/calc/<name>. All quantities SI (Hz, m, m², m³, kg,
 * m/N, N/m, N·s/m, T·m, Ω, H, Pa, dB); temperatures in °C; angles and phases in degrees.
 */

const positive = (what: string) =>
  z.number({ error: `${what} must be a number` }).positive({ error: `${what} must be positive` });
const optionalPositive = (what: string) => positive(what).optional();
const temperatureC = z
  .number({ error: 'temperatureC must be a number' })
  .min(-40, { error: 'temperatureC must be at least −40 °C' })
  .max(60, { error: 'temperatureC must be at most 60 °C' })
  .optional();
const finiteArray = (what: string, min = 1) =>
  z.array(z.number({ error: `${what} must contain only numbers` }), { error: `${what} must be an array of numbers` }).min(min, {
    error: `${what} needs at least ${min} values`,
  });
const positiveArray = (what: string, min = 1) =>
  z
    .array(positive(`every ${what} value`), { error: `${what} must be an array of numbers` })
    .min(min, { error: `${what} needs at least ${min} values` });
const frequencyArray = (min = 1) => positiveArray('frequencies', min).max(20000, { error: 'frequencies has more than 20000 values' });

type Ctx = z.RefinementCtx;
function requireIncreasing(values: readonly number[] | undefined, field: string, ctx: Ctx): void {
  if (!values) return;
  for (let i = 1; i < values.length; i++) {
    if (!(values[i] > values[i - 1])) {
      ctx.addIssue({ code: 'custom', path: [field], message: `${field} must be strictly increasing (index ${i})` });
      return;
    }
  }
}
function requireSameLength(ref: readonly unknown[], refName: string, other: readonly unknown[] | undefined, field: string, ctx: Ctx): void {
  if (other && other.length !== ref.length) {
    ctx.addIssue({ code: 'custom', path: [field], message: `${field} must have the same length as ${refName} (${ref.length}), got ${other.length}` });
  }
}

export const thieleSmallInput = z
  .object({
    fs: optionalPositive('fs'),
    qms: optionalPositive('qms'),
    qes: optionalPositive('qes'),
    qts: optionalPositive('qts'),
    re: optionalPositive('re'),
    le: optionalPositive('le'),
    mms: optionalPositive('mms'),
    mmd: optionalPositive('mmd'),
    cms: optionalPositive('cms'),
    kms: optionalPositive('kms'),
    rms: optionalPositive('rms'),
    bl: optionalPositive('bl'),
    sd: optionalPositive('sd'),
    diameter: optionalPositive('diameter'),
    vas: optionalPositive('vas'),
    xmax: optionalPositive('xmax'),
    temperatureC,
    tolerance: z.number().positive().max(1).optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    const { temperatureC: _t, tolerance: _tol, ...params } = v;
    if (Object.values(params).every((x) => x === undefined)) {
      ctx.addIssue({ code: 'custom', path: [], message: 'give at least one Thiele/Small parameter' });
    }
  });
export type ThieleSmallCalcInput = z.infer<typeof thieleSmallInput>;

const boxCurveFields = {
  /** Frequencies for the predicted response and the excursion-limited SPL. */
  frequencies: frequencyArray().optional(),
  sd: optionalPositive('sd'),
  xmax: optionalPositive('xmax'),
  temperatureC,
};

export const closedBoxInput = z
  .object({
    fs: positive('fs'),
    qts: positive('qts'),
    vas: positive('vas'),
    vb: optionalPositive('vb'),
    qtc: optionalPositive('qtc'),
    ...boxCurveFields,
  })
  .strict()
  .superRefine((v, ctx) => {
    if ((v.vb === undefined) === (v.qtc === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['vb'], message: 'give exactly one of vb or qtc' });
    }
    if (v.qtc !== undefined && !(v.qtc > v.qts)) {
      ctx.addIssue({ code: 'custom', path: ['qtc'], message: `qtc must exceed qts (${v.qts})` });
    }
    requireIncreasing(v.frequencies, 'frequencies', ctx);
  });
export type ClosedBoxCalcInput = z.infer<typeof closedBoxInput>;

export const ventedAlignments = ['QB3', 'B4'] as const;
export const ventedBoxInput = z
  .object({
    fs: positive('fs'),
    qts: positive('qts'),
    vas: positive('vas'),
    alignment: z.enum(ventedAlignments, { error: 'alignment must be "QB3" or "B4"' }),
    ql: optionalPositive('ql'),
    ...boxCurveFields,
  })
  .strict()
  .superRefine((v, ctx) => requireIncreasing(v.frequencies, 'frequencies', ctx));
export type VentedBoxCalcInput = z.infer<typeof ventedBoxInput>;

export const pistonInput = z
  .object({
    diameter: positive('diameter'),
    temperatureC,
    /** Optional: directivity in dB at these frequencies and angles. */
    frequencies: frequencyArray().optional(),
    anglesDeg: z.array(z.number().min(0).max(180)).min(1).max(37).optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if ((v.frequencies === undefined) !== (v.anglesDeg === undefined)) {
      ctx.addIssue({ code: 'custom', path: [v.frequencies ? 'anglesDeg' : 'frequencies'], message: 'give frequencies and anglesDeg together' });
    }
  });
export type PistonCalcInput = z.infer<typeof pistonInput>;

export const excursionInput = z
  .object({
    x: finiteArray('x', 3).max(5000),
    bl: positiveArray('bl').optional(),
    cms: positiveArray('cms').optional(),
    kms: positiveArray('kms').optional(),
    le: positiveArray('le').optional(),
    thresholds: z
      .object({
        blMin: z.number().gt(0).lt(1).optional(),
        cmsMin: z.number().gt(0).lt(1).optional(),
        leVariation: z.number().gt(0).lt(1).optional(),
      })
      .strict()
      .optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    requireIncreasing(v.x, 'x', ctx);
    if (v.x[0] >= 0 || v.x[v.x.length - 1] <= 0) ctx.addIssue({ code: 'custom', path: ['x'], message: 'x must span both sides of 0' });
    for (const k of ['bl', 'cms', 'kms', 'le'] as const) requireSameLength(v.x, 'x', v[k], k, ctx);
    if (v.cms && v.kms) ctx.addIssue({ code: 'custom', path: ['kms'], message: 'give cms or kms, not both' });
    if (!v.bl && !v.cms && !v.kms && !v.le) ctx.addIssue({ code: 'custom', path: ['bl'], message: 'give at least one of bl, cms, kms, le' });
  });
export type ExcursionCalcInput = z.infer<typeof excursionInput>;

export const impedanceModelParams = {
  re: positive('re'),
  fs: positive('fs'),
  qms: positive('qms'),
  qes: positive('qes'),
  le: z.number().nonnegative({ error: 'le must be zero or positive' }).optional(),
  l2: optionalPositive('l2'),
  r2: optionalPositive('r2'),
};

export const impedanceModelInput = z
  .object({ ...impedanceModelParams, frequencies: frequencyArray() })
  .strict()
  .superRefine((v, ctx) => {
    if ((v.l2 === undefined) !== (v.r2 === undefined)) ctx.addIssue({ code: 'custom', path: [v.l2 === undefined ? 'l2' : 'r2'], message: 'give l2 and r2 together' });
  });
export type ImpedanceModelCalcInput = z.infer<typeof impedanceModelInput>;

export const impedanceFitInput = z
  .object({
    frequencies: frequencyArray(5),
    magnitude: positiveArray('magnitude', 5),
    phaseDeg: z.array(z.number().min(-90).max(90)).optional(),
    model: z.enum(['le', 'le-l2']).optional(),
    re: optionalPositive('re'),
    fixRe: z.boolean().optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    requireIncreasing(v.frequencies, 'frequencies', ctx);
    requireSameLength(v.frequencies, 'frequencies', v.magnitude, 'magnitude', ctx);
    requireSameLength(v.frequencies, 'frequencies', v.phaseDeg, 'phaseDeg', ctx);
    if (v.fixRe && v.re === undefined) ctx.addIssue({ code: 'custom', path: ['re'], message: 'fixRe needs re' });
  });
export type ImpedanceFitCalcInput = z.infer<typeof impedanceFitInput>;

const numberOrArray = (what: string) => z.union([z.number(), finiteArray(what)], { error: `${what} must be a number or an array of numbers` });
const positiveOrArray = (what: string) => z.union([positive(what), positiveArray(what)], { error: `${what} must be a positive number or an array of them` });
const driveFields = {
  voltage: optionalPositive('voltage'),
  power: optionalPositive('power'),
  impedance: optionalPositive('impedance'),
};
function checkDrive(v: { voltage?: number; power?: number; impedance?: number }, ctx: Ctx, prefix = ''): void {
  const hasV = v.voltage !== undefined;
  const hasP = v.power !== undefined || v.impedance !== undefined;
  if (hasV === hasP) ctx.addIssue({ code: 'custom', path: [`${prefix}voltage`], message: 'give the drive as voltage, or as power with impedance' });
  if (hasP && (v.power === undefined || v.impedance === undefined)) {
    ctx.addIssue({ code: 'custom', path: [v.power === undefined ? `${prefix}power` : `${prefix}impedance`], message: 'power needs impedance' });
  }
}

export const levelsInput = z.discriminatedUnion('conversion', [
  z.object({ conversion: z.literal('voltage-ratio'), voltage: positiveOrArray('voltage'), referenceVoltage: positive('referenceVoltage') }).strict(),
  z.object({ conversion: z.literal('distance'), spl: numberOrArray('spl'), distance: positive('distance'), targetDistance: optionalPositive('targetDistance') }).strict(),
  z
    .object({
      conversion: z.literal('normalise-spl'),
      spl: numberOrArray('spl'),
      distance: positive('distance'),
      ...driveFields,
      targetVoltage: optionalPositive('targetVoltage'),
      targetDistance: optionalPositive('targetDistance'),
    })
    .strict()
    .superRefine((v, ctx) => checkDrive(v, ctx)),
  z.object({ conversion: z.literal('thd-to-db'), percent: positiveOrArray('percent') }).strict(),
  z.object({ conversion: z.literal('db-to-thd'), db: numberOrArray('db') }).strict(),
]);
export type LevelsCalcInput = z.infer<typeof levelsInput>;

export const smoothInput = z
  .object({
    frequencies: frequencyArray(2),
    values: finiteArray('values', 2),
    /** N of 1/N octave. */
    fraction: z.number().positive().max(96, { error: 'fraction must be at most 96 (1/96 octave)' }),
    mode: z.enum(['db', 'power']).optional(),
    /** Also resample onto the common log grid (true for the default 1/48 octave, 10 Hz–40 kHz). */
    resample: z
      .union([
        z.boolean(),
        z
          .object({ pointsPerOctave: z.number().positive().max(96).optional(), fMin: optionalPositive('fMin'), fMax: optionalPositive('fMax') })
          .strict(),
      ])
      .optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    requireIncreasing(v.frequencies, 'frequencies', ctx);
    requireSameLength(v.frequencies, 'frequencies', v.values, 'values', ctx);
  });
export type SmoothCalcInput = z.infer<typeof smoothInput>;

export const calcNames = ['thiele-small', 'impedance-model', 'impedance-fit', 'closed-box', 'vented-box', 'excursion', 'piston', 'levels', 'smooth'] as const;
export type CalcName = (typeof calcNames)[number];

export const calcInputs = {
  'thiele-small': thieleSmallInput,
  'impedance-model': impedanceModelInput,
  'impedance-fit': impedanceFitInput,
  'closed-box': closedBoxInput,
  'vented-box': ventedBoxInput,
  excursion: excursionInput,
  piston: pistonInput,
  levels: levelsInput,
  smooth: smoothInput,
} satisfies Record<CalcName, z.ZodType>;

export type CalcInputs = { [K in CalcName]: z.infer<(typeof calcInputs)[K]> };

export function isCalcName(value: string): value is CalcName {
  return (calcNames as readonly string[]).includes(value);
}
