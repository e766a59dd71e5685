export { LogChart, type LogChartProps } from './components/log-chart';
export {
  computeGeometry, nearestIndex, niceYDomain, logYDomain, niceStep, logFrequencyTicks, formatHz, type AxisScale, type ChartSeries, type ChartGeometry,
} from './chart-math';
export { ChartLegend } from './components/chart-legend';
export { useChartGeometry } from './hooks/use-chart-geometry';
