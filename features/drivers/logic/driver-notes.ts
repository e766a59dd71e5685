// Small pieces of driver-page logic kept apart from React: the alias redirect, the safety notes
// that apply to a driver, and the text of a role ranking.
import { isValidBand } from '../../../shared/schemas/band';
import type { DriverDetail, DriverSummary, DriverType, RoleFit } from '../../../shared/schemas/drivers';

/** Where to send the browser when the page was opened under an old slug, or null. */
export function aliasRedirect(detail: Pick<DriverDetail, 'slug' | 'requestedSlug'>): { from: string; to: string } | null {
  if (!detail.requestedSlug || detail.requestedSlug === detail.slug) return null;
  return { from: detail.requestedSlug, to: detail.slug };
}

/** bandLo and bandHi for a link or a request, only when they make a band the server accepts. */
export function bandSearch(band?: { bandLo?: string; bandHi?: string }): URLSearchParams {
  const qs = new URLSearchParams();
  if (band?.bandLo && band?.bandHi && isValidBand(Number(band.bandLo), Number(band.bandHi))) {
    qs.set('bandLo', band.bandLo);
    qs.set('bandHi', band.bandHi);
  }
  return qs;
}

/** The detail path, carrying a role band so the server derives figures over it. */
export function driverHref(slug: string, band?: { bandLo?: string; bandHi?: string }): string {
  const s = bandSearch(band).toString();
  return `/drivers/${encodeURIComponent(slug)}${s ? `?${s}` : ''}`;
}

// The redirect replaces the screen, so the old name it came from is kept here for the new one.
const redirectedFrom = new Map<string, string>();
export function rememberRedirect(r: { from: string; to: string }): void {
  redirectedFrom.set(r.to, r.from);
}
export function takeRedirectNote(slug: string): string | null {
  return redirectedFrom.get(slug) ?? null;
}

export interface Caution {
  id: 'cutting' | 'vehicle-door' | 'hearing' | 'amplifier';
  title: string;
  text: string;
}

// Types and sizes that commonly go into vehicle doors and kick panels (common practice, no source).
const doorTypes: readonly DriverType[] = ['full-range', 'mid-range', 'mid-woofer'];
const carSizesIn = [3, 3.5, 4, 5, 5.25, 6, 6.5, 6.75, 8];

export function fitsVehicleDoor(d: Pick<DriverSummary, 'type' | 'nominalSizeIn'>): boolean {
  if (doorTypes.includes(d.type)) return true;
  return d.type === 'woofer' && carSizesIn.some((s) => Math.abs(s - d.nominalSizeIn) < 0.01);
}

export function cautionsFor(d: Pick<DriverSummary, 'type' | 'nominalSizeIn'>): Caution[] {
  const out: Caution[] = [
    {
      id: 'cutting',
      title: 'Cutting the baffle',
      text: 'Wear eye and hearing protection when cutting or routing the cutout, use dust extraction, and follow the tool maker\u2019s instructions.',
    },
  ];
  if (fitsVehicleDoor(d)) {
    out.push({
      id: 'vehicle-door',
      title: 'Mounting in a vehicle door',
      text: 'Before cutting a door or panel, check for airbags, side-impact sensors, window mechanisms and wiring. Disconnect the battery as the vehicle maker\u2019s instructions say. Local rules and a licensed installer take precedence over this page.',
    });
  }
  out.push(
    { id: 'hearing', title: 'Test levels', text: 'High test levels can damage hearing. Keep sweeps short and protect your ears near the driver.' },
    { id: 'amplifier', title: 'Amplifier power', text: 'Keep amplifier power within the driver\u2019s rating; clipping a larger amplifier can also burn a voice coil.' },
  );
  return out;
}

export interface RoleDisplay {
  rank: string;
  score: string;
  figures: { label: string; value: string }[];
  reasons: string[];
}

/** What a ranked card shows: its place, its score and the figures and reasons behind them. */
export function roleDisplay(role: RoleFit): RoleDisplay {
  const figures: { label: string; value: string }[] = [];
  if (role.sensitivityDb != null) figures.push({ label: 'In band', value: `${role.sensitivityDb.toFixed(1)} dB` });
  if (role.linearityDb != null) figures.push({ label: 'Linearity', value: `±${role.linearityDb.toFixed(1)} dB` });
  if (role.thdPercent != null) figures.push({ label: 'THD at level', value: `${Number(role.thdPercent.toPrecision(2))} %` });
  if (role.beamingHz != null) figures.push({ label: 'Beaming from', value: role.beamingHz >= 1000 ? `${Number((role.beamingHz / 1000).toFixed(1))} kHz` : `${Math.round(role.beamingHz)} Hz` });
  return { rank: `#${role.rank}`, score: role.score.toFixed(2), figures, reasons: role.reasons };
}
