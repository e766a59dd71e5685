import { useEffect, useState } from 'react';
import useSWR from 'swr';
import type { NearDuplicatesResponse } from '../../../shared/schemas/submissions';

/** Entries that may already be the driver being typed in; asks once typing pauses. */
export function useNearDuplicates(makerName: string, model: string, delayMs = 300) {
  const [key, setKey] = useState<string | null>(null);
  useEffect(() => {
    const m = makerName.trim();
    const d = model.trim();
    const t = setTimeout(() => {
      setKey(m.length >= 2 && d.length >= 1 ? `/api/submissions/near-duplicates?makerName=${encodeURIComponent(m)}&model=${encodeURIComponent(d)}` : null);
    }, delayMs);
    return () => clearTimeout(t);
  }, [makerName, model, delayMs]);
  return useSWR<NearDuplicatesResponse>(key, { keepPreviousData: false });
}
