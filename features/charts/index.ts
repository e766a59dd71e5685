export { LogChart, type LogChartProps } from './components/log-chart';
export {
  computeGeometry, nearestIndex, niceYDomain, logYDomain, niceStep, logFrequencyTicks, formatHz, type AxisScale, type ChartSeries, type ChartGeometry,
  type ChartOptions,
} from './chart-math';
export { ChartLegend, LineSample } from './components/chart-legend';
export { useChartGeometry } from './hooks/use-chart-geometry';
export { createChartCursor, type ChartCursor } from './chart-cursor';
export { useChartCursorValue } from './hooks/use-chart-cursor';
export { exportChartsPng, type PngChart, type PngExport } from './export/export-png';
