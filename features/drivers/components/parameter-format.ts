// Display units follow the trade's habits (mm, g, cm², L, mH); storage stays SI.
const display: Record<string, { label: string; unit: string; scale: number; digits: number }> = {
  fs: { label: 'Fs', unit: 'Hz', scale: 1, digits: 1 },
  qms: { label: 'Qms', unit: '', scale: 1, digits: 2 },
  qes: { label: 'Qes', unit: '', scale: 1, digits: 2 },
  qts: { label: 'Qts', unit: '', scale: 1, digits: 2 },
  re: { label: 'Re', unit: 'Ω', scale: 1, digits: 2 },
  le: { label: 'Le', unit: 'mH', scale: 1e3, digits: 3 },
  bl: { label: 'Bl', unit: 'T·m', scale: 1, digits: 2 },
  mms: { label: 'Mms', unit: 'g', scale: 1e3, digits: 2 },
  cms: { label: 'Cms', unit: 'mm/N', scale: 1e3, digits: 3 },
  sd: { label: 'Sd', unit: 'cm²', scale: 1e4, digits: 1 },
  vas: { label: 'Vas', unit: 'L', scale: 1e3, digits: 2 },
  xmax: { label: 'Xmax', unit: 'mm', scale: 1e3, digits: 2 },
  spl283v: { label: 'Sensitivity', unit: 'dB @ 2.83 V / 1 m', scale: 1, digits: 1 },
};

export const parameterOrder = Object.keys(display);

export function formatParameter(name: string, value: number): { label: string; text: string; unit: string } {
  const d = display[name];
  if (!d) return { label: name, text: String(Number(value.toPrecision(4))), unit: '' };
  return { label: d.label, text: (value * d.scale).toFixed(d.digits), unit: d.unit };
}
