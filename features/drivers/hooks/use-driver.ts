import useSWR from 'swr';
import type { DriverDetail } from '../../../shared/schemas/drivers';
import { driverPath } from '../api/drivers-api';

export function useDriver(slug: string | undefined, band?: { bandLo?: string; bandHi?: string }) {
  return useSWR<DriverDetail>(slug ? driverPath(slug, band) : null, { keepPreviousData: true });
}
