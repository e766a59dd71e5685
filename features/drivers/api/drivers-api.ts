import { bandSearch } from '../logic/driver-notes';
import { listApiPath, PAGE_SIZE, type ListParams } from '../logic/list-query';

export function driversListPath(params: ListParams = {}, limit = PAGE_SIZE): string {
  return listApiPath(params, limit);
}

/** The detail path; a complete band makes the server derive the figures over it. */
export function driverPath(slug: string, band?: { bandLo?: string; bandHi?: string }): string {
  const s = bandSearch(band).toString();
  return `/api/drivers/${encodeURIComponent(slug)}${s ? `?${s}` : ''}`;
}
