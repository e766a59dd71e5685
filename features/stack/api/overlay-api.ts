import type { OverlayOptions, SavedOverlay, SaveOverlayInput } from '../../../shared/schemas/overlay';
import { postJson } from '../../ui';
import type { StackEntry } from '../logic/stack-options';

/**
 * `/api/overlay?drivers=a,b&sets=12,` — an empty place in `sets` means that driver's first set;
 * `sets` is left out when no set was chosen. The band goes along so the figures match the view.
 */
export function overlayPath(entries: readonly StackEntry[], band?: { lo: number; hi: number }): string | null {
  if (entries.length === 0) return null;
  const parts = [`drivers=${entries.map((e) => encodeURIComponent(e.slug)).join(',')}`];
  if (entries.some((e) => e.setId != null)) parts.push(`sets=${entries.map((e) => (e.setId == null ? '' : String(e.setId))).join(',')}`);
  if (band) parts.push(`bandLo=${band.lo}`, `bandHi=${band.hi}`);
  // Commas stay literal: the server splits on them and the address stays readable.
  return `/api/overlay?${parts.join('&')}`;
}

export const savedOverlayPath = (code: string) => `/api/overlays/${encodeURIComponent(code)}`;

export function saveOverlay(title: string, note: string, entries: readonly StackEntry[], options: OverlayOptions): Promise<{ code: string; url: string }> {
  const body: SaveOverlayInput = { title, note, entries: entries.map((e) => ({ slug: e.slug, setId: e.setId })), options };
  return postJson<{ code: string; url: string }>('/api/overlays', body);
}

export type { SavedOverlay };
