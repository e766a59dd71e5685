// Number formats for the driver page's figures.
export function hz(f: number | null | undefined): string {
  if (f == null || !Number.isFinite(f)) return '—';
  if (f >= 1000) return `${Number((f / 1000).toFixed(f >= 10000 ? 1 : 2))} kHz`;
  return `${Math.round(f)} Hz`;
}

export function num(v: number | null | undefined, digits = 1, unit = ''): string {
  if (v == null || !Number.isFinite(v)) return '—';
  return `${v.toFixed(digits)}${unit ? ` ${unit}` : ''}`;
}

export function mm(v: number | null | undefined): string {
  return num(v, v != null && Math.abs(v) < 10 ? 1 : 0, 'mm');
}
