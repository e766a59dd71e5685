// Compact per-driver summaries for search and role ranking: 1/3-octave band levels of the on-axis
// response, the off-axis drop per band and the worst THD per band at each drive level. Ranking a
// role over any band then costs a few dozen additions per driver instead of a pass over curves.
import { fractionalOctaveBands } from '../acoustics/curves';

/** IEC 61260-1 base-10 one-third-octave mid-bands from 20 Hz to 20 kHz (31 bands). */
// The 20 Hz band's exact mid-band is 19.95 Hz, so the search limits sit just outside the span.
export const ROLE_BANDS = fractionalOctaveBands(3, 19, 21000);

export interface RoleBands {
  /** Mean on-axis SPL per band, dB at 2.83 V / 1 m; null where the curve does not cover the band. */
  spl: (number | null)[];
  /** On-axis minus off-axis level per band at `offAngleDeg`, dB. */
  offDrop: (number | null)[];
  offAngleDeg: number | null;
  /** Worst THD per band, percent, per drive level (RMS volts), in increasing order of level. */
  thd: { levelV: number; percent: (number | null)[] }[];
}

interface CurveLike {
  x: readonly number[];
  y: readonly number[];
}

function bandValues(curve: CurveLike, reduce: 'mean' | 'max'): (number | null)[] {
  return ROLE_BANDS.map((b) => {
    let sum = 0;
    let n = 0;
    let max = -Infinity;
    for (let i = 0; i < curve.x.length; i++) {
      const f = curve.x[i];
      if (f < b.lower || f >= b.upper) continue;
      const v = curve.y[i];
      if (!Number.isFinite(v)) continue;
      sum += v;
      n++;
      if (v > max) max = v;
    }
    if (n === 0) return null;
    return Number((reduce === 'mean' ? sum / n : max).toFixed(3));
  });
}

/** Builds the band summary from a set's normalised curves. */
export function buildRoleBands(input: {
  onAxis: CurveLike | null;
  offAxis?: { angleDeg: number; curve: CurveLike } | null;
  thd?: { levelV: number; curve: CurveLike }[];
}): RoleBands {
  const spl = input.onAxis ? bandValues(input.onAxis, 'mean') : ROLE_BANDS.map(() => null);
  let offDrop: (number | null)[] = ROLE_BANDS.map(() => null);
  if (input.onAxis && input.offAxis) {
    const off = bandValues(input.offAxis.curve, 'mean');
    offDrop = spl.map((v, i) => (v === null || off[i] === null ? null : Number((v - (off[i] as number)).toFixed(3))));
  }
  const thd = [...(input.thd ?? [])]
    .sort((a, b) => a.levelV - b.levelV)
    .map((t) => ({ levelV: t.levelV, percent: bandValues(t.curve, 'max') }));
  return { spl, offDrop, offAngleDeg: input.offAxis?.angleDeg ?? null, thd };
}

/** Mean of the band levels whose mid-band lies in [lo, hi]; null when any of them is missing. */
export function bandMean(values: readonly (number | null)[], lo: number, hi: number): { mean: number; up: number; down: number } | null {
  let sum = 0;
  let n = 0;
  for (let i = 0; i < ROLE_BANDS.length; i++) {
    const fm = ROLE_BANDS[i].midband;
    if (fm < lo || fm > hi) continue;
    const v = values[i];
    if (v === null || v === undefined) return null;
    sum += v;
    n++;
  }
  if (n === 0) return null;
  const mean = sum / n;
  let up = 0;
  let down = 0;
  for (let i = 0; i < ROLE_BANDS.length; i++) {
    const fm = ROLE_BANDS[i].midband;
    if (fm < lo || fm > hi) continue;
    const d = (values[i] as number) - mean;
    if (d > up) up = d;
    if (d < down) down = d;
  }
  return { mean, up, down };
}

/**
 * Worst THD in the band at drive `v` volts, interpolated between measured levels on log-log axes
 * (distortion grows roughly as a power of drive). Beyond the highest level it is scaled in
 * proportion to drive, which flatters no driver: H3 grows faster than that.
 */
export function thdAtDrive(bands: RoleBands, lo: number, hi: number, v: number): { percent: number; extrapolated: boolean } | null {
  // Plain loops: this runs once per driver per role search.
  let prevLevel = NaN;
  let prevPercent = NaN;
  for (let t = 0; t < bands.thd.length; t++) {
    const level = bands.thd[t].levelV;
    const percent = bands.thd[t].percent;
    let m = -Infinity;
    for (let i = 0; i < ROLE_BANDS.length; i++) {
      const fm = ROLE_BANDS[i].midband;
      if (fm < lo || fm > hi) continue;
      const p = percent[i];
      if (p !== null && p !== undefined && p > m) m = p;
    }
    if (!(m > 0)) continue;
    if (v <= level) {
      if (Number.isNaN(prevLevel)) return { percent: m, extrapolated: false };
      const f = Math.log(v / prevLevel) / Math.log(level / prevLevel);
      return { percent: Math.exp(Math.log(prevPercent) + f * Math.log(m / prevPercent)), extrapolated: false };
    }
    prevLevel = level;
    prevPercent = m;
  }
  if (Number.isNaN(prevLevel)) return null;
  return { percent: prevPercent * (v / prevLevel), extrapolated: true };
}

/** Nominal mid-band of the first band reaching up past `from` where the off-axis drop reaches `dropDb`. */
export function beamingFromBands(bands: RoleBands, dropDb = 6, from = 100): number | null {
  for (let i = 0; i < ROLE_BANDS.length; i++) {
    // Compare band edges, not mid-bands: the 200 Hz band's exact mid-band is 199.5 Hz.
    if (ROLE_BANDS[i].upper <= from) continue;
    const d = bands.offDrop[i];
    if (d !== null && d !== undefined && d >= dropDb) return ROLE_BANDS[i].nominal;
  }
  return null;
}

export interface RoleRequest {
  bandLo: number;
  bandHi: number;
  /** Listening level, dB SPL at 1 m. */
  level: number;
}

export interface RoleScore {
  score: number;
  sensitivityDb: number | null;
  linearityDb: number | null;
  thdPercent: number | null;
  beamingHz: number | null;
  reasons: string[];
}

const fmtHz = (f: number) => (f >= 1000 ? `${Number((f / 1000).toFixed(2))} kHz` : `${Math.round(f)} Hz`);

/**
 * Conestack's role score (its own weighting, common practice, no source): one point per dB of
 * sensitivity above 85 dB, minus two per dB of worst deviation from the band mean, minus six per
 * doubling of THD above 0.3 %, minus four per octave the driver beams inside the band. Drivers whose
 * response does not cover the band score -Infinity and sort last.
 */
export function scoreRole(bands: RoleBands, req: RoleRequest): RoleScore {
  const lin = bandMean(bands.spl, req.bandLo, req.bandHi);
  if (!lin) {
    return { score: -Infinity, sensitivityDb: null, linearityDb: null, thdPercent: null, beamingHz: null, reasons: [`no measured response across ${fmtHz(req.bandLo)}–${fmtHz(req.bandHi)}`] };
  }
  const reasons: string[] = [];
  const linearityDb = Math.max(lin.up, -lin.down);
  let score = lin.mean - 85 - 2 * linearityDb;
  reasons.push(`${lin.mean.toFixed(1)} dB mean sensitivity in ${fmtHz(req.bandLo)}–${fmtHz(req.bandHi)}`);
  reasons.push(`within +${lin.up.toFixed(1)} / ${lin.down.toFixed(1)} dB of that mean (1/3-octave bands)`);

  const volts = 2.83 * 10 ** ((req.level - lin.mean) / 20);
  const thd = thdAtDrive(bands, req.bandLo, req.bandHi, volts);
  let thdPercent: number | null = null;
  if (thd) {
    thdPercent = thd.percent;
    score -= 6 * Math.max(0, Math.log2(thd.percent / 0.3));
    reasons.push(`THD up to ${thd.percent < 1 ? thd.percent.toFixed(2) : thd.percent.toFixed(1)} % at ${req.level} dB (${volts.toFixed(1)} V)${thd.extrapolated ? ', beyond the measured levels' : ''}`);
  } else {
    reasons.push('no distortion data in this band');
    score -= 6;
  }

  const beamingHz = beamingFromBands(bands, 6, Math.min(req.bandLo, 200));
  const angle = bands.offAngleDeg ?? 0;
  if (beamingHz === null) {
    reasons.push(bands.offAngleDeg === null ? 'no off-axis data' : `stays within 6 dB at ${angle}° across the band`);
  } else if (beamingHz < req.bandHi) {
    const octaves = Math.log2(req.bandHi / beamingHz);
    score -= 4 * octaves;
    reasons.push(`beams from ${fmtHz(beamingHz)} (${angle}° down 6 dB), inside the band`);
  } else {
    reasons.push(`stays wide to ${fmtHz(beamingHz)} (${angle}° within 6 dB)`);
  }
  return { score: Number(score.toFixed(2)), sensitivityDb: Number(lin.mean.toFixed(2)), linearityDb: Number(linearityDb.toFixed(2)), thdPercent, beamingHz, reasons };
}

const NB = ROLE_BANDS.length;

/**
 * Many drivers' band summaries packed into flat typed arrays, scored in one tight loop. Gives the
 * same numbers as scoreRole (a test holds them equal) at a small fraction of the cost, which is
 * what keeps role searches quick on large catalogues.
 */
export class RoleMatrix {
  private readonly spl: Float32Array;
  private readonly off: Float32Array;
  private readonly levels: Float32Array;
  private readonly thd: Float32Array;
  private readonly has: Uint8Array;
  private readonly maxLevels: number;

  constructor(all: readonly (RoleBands | null)[]) {
    const n = all.length;
    this.maxLevels = Math.max(1, ...all.map((b) => b?.thd.length ?? 0));
    this.spl = new Float32Array(n * NB).fill(NaN);
    this.off = new Float32Array(n * NB).fill(NaN);
    this.levels = new Float32Array(n * this.maxLevels).fill(NaN);
    this.thd = new Float32Array(n * this.maxLevels * NB).fill(NaN);
    this.has = new Uint8Array(n);
    all.forEach((b, d) => {
      if (!b) return;
      this.has[d] = 1;
      for (let i = 0; i < NB; i++) {
        if (b.spl[i] !== null && b.spl[i] !== undefined) this.spl[d * NB + i] = b.spl[i] as number;
        if (b.offDrop[i] !== null && b.offDrop[i] !== undefined) this.off[d * NB + i] = b.offDrop[i] as number;
      }
      b.thd.forEach((t, l) => {
        this.levels[d * this.maxLevels + l] = t.levelV;
        for (let i = 0; i < NB; i++) {
          const p = t.percent[i];
          if (p !== null && p !== undefined) this.thd[(d * this.maxLevels + l) * NB + i] = p;
        }
      });
    });
  }

  /** Scores of the given drivers for a role; -Infinity where the response does not cover the band. */
  scores(indices: readonly number[], req: RoleRequest): Float64Array {
    let i0 = -1;
    let i1 = -1;
    for (let i = 0; i < NB; i++) {
      const fm = ROLE_BANDS[i].midband;
      if (fm >= req.bandLo && fm <= req.bandHi) {
        if (i0 < 0) i0 = i;
        i1 = i;
      }
    }
    const from = Math.min(req.bandLo, 200);
    let b0 = 0;
    while (b0 < NB && ROLE_BANDS[b0].upper <= from) b0++;
    const out = new Float64Array(indices.length);
    const L = this.maxLevels;
    for (let k = 0; k < indices.length; k++) {
      const d = indices[k];
      if (!this.has[d] || i0 < 0) {
        out[k] = -Infinity;
        continue;
      }
      let sum = 0;
      let ok = true;
      for (let i = i0; i <= i1; i++) {
        const v = this.spl[d * NB + i];
        if (Number.isNaN(v)) {
          ok = false;
          break;
        }
        sum += v;
      }
      if (!ok) {
        out[k] = -Infinity;
        continue;
      }
      const mean = sum / (i1 - i0 + 1);
      let up = 0;
      let down = 0;
      for (let i = i0; i <= i1; i++) {
        const dv = this.spl[d * NB + i] - mean;
        if (dv > up) up = dv;
        if (dv < down) down = dv;
      }
      let score = mean - 85 - 2 * Math.max(up, -down);
      const volts = 2.83 * 10 ** ((req.level - mean) / 20);
      let prevLevel = NaN;
      let prevPercent = NaN;
      let thd = NaN;
      for (let l = 0; l < L; l++) {
        const level = this.levels[d * L + l];
        if (Number.isNaN(level)) break;
        let m = -Infinity;
        for (let i = i0; i <= i1; i++) {
          const p = this.thd[(d * L + l) * NB + i];
          if (p > m) m = p;
        }
        if (!(m > 0)) continue;
        if (volts <= level) {
          thd = Number.isNaN(prevLevel) ? m : Math.exp(Math.log(prevPercent) + (Math.log(volts / prevLevel) / Math.log(level / prevLevel)) * Math.log(m / prevPercent));
          break;
        }
        prevLevel = level;
        prevPercent = m;
      }
      if (Number.isNaN(thd) && !Number.isNaN(prevLevel)) thd = prevPercent * (volts / prevLevel);
      score -= Number.isNaN(thd) ? 6 : 6 * Math.max(0, Math.log2(thd / 0.3));
      for (let i = b0; i < NB; i++) {
        const od = this.off[d * NB + i];
        if (od >= 6) {
          const beam = ROLE_BANDS[i].nominal;
          if (beam < req.bandHi) score -= 4 * Math.log2(req.bandHi / beam);
          break;
        }
      }
      out[k] = Number(score.toFixed(2));
    }
    return out;
  }
}
