import type { DriverListQuery } from '../../../shared/schemas/drivers';

export function driversListPath(query: Partial<DriverListQuery> = {}): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) {
    if (v !== undefined && v !== '') params.set(k, String(v));
  }
  const qs = params.toString();
  return `/api/drivers${qs ? `?${qs}` : ''}`;
}

export function driverPath(slug: string): string {
  return `/api/drivers/${encodeURIComponent(slug)}`;
}
