// Measurement files of an invented three-inch mid-range, written the way different setups export
// them (tab table with star comments, semicolons with decimal commas, CSV with a header), made from
// the acoustics core's synthesis so the curves are plausible. Test data only.
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { logFrequencyGrid } from '../../shared/acoustics/curves';
import { synthesiseDriverCurves } from '../../shared/acoustics/synthesis';

export interface MeasurementFiles {
  dir: string;
  spl: string[];
  impedance: string;
  thd: string[];
  broken: string;
  blx: string;
}

export function writeMeasurementFiles(dir: string): MeasurementFiles {
  mkdirSync(dir, { recursive: true });
  const f = logFrequencyGrid(12, 20, 20000);
  const r = synthesiseDriverCurves(
    { fs: 95, qms: 4, qes: 0.6, re: 3.4, le: 0.00006, mms: 0.0032, sd: 0.0032, xmax: 0.0025 },
    { frequencies: f, anglesDeg: [0, 30, 60], driveVoltage: 2.83, distortionVoltages: [1, 2.83, 5.66], breakup: { frequency: 9000, q: 2 } },
  );
  const spl = r.spl.map((c) => {
    const name = `mid3-spl-${c.angleDeg}deg.txt`;
    const lines = ['* invented 3 in mid-range, 2.83 V at 1 m', '* Freq(Hz)\tSPL(dB)', ...f.map((x, i) => `${x.toFixed(3)}\t${c.spl[i].toFixed(3)}`)];
    writeFileSync(join(dir, name), lines.join('\r\n'));
    return name;
  });
  const impedance = 'mid3-impedance.csv';
  writeFileSync(join(dir, impedance), ['frequency;impedance;phase', ...f.map((x, i) => `${x.toFixed(2).replace('.', ',')};${r.impedance.magnitude[i].toFixed(4).replace('.', ',')};${r.impedance.phaseDeg[i].toFixed(2).replace('.', ',')}`)].join('\n'));
  // The top level comes as one table with the fundamental and the harmonics beside THD.
  const thd = r.distortion.map((d, k) => {
    if (k === r.distortion.length - 1) {
      const name = `mid3-thd-${d.driveVoltage}V-harmonics.txt`;
      const rows = f.map((x, i) => `${x.toFixed(2)}\t${r.spl[0].spl[i].toFixed(2)}\t${d.thdPercent[i].toPrecision(4)}\t${d.h2Percent[i].toPrecision(4)}\t${d.h3Percent[i].toPrecision(4)}`);
      writeFileSync(join(dir, name), ['Freq [Hz]\tFund [dB]\tTHD [%]\tH2 [%]\tH3 [%]', ...rows].join('\n'));
      return name;
    }
    const name = `mid3-thd-${d.driveVoltage}V.csv`;
    writeFileSync(join(dir, name), ['Frequency [Hz],THD [%]', ...f.map((x, i) => `${x.toExponential(4)},${d.thdPercent[i].toPrecision(4)}`)].join('\n'));
    return name;
  });
  const broken = 'mid3-broken.txt';
  writeFileSync(join(dir, broken), ['# hand-edited export', ...f.map((x, i) => (i === 40 ? `${x.toFixed(2)}\tabc` : `${x.toFixed(2)}\t${r.spl[0].spl[i].toFixed(2)}`))].join('\n'));
  const blx = 'mid3-bl(x).csv';
  const ls = r.largeSignal;
  writeFileSync(join(dir, blx), ['"x [mm]","Bl [T·m]"', ...ls.x.map((x, i) => `${(x * 1000).toFixed(3)},${ls.bl[i].toFixed(4)}`)].join('\n'));
  return { dir, spl, impedance, thd, broken, blx };
}
