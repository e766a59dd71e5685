import { useMemo } from 'react';
import { computeGeometry, type ChartGeometry, type ChartOptions, type ChartSeries } from '../chart-math';

/** Recomputes scales and paths only when the data, the size or the options change. */
export function useChartGeometry(series: readonly ChartSeries[], options: ChartOptions): ChartGeometry {
  const { width, height, xDomain, yDomain, yStep, padding, xScale, yScale, xStep } = options;
  return useMemo(
    () => computeGeometry(series, { width, height, xDomain, yDomain, yStep, padding, xScale, yScale, xStep }),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- tuple contents, not identities, decide a rebuild
    [series, width, height, xDomain[0], xDomain[1], yDomain?.[0], yDomain?.[1], yStep, padding, xScale, yScale, xStep],
  );
}
