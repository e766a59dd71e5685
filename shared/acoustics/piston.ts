/**
 * Rigid circular piston in an infinite baffle (Beranek & Mellow, "Acoustics: Sound Fields and
 * Transducers", 2012, ch. 13): far-field pressure
 *   p(r, θ) = jωρ·U/(2π·r) · 2·J1(ka·sinθ)/(ka·sinθ) · e^(−jkr).
 * Beaming onset, common practice, no source: wavelength equal to twice the diameter, f = c/(2·D);
 * and ka = 1, f = c/(π·D).
 */
import { jinc } from './bessel';
import { airProperties, P_REF, type AirProperties } from './constants';
import { AcousticsInputError } from './errors';

const DEG = Math.PI / 180;

/** Pressure directivity 2·J1(ka·sinθ)/(ka·sinθ), 1 on axis. */
export function pistonDirectivity(ka: number, angleDeg: number): number {
  return jinc(ka * Math.sin(angleDeg * DEG));
}

export function pistonDirectivityDb(frequency: number, diameter: number, angleDeg: number, air: AirProperties = airProperties()): number {
  const ka = (2 * Math.PI * frequency * (diameter / 2)) / air.c;
  return 20 * Math.log10(Math.max(Math.abs(pistonDirectivity(ka, angleDeg)), 1e-12));
}

export interface BeamingFrequencies {
  /** c/(2·D), Hz. */
  halfWaveHz: number;
  /** ka = 1: c/(π·D), Hz. */
  ka1Hz: number;
  /** Speed of sound used, m/s. */
  c: number;
}

export function beamingFrequencies(diameter: number, temperatureC?: number): BeamingFrequencies {
  if (!(diameter > 0)) throw new AcousticsInputError('diameter', 'diameter must be positive');
  const { c } = airProperties(temperatureC);
  return { halfWaveHz: c / (2 * diameter), ka1Hz: c / (Math.PI * diameter), c };
}

/** Far-field SPL (dB re 20 µPa) of a baffled piston with RMS volume velocity U (m³/s). */
export function baffledPistonSpl(
  volumeVelocityRms: number,
  frequency: number,
  diameter: number,
  distance: number,
  angleDeg: number,
  air: AirProperties = airProperties(),
): number {
  const w = 2 * Math.PI * frequency;
  const ka = (w * (diameter / 2)) / air.c;
  const p = ((w * air.rho * volumeVelocityRms) / (2 * Math.PI * distance)) * Math.abs(pistonDirectivity(ka, angleDeg));
  return 20 * Math.log10(Math.max(p, 1e-30) / P_REF);
}
