import useSWR from 'swr';
import type { DriverListQuery, DriverListResponse } from '../../../shared/schemas/drivers';
import { driversListPath } from '../api/drivers-api';

export function useDrivers(query: Partial<DriverListQuery> = {}) {
  return useSWR<DriverListResponse>(driversListPath(query), { keepPreviousData: true });
}
