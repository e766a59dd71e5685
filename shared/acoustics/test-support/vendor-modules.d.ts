// Type shims for the untyped reference libraries the tests cross-check against.
declare module 'bessel' {
  export function besselj(x: number, n: number): number;
}

declare module 'fmin' {
  export interface NelderMeadResult {
    x: number[];
    fx: number;
  }
  export function nelderMead(
    f: (x: number[]) => number,
    initial: number[],
    parameters?: { maxIterations?: number; minErrorDelta?: number; minTolerance?: number; nonZeroDelta?: number; zeroDelta?: number },
  ): NelderMeadResult;
}
