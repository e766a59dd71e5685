// Offscreen drawing of stacked charts for a PNG download. A raster surface (no GPU context), so it
// works in any browser that runs CanvasKit.
import { ClipOp, PaintStyle, Skia, type SkFont, type SkPaint } from '@shopify/react-native-skia';
import { Platform } from '@shopify/react-native-skia/lib/module/Platform';
import { colors } from '../../ui';
import { computeGeometry } from '../chart-math';
import type { PngExport } from './export-png';

const fontSource = require('../../../assets/fonts/Manrope_600SemiBold.ttf');

async function loadFonts(): Promise<{ small: SkFont; big: SkFont } | null> {
  // The web bundler gives an asset's URL as a string; native gives a module id to resolve.
  const uri = typeof fontSource === 'string' ? fontSource : Platform.resolveAsset(fontSource);
  const data = await Skia.Data.fromURI(uri);
  const face = Skia.Typeface.MakeFreeTypeFaceFromData(data);
  return face ? { small: Skia.Font(face, 12), big: Skia.Font(face, 20) } : null;
}

function paint(color: string, stroke?: number, dash?: readonly number[]): SkPaint {
  const p = Skia.Paint();
  p.setAntiAlias(true);
  p.setColor(Skia.Color(color));
  if (stroke != null) {
    p.setStyle(PaintStyle.Stroke);
    p.setStrokeWidth(stroke);
  }
  if (dash && dash.length >= 2) p.setPathEffect(Skia.PathEffect.MakeDash([...dash], 0));
  return p;
}

export async function drawChartsPng(spec: PngExport): Promise<string> {
  const fonts = await loadFonts();
  const pad = 24;
  const headH = 40 + spec.lines.length * 18 + Math.ceil(spec.legend.length / 2) * 20 + 10;
  const chartGap = 36;
  const height = headH + spec.charts.reduce((s, c) => s + c.height + chartGap, 0) + pad;
  const surface = Skia.Surface.Make(spec.width, height);
  if (!surface) throw new Error('Could not create an image surface');
  const canvas = surface.getCanvas();
  canvas.drawColor(Skia.Color(colors.card));
  const ink = paint(colors.ink);
  const soft = paint(colors.inkSoft);
  let y = pad;
  if (fonts) {
    canvas.drawText(spec.title, pad, y + 16, ink, fonts.big);
    y += 32;
    for (const l of spec.lines) {
      canvas.drawText(l, pad, y + 12, soft, fonts.small);
      y += 18;
    }
    const colW = (spec.width - 2 * pad) / 2;
    spec.legend.forEach((item, i) => {
      const lx = pad + (i % 2) * colW;
      const ly = y + Math.floor(i / 2) * 20 + 10;
      canvas.drawLine(lx, ly - 4, lx + 32, ly - 4, paint(item.color, 2.5, item.dash));
      canvas.drawText(item.label, lx + 40, ly, ink, fonts.small);
    });
    y += Math.ceil(spec.legend.length / 2) * 20 + 10;
  } else {
    y = headH;
  }
  for (const chart of spec.charts) {
    if (fonts) canvas.drawText(chart.title, pad, y + 14, ink, fonts.small);
    y += 20;
    const g = computeGeometry(chart.series, { ...chart.options, width: spec.width - 2 * pad, height: chart.height });
    canvas.save();
    canvas.translate(pad, y);
    const { plot } = g;
    if (chart.highlight) {
      const a = Math.max(plot.left, g.x(chart.highlight[0]));
      const b = Math.min(plot.right, g.x(chart.highlight[1]));
      if (b > a) canvas.drawRect(Skia.XYWHRect(a, plot.top, b - a, plot.bottom - plot.top), paint(colors.accentSoft));
    }
    for (const t of g.xTicks) canvas.drawLine(t.pos, plot.top, t.pos, plot.bottom, paint(t.major ? colors.gridStrong : colors.grid, 1));
    for (const t of g.yTicks) canvas.drawLine(plot.left, t.pos, plot.right, t.pos, paint(t.major ? colors.gridStrong : colors.grid, 1));
    canvas.save();
    canvas.clipRect(Skia.XYWHRect(plot.left, plot.top, plot.right - plot.left, plot.bottom - plot.top), ClipOp.Intersect, true);
    for (const p of g.paths) {
      const path = Skia.Path.MakeFromSVGString(p.d);
      if (path) canvas.drawPath(path, paint(p.color, p.width, p.dash));
    }
    canvas.restore();
    if (fonts) {
      for (const t of g.xTicks) canvas.drawText(t.label, t.pos - fonts.small.getTextWidth(t.label) / 2, plot.bottom + 16, soft, fonts.small);
      for (const t of g.yTicks.filter((t) => t.major)) canvas.drawText(t.label, plot.left - 6 - fonts.small.getTextWidth(t.label), t.pos + 4, soft, fonts.small);
    }
    canvas.restore();
    y += chart.height + chartGap - 20;
  }
  surface.flush();
  return surface.makeImageSnapshot().encodeToBase64();
}
