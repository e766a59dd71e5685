/**
 * Figures a buyer asks for, read off measured curves.
 * Band means are taken evenly in log frequency, the usual reading of a level "in a band"
 * (IEC 60268-5 specifies the band and the drive; the log weighting is common practice, no source).
 */
import { interpolateLog, logFrequencyMean, validateCurve } from './curves';
import { AcousticsInputError } from './errors';
import { beamingFrequencies } from './piston';

export function meanSensitivity(frequencies: readonly number[], spl: readonly number[], fLo: number, fHi: number): number {
  return logFrequencyMean(frequencies, spl, fLo, fHi);
}

export interface Linearity {
  mean: number;
  /** Largest excursion above the mean, dB (≥ 0). */
  maxUp: number;
  /** Largest excursion below the mean, dB (≤ 0). */
  maxDown: number;
  maxUpHz: number;
  maxDownHz: number;
}

export function linearity(frequencies: readonly number[], spl: readonly number[], fLo: number, fHi: number): Linearity {
  const mean = meanSensitivity(frequencies, spl, fLo, fHi);
  let maxUp = 0;
  let maxDown = 0;
  let maxUpHz = NaN;
  let maxDownHz = NaN;
  const pts: [number, number][] = [];
  for (const f of [fLo, fHi]) {
    const v = interpolateLog(frequencies, spl, f);
    if (v !== null) pts.push([f, v]);
  }
  frequencies.forEach((f, i) => {
    if (f >= fLo && f <= fHi) pts.push([f, spl[i]]);
  });
  for (const [f, v] of pts) {
    const d = v - mean;
    if (d >= maxUp) {
      maxUp = d;
      maxUpHz = f;
    }
    if (d <= maxDown) {
      maxDown = d;
      maxDownHz = f;
    }
  }
  return { mean, maxUp, maxDown, maxUpHz, maxDownHz };
}

/** First frequency (log-interpolated) at which `below(f) ≥ threshold` starting from the low end; null if never. */
function firstCrossingUp(frequencies: readonly number[], d: readonly number[], threshold: number, fFrom: number): number | null {
  for (let i = 0; i < frequencies.length; i++) {
    if (frequencies[i] < fFrom) continue;
    if (d[i] >= threshold) {
      if (i === 0 || frequencies[i - 1] < fFrom) return frequencies[i];
      const t = (threshold - d[i - 1]) / (d[i] - d[i - 1]);
      return Math.exp(Math.log(frequencies[i - 1]) + t * Math.log(frequencies[i] / frequencies[i - 1]));
    }
  }
  return null;
}

export interface BeamingOnset {
  halfWaveHz: number;
  ka1Hz: number;
  /** Lowest frequency where the off-axis curve is `dropDb` below on-axis, or null. */
  measuredHz: number | null;
  dropDb: number;
}

/**
 * Beaming onset by the half-wavelength rule and ka = 1 for a piston of the given diameter, plus the
 * measured onset when an off-axis curve is given (resampled onto the on-axis frequencies).
 */
export function beamingOnset(input: {
  diameter: number;
  temperatureC?: number;
  onAxis?: { frequencies: readonly number[]; spl: readonly number[] };
  offAxis?: { frequencies: readonly number[]; spl: readonly number[] };
  dropDb?: number;
  /** Ignore frequencies below this, Hz (e.g. to skip low-frequency noise); default 0. */
  fFrom?: number;
}): BeamingOnset {
  const b = beamingFrequencies(input.diameter, input.temperatureC);
  const dropDb = input.dropDb ?? 6;
  let measuredHz: number | null = null;
  if (input.onAxis && input.offAxis) {
    validateCurve(input.onAxis.frequencies, input.onAxis.spl, 'onAxis');
    validateCurve(input.offAxis.frequencies, input.offAxis.spl, 'offAxis');
    const fs: number[] = [];
    const d: number[] = [];
    input.onAxis.frequencies.forEach((f, i) => {
      const off = interpolateLog(input.offAxis!.frequencies, input.offAxis!.spl, f);
      if (off !== null) {
        fs.push(f);
        d.push((input.onAxis as { spl: readonly number[] }).spl[i] - off);
      }
    });
    measuredHz = firstCrossingUp(fs, d, dropDb, input.fFrom ?? 0);
  }
  return { halfWaveHz: b.halfWaveHz, ka1Hz: b.ka1Hz, measuredHz, dropDb };
}

export interface Peak {
  frequency: number;
  /** Level at the peak, in the curve's units. */
  level: number;
  /** Height above the higher of the two surrounding minima, dB. */
  prominence: number;
  /** Height above the pass-band mean, dB (when a band mean was available). */
  aboveMean: number | null;
}

/** Topographic prominence of each local maximum (the classic definition used for peak picking). */
function prominences(values: readonly number[]): { index: number; prominence: number }[] {
  const out: { index: number; prominence: number }[] = [];
  const n = values.length;
  for (let i = 1; i < n - 1; i++) {
    if (!(values[i] > values[i - 1] && values[i] >= values[i + 1])) continue;
    let leftMin = values[i];
    for (let j = i - 1; j >= 0 && values[j] <= values[i]; j--) leftMin = Math.min(leftMin, values[j]);
    let rightMin = values[i];
    for (let j = i + 1; j < n && values[j] <= values[i]; j++) rightMin = Math.min(rightMin, values[j]);
    out.push({ index: i, prominence: values[i] - Math.max(leftMin, rightMin) });
  }
  return out;
}

/** First peak above the pass band with at least `minProminenceDb` of prominence. */
export function firstBreakupPeak(
  frequencies: readonly number[],
  spl: readonly number[],
  passBandHighHz: number,
  options: { minProminenceDb?: number; passBandLowHz?: number } = {},
): Peak | null {
  validateCurve(frequencies, spl, 'spl');
  const minP = options.minProminenceDb ?? 3;
  let mean: number | null = null;
  if (options.passBandLowHz !== undefined) mean = meanSensitivity(frequencies, spl, options.passBandLowHz, passBandHighHz);
  for (const { index, prominence } of prominences(spl)) {
    if (frequencies[index] <= passBandHighHz || prominence < minP) continue;
    return { frequency: frequencies[index], level: spl[index], prominence, aboveMean: mean === null ? null : spl[index] - mean };
  }
  return null;
}

/**
 * Lowest frequency above which THD stays under the limit (up to fMax), log-interpolated at the
 * last crossing; null when THD is over the limit at the top of the range.
 */
export function thdLimitFrequency(frequencies: readonly number[], thdPercent: readonly number[], limitPercent: number, fMax = Infinity): number | null {
  validateCurve(frequencies, thdPercent, 'thd');
  let last = -1;
  for (let i = 0; i < frequencies.length && frequencies[i] <= fMax; i++) last = i;
  if (last < 0 || thdPercent[last] >= limitPercent) return null;
  let i = last;
  while (i > 0 && thdPercent[i - 1] < limitPercent) i--;
  if (i === 0) return frequencies[0];
  const t = (limitPercent - thdPercent[i - 1]) / (thdPercent[i] - thdPercent[i - 1]);
  return Math.exp(Math.log(frequencies[i - 1]) + t * Math.log(frequencies[i] / frequencies[i - 1]));
}

export interface ImdSummary {
  maxPercent: number;
  maxAtHz: number;
  /** Log-frequency mean over the band, percent. */
  meanPercent: number;
  maxDb: number;
  meanDb: number;
}

/** Summary of an IMD-versus-frequency curve (percent of the probe tone) over [fLo, fHi]. */
export function imdSummary(frequencies: readonly number[], imdPercent: readonly number[], fLo?: number, fHi?: number): ImdSummary {
  validateCurve(frequencies, imdPercent, 'imd');
  const lo = fLo ?? frequencies[0];
  const hi = fHi ?? frequencies[frequencies.length - 1];
  let maxPercent = -Infinity;
  let maxAtHz = NaN;
  frequencies.forEach((f, i) => {
    if (f >= lo && f <= hi && imdPercent[i] > maxPercent) {
      maxPercent = imdPercent[i];
      maxAtHz = f;
    }
  });
  if (!Number.isFinite(maxPercent)) throw new AcousticsInputError('band', 'no IMD points in the band');
  const meanPercent = logFrequencyMean(frequencies, imdPercent, lo, hi);
  return { maxPercent, maxAtHz, meanPercent, maxDb: 20 * Math.log10(maxPercent / 100), meanDb: 20 * Math.log10(meanPercent / 100) };
}

export interface BandReason {
  edge: 'low' | 'high';
  frequency: number;
  figure: string;
  reason: string;
  governs: boolean;
}

export interface UsableBand {
  lowHz: number;
  highHz: number;
  reasons: BandReason[];
}

export interface UsableBandInput {
  frequencies: readonly number[];
  spl: readonly number[];
  /** Band the mean level is taken over; defaults to one decade around the geometric centre. */
  referenceBand?: [number, number];
  /** How far below the mean the response may fall at the band edges, dB; default 6. */
  responseDropDb?: number;
  diameter?: number;
  offAxis?: { frequencies: readonly number[]; spl: readonly number[]; angleDeg: number };
  beamingDropDb?: number;
  thd?: { frequencies: readonly number[]; percent: readonly number[]; limitPercent: number };
  /** Fraction of the breakup frequency kept as the top edge; default 0.5 (an octave below). */
  breakupMargin?: number;
  temperatureC?: number;
}

/**
 * Suggested usable band from the response edges, THD, beaming and breakup, each candidate edge
 * listed with its reason. The margins are common practice, no source; every one is a parameter.
 */
export function suggestUsableBand(input: UsableBandInput): UsableBand {
  const { frequencies, spl } = input;
  validateCurve(frequencies, spl, 'spl');
  const fFirst = frequencies[0];
  const fLast = frequencies[frequencies.length - 1];
  const centre = Math.sqrt(fFirst * fLast);
  const [bLo, bHi] = input.referenceBand ?? [Math.max(fFirst, centre / Math.sqrt(10)), Math.min(fLast, centre * Math.sqrt(10))];
  const mean = meanSensitivity(frequencies, spl, bLo, bHi);
  const drop = input.responseDropDb ?? 6;
  const reasons: BandReason[] = [];

  // Response edges: walk out from the reference band until the level falls `drop` below the mean.
  const level = mean - drop;
  let low = fFirst;
  for (let i = frequencies.length - 1; i > 0; i--) {
    if (frequencies[i] > bLo) continue;
    if (spl[i - 1] < level && spl[i] >= level) {
      const t = (level - spl[i - 1]) / (spl[i] - spl[i - 1]);
      low = Math.exp(Math.log(frequencies[i - 1]) + t * Math.log(frequencies[i] / frequencies[i - 1]));
      break;
    }
  }
  reasons.push({ edge: 'low', frequency: low, figure: 'response', reason: `response ${drop} dB below the ${mean.toFixed(1)} dB band mean`, governs: false });
  let high = fLast;
  for (let i = 0; i < frequencies.length - 1; i++) {
    if (frequencies[i] < bHi) continue;
    if (spl[i] >= level && spl[i + 1] < level) {
      const t = (level - spl[i]) / (spl[i + 1] - spl[i]);
      high = Math.exp(Math.log(frequencies[i]) + t * Math.log(frequencies[i + 1] / frequencies[i]));
      break;
    }
  }
  reasons.push({ edge: 'high', frequency: high, figure: 'response', reason: `response ${drop} dB below the ${mean.toFixed(1)} dB band mean`, governs: false });

  if (input.thd) {
    const f = thdLimitFrequency(input.thd.frequencies, input.thd.percent, input.thd.limitPercent);
    if (f !== null) reasons.push({ edge: 'low', frequency: f, figure: 'thd', reason: `THD stays under ${input.thd.limitPercent} % above this frequency`, governs: false });
  }
  if (input.diameter !== undefined) {
    const b = beamingOnset({
      diameter: input.diameter,
      temperatureC: input.temperatureC,
      onAxis: input.offAxis ? { frequencies, spl } : undefined,
      offAxis: input.offAxis,
      dropDb: input.beamingDropDb,
      fFrom: bLo,
    });
    if (b.measuredHz !== null && input.offAxis) {
      reasons.push({ edge: 'high', frequency: b.measuredHz, figure: 'beaming', reason: `${input.offAxis.angleDeg}° response ${b.dropDb} dB below on-axis`, governs: false });
    } else {
      reasons.push({ edge: 'high', frequency: b.ka1Hz, figure: 'beaming', reason: 'piston ka = 1', governs: false });
    }
  }
  const peak = firstBreakupPeak(frequencies, spl, bHi, { passBandLowHz: bLo });
  if (peak) {
    const margin = input.breakupMargin ?? 0.5;
    reasons.push({ edge: 'high', frequency: peak.frequency * margin, figure: 'breakup', reason: `first breakup peak at ${peak.frequency.toFixed(0)} Hz (×${margin})`, governs: false });
  }
  const lows = reasons.filter((r) => r.edge === 'low');
  const highs = reasons.filter((r) => r.edge === 'high');
  const lowGov = lows.reduce((a, r) => (r.frequency > a.frequency ? r : a));
  const highGov = highs.reduce((a, r) => (r.frequency < a.frequency ? r : a));
  lowGov.governs = true;
  highGov.governs = true;
  return { lowHz: lowGov.frequency, highHz: highGov.frequency, reasons };
}
