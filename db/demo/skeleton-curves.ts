// Minimal physics for the demo curves: a second-order high-pass at Fs/Qts on an infinite baffle,
// the voice-coil inductance's first-order roll-off, and one breakup resonance.
import type { DemoDriver } from './catalogue';

const RHO = 1.204; // kg/m^3 at 20 °C (ISO 2533 standard-atmosphere relation, value from memory)
const C = 343.2; // m/s at 20 °C (ISO 9613-1 relation, value from memory)

export function logGrid(fMin = 20, fMax = 20000, perOctave = 24): number[] {
  const n = Math.floor(Math.log2(fMax / fMin) * perOctave);
  return Array.from({ length: n + 1 }, (_, i) => fMin * 2 ** (i / perOctave));
}

export function onAxisSpl(d: DemoDriver, freqs: number[]): number[] {
  const { fs, qms, qes, re, le, bl, mms, sd } = d.ts;
  const qts = (qms * qes) / (qms + qes);
  const eta0 = (RHO / (2 * Math.PI * C)) * ((bl * bl * sd * sd) / (re * mms * mms));
  const spl283 = 112.02 + 10 * Math.log10(eta0) + 10 * Math.log10(2.83 ** 2 / re);
  const fLe = re / (2 * Math.PI * le);
  return freqs.map((f) => {
    const r = f / fs;
    const hpMag = (r * r) / Math.sqrt((1 - r * r) ** 2 + (r / qts) ** 2);
    const leMag = 1 / Math.sqrt(1 + (f / fLe) ** 2);
    const rb = f / d.breakup.hz;
    const peak = (d.breakup.db * 1) / (1 + ((rb - 1 / rb) * 6) ** 2);
    return spl283 + 20 * Math.log10(hpMag * leMag) + peak;
  });
}
