import { useEffect } from 'react';
import { useSWRConfig } from 'swr';
import type { DriverDetail } from '../../../shared/schemas/drivers';
import { driverPath } from '../api/drivers-api';
import { aliasRedirect, driverHref, rememberRedirect } from '../logic/driver-notes';

/**
 * Sends an old slug's page to the canonical URL once the detail arrives. The answer is put in the
 * cache under the canonical key first, so the new screen draws at once instead of fetching again.
 */
export function useAliasRedirect(detail: DriverDetail | undefined, band: { bandLo?: string; bandHi?: string }, replace: (href: string) => void): void {
  const { mutate } = useSWRConfig();
  const redirect = detail ? aliasRedirect(detail) : null;
  const from = redirect?.from;
  const to = redirect?.to;
  useEffect(() => {
    if (!from || !to || !detail) return;
    rememberRedirect({ from, to });
    void mutate(driverPath(to, band), { ...detail, requestedSlug: to }, { revalidate: false });
    replace(driverHref(to, band));
    // eslint-disable-next-line react-hooks/exhaustive-deps -- fire once per redirect, not per render
  }, [from, to]);
}
