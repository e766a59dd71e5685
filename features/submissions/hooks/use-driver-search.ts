import useSWR from 'swr';
import type { DriverListResponse } from '../../../shared/schemas/drivers';

/** Catalogue matches for the driver picker; nothing is asked until two letters are typed. */
export function useDriverSearch(q: string) {
  const t = q.trim();
  return useSWR<DriverListResponse>(t.length >= 2 ? `/api/drivers?q=${encodeURIComponent(t)}` : null, { keepPreviousData: true });
}
