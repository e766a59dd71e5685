// The figures a buyer reads off one measurement set, computed with the acoustics core. Pure, so
// the server computes them for the driver page and tests check them against the core directly.
import { closedBox, ventedBox } from '../acoustics/enclosures';
import { beamingOnset, firstBreakupPeak, imdSummary, linearity, meanSensitivity, suggestUsableBand, thdLimitFrequency } from '../acoustics/figures';
import { excursionLimits, EXCURSION_THRESHOLD_SOURCE } from '../acoustics/large-signal';
import type { Curve, DerivedFigures, DriverType, Parameter } from '../schemas/drivers';
import { referenceBandFor } from '../schemas/drivers';

export interface SetForFigures {
  id: number;
  parameters: readonly Pick<Parameter, 'name' | 'value'>[];
  curves: readonly Curve[];
}

/** THD limit used for the "clean above" figure (common practice, no source). */
export const THD_LIMIT_PERCENT = 1;
/** Off-axis angle and drop that mark the measured beaming onset (common practice, no source). */
export const BEAMING_ANGLE_DEG = 60;
export const BEAMING_DROP_DB = 6;

const SMALL_1972 = 'Small, "Closed-box loudspeaker systems", JAES 1972';
const SMALL_1973 = 'Small, "Vented-box loudspeaker systems", JAES 1973';

function param(set: SetForFigures, name: string): number | undefined {
  return set.parameters.find((p) => p.name === name)?.value;
}

function pick(set: SetForFigures, kind: Curve['kind'], angle?: number): Curve | undefined {
  return set.curves.find((c) => c.kind === kind && (angle === undefined || (c.angleDeg ?? 0) === angle));
}

function safe<T>(fn: () => T): T | null {
  try {
    return fn();
  } catch {
    return null;
  }
}

export function computeDerivedFigures(
  set: SetForFigures,
  driver: { type: DriverType; nominalSizeIn: number },
  band: { lo: number; hi: number } = referenceBandFor(driver.type),
): DerivedFigures {
  const on = pick(set, 'spl', 0);
  const offCandidates = set.curves.filter((c) => c.kind === 'spl' && (c.angleDeg ?? 0) > 0).sort((a, b) => Math.abs((a.angleDeg ?? 0) - BEAMING_ANGLE_DEG) - Math.abs((b.angleDeg ?? 0) - BEAMING_ANGLE_DEG));
  const off = offCandidates[0];
  const sd = param(set, 'sd');
  const diameter = sd ? 2 * Math.sqrt(sd / Math.PI) : driver.nominalSizeIn * 0.0254 * 0.8;

  const sensitivityDb = on ? safe(() => meanSensitivity(on.x, on.y, band.lo, band.hi)) : null;
  const lin = on ? safe(() => linearity(on.x, on.y, band.lo, band.hi)) : null;
  const beam = beamingOnset({
    diameter,
    onAxis: on ? { frequencies: on.x, spl: on.y } : undefined,
    offAxis: on && off ? { frequencies: off.x, spl: off.y } : undefined,
    dropDb: BEAMING_DROP_DB,
    fFrom: 100,
  });
  const breakup = on ? safe(() => firstBreakupPeak(on.x, on.y, band.hi, { minProminenceDb: 3, passBandLowHz: band.lo })) : null;

  const thdCurves = set.curves.filter((c) => c.kind === 'thd').sort((a, b) => (a.driveLevelV ?? 0) - (b.driveLevelV ?? 0));
  const thdRef = thdCurves.find((c) => (c.driveLevelV ?? 0) >= 2.8) ?? thdCurves[0];
  const thdFrom = thdRef ? safe(() => thdLimitFrequency(thdRef.x, thdRef.y, THD_LIMIT_PERCENT, band.hi)) : null;

  const imdCurve = set.curves.find((c) => c.kind === 'imd');
  const imd = imdCurve ? safe(() => imdSummary(imdCurve.x, imdCurve.y, band.lo, band.hi)) : null;

  const usable = on
    ? safe(() =>
        suggestUsableBand({
          frequencies: on.x,
          spl: on.y,
          referenceBand: [band.lo, band.hi],
          diameter,
          offAxis: off ? { frequencies: off.x, spl: off.y, angleDeg: off.angleDeg ?? BEAMING_ANGLE_DEG } : undefined,
          beamingDropDb: BEAMING_DROP_DB,
          thd: thdRef ? { frequencies: thdRef.x, percent: thdRef.y, limitPercent: THD_LIMIT_PERCENT } : undefined,
        }),
      )
    : null;

  const fs = param(set, 'fs');
  const qts = param(set, 'qts');
  const vas = param(set, 'vas');
  const cb = fs && qts && vas && qts < 0.707 ? safe(() => closedBox({ fs, qts, vas, qtc: 0.707 })) : null;
  let vb = null;
  if (fs && qts && vas) {
    vb = safe(() => ventedBox({ fs, qts, vas, alignment: 'QB3' })) ?? safe(() => ventedBox({ fs, qts, vas, alignment: 'B4' }));
  }

  const blx = pick(set, 'bl_x');
  const kmsx = pick(set, 'kms_x');
  const lex = pick(set, 'le_x');
  const exc = blx || kmsx || lex ? safe(() => excursionLimits({ x: (blx ?? kmsx ?? lex)!.x, bl: blx?.y, kms: kmsx?.y, le: lex?.y })) : null;
  const xmax = param(set, 'xmax');

  return {
    setId: set.id,
    band,
    sensitivityDb,
    linearity: lin ? { maxUpDb: lin.maxUp, maxDownDb: lin.maxDown, spanDb: lin.maxUp - lin.maxDown } : null,
    beaming: { halfWaveHz: beam.halfWaveHz, ka1Hz: beam.ka1Hz, measuredHz: beam.measuredHz, dropDb: beam.dropDb, angleDeg: off?.angleDeg ?? null },
    breakup: breakup ? { frequency: breakup.frequency, level: breakup.level } : null,
    thdLimit: thdRef ? { limitPercent: THD_LIMIT_PERCENT, driveLevelV: thdRef.driveLevelV ?? 2.83, fromHz: thdFrom } : null,
    imd: imd ? { driveLevelV: imdCurve?.driveLevelV ?? null, meanPercent: imd.meanPercent, maxPercent: imd.maxPercent } : null,
    usableBand: usable ? { lowHz: usable.lowHz, highHz: usable.highHz, reasons: usable.reasons } : null,
    closedBox: cb ? { qtc: cb.qtc, vbL: cb.vb * 1000, fc: cb.fc, f3: cb.f3, source: SMALL_1972 } : null,
    ventedBox: vb ? { alignment: vb.alignment, vbL: vb.vb * 1000, fb: vb.fb, f3: vb.f3, source: SMALL_1973 } : null,
    excursion: exc
      ? {
          xBlMm: exc.xBl ? exc.xBl.limit * 1000 : null,
          xCMm: exc.xC ? exc.xC.limit * 1000 : null,
          xLMm: exc.xL ? exc.xL.limit * 1000 : null,
          xmaxMm: exc.xmax * 1000,
          governedBy: exc.governedBy,
          offsetMm: exc.xBl ? exc.xBl.offset * 1000 : null,
          source: EXCURSION_THRESHOLD_SOURCE,
        }
      : null,
    vdCm3: sd && xmax ? sd * xmax * 1e6 : null,
  };
}
