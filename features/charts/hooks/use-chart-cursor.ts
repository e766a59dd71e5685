import { useSyncExternalStore } from 'react';
import type { ChartCursor } from '../chart-cursor';

const none = () => () => undefined;
const nothing = () => null;

/** The cursor frequency, re-rendering only the component that reads it. */
export function useChartCursorValue(cursor: ChartCursor | undefined): number | null {
  return useSyncExternalStore(cursor?.subscribe ?? none, cursor?.get ?? nothing, nothing);
}
