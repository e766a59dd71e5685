/**
 * Air and reference constants, all SI.
 *
 * Speed of sound: ISO 9613-1:1993, c = 343.2 · sqrt(T / T0) m/s with T0 = 293.15 K (dry air).
 * Air density: ideal gas with the ISO 2533:1975 standard-atmosphere gas constant,
 *   ρ = p / (R · T), R = 287.05287 J/(kg·K), p0 = 101 325 Pa (ρ = 1.2250 kg/m³ at 15 °C).
 * Reference sound pressure 20 µPa (IEC 60268-5 / ISO 1683).
 */

export const KELVIN_OFFSET = 273.15;
/** ISO 9613-1 reference temperature for the speed-of-sound formula, K. */
export const ISO9613_REFERENCE_TEMPERATURE_K = 293.15;
/** ISO 9613-1 speed of sound at the reference temperature, m/s. */
export const ISO9613_REFERENCE_SPEED_OF_SOUND = 343.2;
/** ISO 2533 specific gas constant of dry air, J/(kg·K). */
export const ISO2533_GAS_CONSTANT = 287.05287;
/** ISO 2533 standard sea-level pressure, Pa. */
export const STANDARD_PRESSURE_PA = 101325;
/** Default working temperature for all calculations, °C (room conditions of IEC 60268-5 measurements). */
export const DEFAULT_TEMPERATURE_C = 20;
/** Reference RMS sound pressure for dB SPL, Pa. */
export const P_REF = 20e-6;
/** The customary "2.83 V" drive, which is 1 W into 8 Ω (common practice, no source). */
export const DRIVE_2V83 = 2.83;

export function speedOfSound(temperatureC: number = DEFAULT_TEMPERATURE_C): number {
  const t = temperatureC + KELVIN_OFFSET;
  if (!(t > 0)) throw new RangeError('temperature must be above absolute zero');
  return ISO9613_REFERENCE_SPEED_OF_SOUND * Math.sqrt(t / ISO9613_REFERENCE_TEMPERATURE_K);
}

export function airDensity(temperatureC: number = DEFAULT_TEMPERATURE_C, pressurePa: number = STANDARD_PRESSURE_PA): number {
  const t = temperatureC + KELVIN_OFFSET;
  if (!(t > 0)) throw new RangeError('temperature must be above absolute zero');
  return pressurePa / (ISO2533_GAS_CONSTANT * t);
}

export interface AirProperties {
  /** Speed of sound, m/s. */
  c: number;
  /** Density, kg/m³. */
  rho: number;
  temperatureC: number;
  pressurePa: number;
}

export function airProperties(temperatureC: number = DEFAULT_TEMPERATURE_C, pressurePa: number = STANDARD_PRESSURE_PA): AirProperties {
  return { c: speedOfSound(temperatureC), rho: airDensity(temperatureC, pressurePa), temperatureC, pressurePa };
}

/** Air at the default 20 °C and 101 325 Pa. */
export const DEFAULT_AIR: AirProperties = airProperties();
