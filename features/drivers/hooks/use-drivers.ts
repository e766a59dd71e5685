import useSWR from 'swr';
import type { DriverListResponse } from '../../../shared/schemas/drivers';
import { driversListPath } from '../api/drivers-api';
import type { ListParams } from '../logic/list-query';

/** One page of the catalogue for a search; the previous page stays on screen while the next loads. */
export function useDrivers(params: ListParams = {}) {
  return useSWR<DriverListResponse>(driversListPath(params), { keepPreviousData: true });
}
