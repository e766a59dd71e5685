// Turns measurement curves into chart series. Colour and dash pattern change together, so every
// series stays distinct for readers who cannot tell the colours apart, and in greyscale print.
import type { Curve, MeasurementSet } from '../../../shared/schemas/drivers';
import type { ChartSeries } from '../../charts';

/** Series colours, passed in (the theme's `colors.series`) so this module stays free of the UI. */
export type Palette = readonly string[];

const dashes: readonly (readonly number[] | undefined)[] = [undefined, [8, 4], [2, 3], [10, 3, 2, 3], [4, 4]];

export function seriesStyle(i: number, palette: Palette): { color: string; dash?: readonly number[] } {
  return { color: palette[i % palette.length], dash: dashes[i % dashes.length] };
}

const byAngle = (a: Curve, b: Curve) => Math.abs(a.angleDeg ?? 0) - Math.abs(b.angleDeg ?? 0) || (a.angleDeg ?? 0) - (b.angleDeg ?? 0);

export function angleLabel(angleDeg: number | null): string {
  const a = angleDeg ?? 0;
  return a === 0 ? 'On axis' : `${a}°`;
}

/** One series per measured angle, on-axis first. */
export function splSeries(set: MeasurementSet | undefined, palette: Palette): ChartSeries[] {
  if (!set) return [];
  return set.curves
    .filter((c) => c.kind === 'spl')
    .sort(byAngle)
    .map((c, i) => ({ id: `spl-${c.angleDeg ?? 0}`, x: c.x, y: c.y, label: angleLabel(c.angleDeg), width: i === 0 ? 2.5 : 1.5, ...seriesStyle(i, palette) }));
}

function onAxis(set: MeasurementSet): Curve | undefined {
  return set.curves.filter((c) => c.kind === 'spl').sort(byAngle)[0];
}

/** Every set's on-axis response on one chart, for sample-to-sample comparison. */
export function setOverlaySeries(sets: readonly MeasurementSet[], palette: Palette): ChartSeries[] {
  return sets.flatMap((s, i) => {
    const c = onAxis(s);
    return c ? [{ id: `set-${s.id}`, x: c.x, y: c.y, label: s.label, width: 2, ...seriesStyle(i, palette) }] : [];
  });
}

// Measured impedance is solid, the fitted model dashed, in the same colours on magnitude and phase.
const measuredStyle = (palette: Palette) => ({ label: 'Measured', width: 2.5, ...seriesStyle(0, palette) });
const fitStyle = (palette: Palette) => ({ label: 'Fitted model', width: 2, color: palette[1 % palette.length], dash: [8, 4] as readonly number[] });

/** Measured magnitude against the fitted model's. */
export function impedanceSeries(set: MeasurementSet | undefined, palette: Palette): ChartSeries[] {
  if (!set) return [];
  const out: ChartSeries[] = [];
  const measured = set.curves.find((c) => c.kind === 'impedance');
  const fit = set.curves.find((c) => c.kind === 'impedance_fit');
  if (measured) out.push({ id: 'z-measured', x: measured.x, y: measured.y, ...measuredStyle(palette) });
  if (fit) out.push({ id: 'z-fit', x: fit.x, y: fit.y, ...fitStyle(palette) });
  return out;
}

/** A curve's phase against its frequencies, or null when it has none. Extra points on either side are dropped. */
function phaseOf(c: Curve | undefined): { x: readonly number[]; y: readonly number[] } | null {
  if (!c?.phase?.length || c.x.length === 0) return null;
  const n = Math.min(c.x.length, c.phase.length);
  return n === c.x.length && n === c.phase.length ? { x: c.x, y: c.phase } : { x: c.x.slice(0, n), y: c.phase.slice(0, n) };
}

/** Measured impedance phase (degrees) against the fitted model's; a curve without phase gives no series. */
export function impedancePhaseSeries(set: MeasurementSet | undefined, palette: Palette): ChartSeries[] {
  if (!set) return [];
  const out: ChartSeries[] = [];
  const measured = phaseOf(set.curves.find((c) => c.kind === 'impedance'));
  const fit = phaseOf(set.curves.find((c) => c.kind === 'impedance_fit'));
  if (measured) out.push({ id: 'phase-measured', ...measured, ...measuredStyle(palette) });
  if (fit) out.push({ id: 'phase-fit', ...fit, ...fitStyle(palette) });
  return out;
}

/**
 * The phase axis in degrees: −90..90 (the whole range of a passive load's impedance), widened in
 * 30° steps, up to ±180, for any point outside it (noise, a wrapped measurement).
 */
export function phaseDomain(series: readonly ChartSeries[], step = 30): [number, number] {
  let lo = -90;
  let hi = 90;
  for (const s of series) for (const v of s.y) if (Number.isFinite(v)) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return [Math.max(-180, Math.floor(lo / step) * step), Math.min(180, Math.ceil(hi / step) * step)];
}

export function driveLevels(set: MeasurementSet | undefined): number[] {
  if (!set) return [];
  const levels = new Set<number>();
  for (const c of set.curves) if ((c.kind === 'thd' || c.kind === 'h2' || c.kind === 'h3') && c.driveLevelV != null) levels.add(c.driveLevelV);
  return [...levels].sort((a, b) => a - b);
}

const volts = (v: number | null) => (v == null ? '' : ` ${Number(v.toPrecision(3))} V`);

/**
 * THD per drive level (solid), with H2 (dashed) and H3 (dotted) when asked for. Colour follows
 * the drive level, the dash the harmonic.
 */
export function distortionSeries(set: MeasurementSet | undefined, show: { h2: boolean; h3: boolean }, palette: Palette): ChartSeries[] {
  if (!set) return [];
  const levels = driveLevels(set);
  const colourOf = (v: number | null) => palette[Math.max(0, levels.indexOf(v ?? -1)) % palette.length];
  const kinds: { kind: 'thd' | 'h2' | 'h3'; name: string; dash?: readonly number[]; width: number }[] = [
    { kind: 'thd', name: 'THD', width: 2 },
    ...(show.h2 ? [{ kind: 'h2' as const, name: 'H2', dash: [8, 4], width: 1.5 }] : []),
    ...(show.h3 ? [{ kind: 'h3' as const, name: 'H3', dash: [2, 3], width: 1.5 }] : []),
  ];
  const out: ChartSeries[] = [];
  for (const k of kinds) {
    const curves = set.curves.filter((c) => c.kind === k.kind).sort((a, b) => (a.driveLevelV ?? 0) - (b.driveLevelV ?? 0));
    for (const c of curves) {
      out.push({ id: `${k.kind}-${c.driveLevelV ?? 'x'}`, x: c.x, y: c.y, label: `${k.name}${volts(c.driveLevelV)}`, color: colourOf(c.driveLevelV), dash: k.dash, width: k.width });
    }
  }
  return out;
}

const largeSignalNames = { bl_x: 'Bl(x)', kms_x: 'Kms(x)', le_x: 'Le(x)' } as const;

/**
 * Bl(x), Kms(x) and Le(x) with x in mm and each curve as a percentage of its value at rest (x
 * nearest 0), so three quantities in different units share one axis.
 */
export function largeSignalSeries(set: MeasurementSet | undefined, palette: Palette): ChartSeries[] {
  if (!set) return [];
  const out: ChartSeries[] = [];
  (Object.keys(largeSignalNames) as (keyof typeof largeSignalNames)[]).forEach((kind, i) => {
    const c = set.curves.find((k) => k.kind === kind);
    if (!c || c.x.length === 0) return;
    let rest = 0;
    for (let j = 1; j < c.x.length; j++) if (Math.abs(c.x[j]) < Math.abs(c.x[rest])) rest = j;
    const y0 = c.y[rest];
    if (!Number.isFinite(y0) || y0 === 0) return;
    out.push({ id: kind, x: c.x.map((m) => m * 1e3), y: c.y.map((v) => (v / y0) * 100), label: largeSignalNames[kind], width: 2, ...seriesStyle(i, palette) });
  });
  return out;
}

/** A symmetric x range around rest that holds every excursion point, in mm. */
export function excursionDomain(series: readonly ChartSeries[]): [number, number] {
  let m = 0;
  for (const s of series) for (const v of s.x) if (Number.isFinite(v)) m = Math.max(m, Math.abs(v));
  const edge = m > 0 ? Math.ceil(m) : 5;
  return [-edge, edge];
}

/** The x range that holds every frequency point, snapped to the usual 20 Hz–20 kHz where it fits. */
export function frequencyDomain(series: readonly ChartSeries[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) for (const v of s.x) if (v > 0) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (!Number.isFinite(lo)) return [20, 20000];
  return [Math.min(20, lo), Math.max(20000, hi)];
}

/**
 * A level range for response charts set by the on-axis curve: 5 dB of headroom above its peak and
 * 50 dB below, so deep off-axis nulls do not squash the part a reader compares.
 */
export function splDomain(series: readonly ChartSeries[], span = 50): [number, number] | undefined {
  const main = series[0];
  if (!main) return undefined;
  let hi = -Infinity;
  for (const v of main.y) if (Number.isFinite(v)) hi = Math.max(hi, v);
  if (!Number.isFinite(hi)) return undefined;
  const top = Math.ceil((hi + 5) / 5) * 5;
  return [top - span, top];
}
