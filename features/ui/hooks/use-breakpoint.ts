import { useWindowDimensions } from 'react-native';

export type Breakpoint = 'phone' | 'wide';

/** Width at which the app switches from one column to a split layout. */
export const WIDE_MIN_WIDTH = 900;

export function breakpointFor(width: number): Breakpoint {
  return width >= WIDE_MIN_WIDTH ? 'wide' : 'phone';
}

export function useBreakpoint(): Breakpoint {
  const { width } = useWindowDimensions();
  return breakpointFor(width);
}
