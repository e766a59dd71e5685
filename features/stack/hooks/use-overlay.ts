import useSWR from 'swr';
import type { OverlayResponse, SavedOverlay } from '../../../shared/schemas/overlay';
import { overlayPath, savedOverlayPath } from '../api/overlay-api';
import type { StackEntry } from '../logic/stack-options';

/** The curves and figures of every driver in the stack, on one grid. Keeps the last data while a set changes. */
export function useOverlay(entries: readonly StackEntry[], band?: { lo: number; hi: number }) {
  return useSWR<OverlayResponse>(overlayPath(entries, band), { keepPreviousData: true });
}

export function useSavedOverlay(code: string | undefined) {
  return useSWR<SavedOverlay>(code ? savedOverlayPath(code) : null);
}
