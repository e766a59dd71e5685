export { LogChart, type LogChartProps } from './components/log-chart';
export { computeGeometry, nearestIndex, niceYDomain, logFrequencyTicks, formatHz, type ChartSeries, type ChartGeometry } from './chart-math';
export { useChartGeometry } from './hooks/use-chart-geometry';
