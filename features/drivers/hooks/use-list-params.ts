import { useLocalSearchParams, useRouter } from 'expo-router';
import { useCallback, useMemo } from 'react';
import { paramsFromSearch, routerParams, type ListParams } from '../logic/list-query';

/** The search state read from and written to the URL, so a search can be shared and reloaded. */
export function useListParams(): [ListParams, (next: ListParams) => void] {
  const search = useLocalSearchParams<Record<string, string | string[]>>();
  const router = useRouter();
  const key = JSON.stringify(search);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- the params object is new on every render; its content decides
  const params = useMemo(() => paramsFromSearch(search), [key]);
  const setParams = useCallback((next: ListParams) => router.setParams(routerParams(next)), [router]);
  return [params, setParams];
}
