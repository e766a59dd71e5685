/**
 * Level conversions. Voltage and pressure are field quantities (20·log10), power 10·log10
 * (IEC 60027-3 / ISO 80000-3 level definitions). Distance correction assumes the far field of a
 * point source, p ∝ 1/r (inverse distance law).
 */
import { DRIVE_2V83 } from './constants';
import { AcousticsInputError } from './errors';

export function voltageRatioDb(v: number, vRef: number): number {
  if (!(v > 0) || !(vRef > 0)) throw new AcousticsInputError('voltage', 'voltages must be positive');
  return 20 * Math.log10(v / vRef);
}

export function powerRatioDb(p: number, pRef: number): number {
  if (!(p > 0) || !(pRef > 0)) throw new AcousticsInputError('power', 'powers must be positive');
  return 10 * Math.log10(p / pRef);
}

/** SPL measured at distance r referred to distance rRef (default 1 m) by the inverse distance law. */
export function splAtDistance(spl: number, distance: number, targetDistance = 1): number {
  if (!(distance > 0) || !(targetDistance > 0)) throw new AcousticsInputError('distance', 'distances must be positive');
  return spl + 20 * Math.log10(distance / targetDistance);
}

/** Drive given as a voltage, or as power into a stated (nominal) impedance: V = √(P·R). */
export type DriveLevel = { voltage: number } | { power: number; impedance: number };

export function driveVoltage(drive: DriveLevel): number {
  if ('voltage' in drive) {
    if (!(drive.voltage > 0)) throw new AcousticsInputError('voltage', 'voltage must be positive');
    return drive.voltage;
  }
  if (!(drive.power > 0)) throw new AcousticsInputError('power', 'power must be positive');
  if (!(drive.impedance > 0)) throw new AcousticsInputError('impedance', 'impedance must be positive');
  return Math.sqrt(drive.power * drive.impedance);
}

/** Refers an SPL measured at one drive level and distance to another (default 2.83 V at 1 m). */
export function normaliseSpl(
  spl: number,
  from: { drive: DriveLevel; distance: number },
  to: { drive: DriveLevel; distance: number } = { drive: { voltage: DRIVE_2V83 }, distance: 1 },
): number {
  const drive = voltageRatioDb(driveVoltage(to.drive), driveVoltage(from.drive));
  return splAtDistance(spl, from.distance, to.distance) + drive;
}

/** Distortion as a fraction of the fundamental: 1 % → −40 dB. */
export function percentToDb(percent: number): number {
  if (!(percent > 0)) throw new AcousticsInputError('percent', 'percent must be positive');
  return 20 * Math.log10(percent / 100);
}

export function dbToPercent(db: number): number {
  if (!Number.isFinite(db)) throw new AcousticsInputError('db', 'db must be finite');
  return 100 * Math.pow(10, db / 20);
}

/** Root-sum-square of harmonic amplitudes given in percent of the fundamental. */
export function totalHarmonicDistortion(harmonicsPercent: readonly number[]): number {
  return Math.sqrt(harmonicsPercent.reduce((s, h) => s + h * h, 0));
}
