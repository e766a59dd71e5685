import type { ChartOptions, ChartSeries } from '../chart-math';

export interface PngChart {
  title: string;
  series: readonly ChartSeries[];
  options: Omit<ChartOptions, 'width' | 'height'>;
  height: number;
  highlight?: readonly [number, number] | null;
}

export interface PngExport {
  width: number;
  title: string;
  /** Lines under the title: what was drawn and how it was normalised. */
  lines: readonly string[];
  legend: readonly { label: string; color: string; dash?: readonly number[] }[];
  charts: readonly PngChart[];
}

/**
 * Draws the charts, stacked, on an offscreen Skia surface and returns the PNG as base64. The Skia
 * module loads on first use, after the on-screen charts have loaded CanvasKit.
 */
export async function exportChartsPng(spec: PngExport): Promise<string> {
  const m = await import('./draw-png');
  return m.drawChartsPng(spec);
}
