// Display units follow the trade's habits (mm, g, cm², L, mH); storage stays SI.
interface Display {
  label: string;
  unit: string;
  scale: number;
  digits: number;
}
type Unit = Omit<Display, 'label'>;

const unit = (symbol: string, scale: number, digits: number): Unit => ({ unit: symbol, scale, digits });
const hz = unit('Hz', 1, 1);
const plain = unit('', 1, 2);
const ohm = unit('Ω', 1, 2);
const mH = unit('mH', 1e3, 3);
const tesla = unit('T·m', 1, 2);
const gram = unit('g', 1e3, 2);
const mmPerN = unit('mm/N', 1e3, 3);
const nPerMm = unit('N/mm', 1e-3, 2);
const cm2 = unit('cm²', 1e4, 1);
const litre = unit('L', 1e3, 2);
const mm = unit('mm', 1e3, 2);
const watt = unit('W', 1, 0);

const as = (label: string, u: Unit): Display => ({ label, ...u });

const display: Record<string, Display> = {
  fs: as('Fs', hz),
  qms: as('Qms', plain),
  qes: as('Qes', plain),
  qts: as('Qts', plain),
  re: as('Re', ohm),
  le: as('Le', mH),
  bl: as('Bl', tesla),
  mms: as('Mms', gram),
  mmd: as('Mmd', gram),
  cms: as('Cms', mmPerN),
  kms: as('Kms', nPerMm),
  rms: as('Rms', unit('kg/s', 1, 2)),
  sd: as('Sd', cm2),
  vas: as('Vas', litre),
  vd: as('Vd', unit('cm³', 1e6, 1)),
  xmax: as('Xmax', mm),
  xmech: as('Xmech', mm),
  xbl: as('X(Bl)', mm),
  xc: as('X(C)', mm),
  xl: as('X(L)', mm),
  x_bl: as('X(Bl)', mm),
  x_c: as('X(C)', mm),
  x_l: as('X(L)', mm),
  xmax_ls: as('Xmax (large signal)', mm),
  offset: as('Coil rest offset', mm),
  bl_offset: as('Coil rest offset', mm),
  bl0: as('Bl(0)', tesla),
  kms0: as('Kms(0)', nPerMm),
  le0: as('Le(0)', mH),
  ebp: as('EBP', unit('Hz', 1, 0)),
  pe: as('Power rating', watt),
  power: as('Power rating', watt),
  eta0: as('η0', unit('%', 100, 2)),
  spl283v: as('Sensitivity', unit('dB @ 2.83 V / 1 m', 1, 1)),
  spl1w: as('Sensitivity', unit('dB @ 1 W / 1 m', 1, 1)),
};

// A parameter the table does not know by name is still shown in a sensible unit, chosen by its SI unit.
const byUnit: Record<string, Unit> = {
  m: mm,
  kg: gram,
  'm^2': cm2,
  'm²': cm2,
  'm^3': litre,
  'm³': litre,
  H: mH,
  'm/N': mmPerN,
  'N/m': nPerMm,
  Hz: hz,
  ohm,
  'Ω': ohm,
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
