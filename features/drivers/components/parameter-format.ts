// Display units follow the trade's habits (mm, g, cm², L, mH); storage stays SI.
interface Display {
  label: string;
  unit: string;
  scale: number;
  digits: number;
}

const display: Record<string, Display> = {
  fs: { label: 'Fs', unit: 'Hz', scale: 1, digits: 1 },
  qms: { label: 'Qms', unit: '', scale: 1, digits: 2 },
  qes: { label: 'Qes', unit: '', scale: 1, digits: 2 },
  qts: { label: 'Qts', unit: '', scale: 1, digits: 2 },
  re: { label: 'Re', unit: 'Ω', scale: 1, digits: 2 },
  le: { label: 'Le', unit: 'mH', scale: 1e3, digits: 3 },
  bl: { label: 'Bl', unit: 'T·m', scale: 1, digits: 2 },
  mms: { label: 'Mms', unit: 'g', scale: 1e3, digits: 2 },
  mmd: { label: 'Mmd', unit: 'g', scale: 1e3, digits: 2 },
  cms: { label: 'Cms', unit: 'mm/N', scale: 1e3, digits: 3 },
  kms: { label: 'Kms', unit: 'N/mm', scale: 1e-3, digits: 2 },
  rms: { label: 'Rms', unit: 'kg/s', scale: 1, digits: 2 },
  sd: { label: 'Sd', unit: 'cm²', scale: 1e4, digits: 1 },
  vas: { label: 'Vas', unit: 'L', scale: 1e3, digits: 2 },
  vd: { label: 'Vd', unit: 'cm³', scale: 1e6, digits: 1 },
  xmax: { label: 'Xmax', unit: 'mm', scale: 1e3, digits: 2 },
  xmech: { label: 'Xmech', unit: 'mm', scale: 1e3, digits: 2 },
  xbl: { label: 'X(Bl)', unit: 'mm', scale: 1e3, digits: 2 },
  xc: { label: 'X(C)', unit: 'mm', scale: 1e3, digits: 2 },
  xl: { label: 'X(L)', unit: 'mm', scale: 1e3, digits: 2 },
  x_bl: { label: 'X(Bl)', unit: 'mm', scale: 1e3, digits: 2 },
  x_c: { label: 'X(C)', unit: 'mm', scale: 1e3, digits: 2 },
  x_l: { label: 'X(L)', unit: 'mm', scale: 1e3, digits: 2 },
  xmax_ls: { label: 'Xmax (large signal)', unit: 'mm', scale: 1e3, digits: 2 },
  offset: { label: 'Coil rest offset', unit: 'mm', scale: 1e3, digits: 2 },
  bl_offset: { label: 'Coil rest offset', unit: 'mm', scale: 1e3, digits: 2 },
  bl0: { label: 'Bl(0)', unit: 'T·m', scale: 1, digits: 2 },
  kms0: { label: 'Kms(0)', unit: 'N/mm', scale: 1e-3, digits: 2 },
  le0: { label: 'Le(0)', unit: 'mH', scale: 1e3, digits: 3 },
  ebp: { label: 'EBP', unit: 'Hz', scale: 1, digits: 0 },
  pe: { label: 'Power rating', unit: 'W', scale: 1, digits: 0 },
  power: { label: 'Power rating', unit: 'W', scale: 1, digits: 0 },
  eta0: { label: 'η0', unit: '%', scale: 100, digits: 2 },
  spl283v: { label: 'Sensitivity', unit: 'dB @ 2.83 V / 1 m', scale: 1, digits: 1 },
  spl1w: { label: 'Sensitivity', unit: 'dB @ 1 W / 1 m', scale: 1, digits: 1 },
};

// A parameter the table does not know by name is still shown in a sensible unit, chosen by its SI unit.
const byUnit: Record<string, Omit<Display, 'label'>> = {
  m: { unit: 'mm', scale: 1e3, digits: 2 },
  kg: { unit: 'g', scale: 1e3, digits: 2 },
  'm^2': { unit: 'cm²', scale: 1e4, digits: 1 },
  'm²': { unit: 'cm²', scale: 1e4, digits: 1 },
  'm^3': { unit: 'L', scale: 1e3, digits: 2 },
  'm³': { unit: 'L', scale: 1e3, digits: 2 },
  H: { unit: 'mH', scale: 1e3, digits: 3 },
  'm/N': { unit: 'mm/N', scale: 1e3, digits: 3 },
  'N/m': { unit: 'N/mm', scale: 1e-3, digits: 2 },
  Hz: { unit: 'Hz', scale: 1, digits: 1 },
  ohm: { unit: 'Ω', scale: 1, digits: 2 },
  'Ω': { unit: 'Ω', scale: 1, digits: 2 },
};

export const parameterOrder = Object.keys(display);

export function parameterLabel(name: string): string {
  return display[name]?.label ?? name;
}

function displayFor(name: string, siUnit?: string): Display | null {
  const d = display[name];
  if (d) return d;
  const u = siUnit ? byUnit[siUnit] : undefined;
  return u ? { label: name, ...u } : null;
}

export function formatParameter(name: string, value: number, siUnit?: string): { label: string; text: string; unit: string } {
  const d = displayFor(name, siUnit);
  if (!d) return { label: name, text: String(Number(value.toPrecision(4))), unit: siUnit ?? '' };
  return { label: d.label, text: (value * d.scale).toFixed(d.digits), unit: d.unit };
}

/** Sorts by the table's usual order; unknown names go last, alphabetically. */
export function byParameterOrder<T extends { name: string }>(rows: readonly T[]): T[] {
  const rank = (n: string) => {
    const i = parameterOrder.indexOf(n);
    return i < 0 ? 999 : i;
  };
  return [...rows].sort((a, b) => rank(a.name) - rank(b.name) || a.name.localeCompare(b.name));
}

/** Display units for list facts: the summary already carries Vas in L and Xmax in mm. */
export function formatPrice(price: number | null, currency: string | null): string | null {
  if (price == null) return null;
  const amount = price >= 100 ? price.toFixed(0) : price.toFixed(2);
  return currency ? `${amount} ${currency}` : amount;
}
