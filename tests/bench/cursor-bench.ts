// Frame rate while the shared cursor sweeps the stack's charts with four drivers, in Chromium.
// Prints figures; asserts nothing.
import { createDb } from '../../db/connection';
import { seedDemo } from '../../db/demo/seed';
import { openBrowser } from '../../e2e/support/browser';
import { startAppServer } from '../../e2e/support/server';

async function main() {
  // The demo catalogue alone: every driver in it has measurements to draw.
  const db = createDb();
  await db.migrate.latest();
  await seedDemo(db);
  const rows = await db('drivers as d').join('measurement_sets as s', 's.driver_id', 'd.id').where({ 'd.type': 'mid-range', 'd.nominal_size_in': 3 }).distinct('d.slug').limit(4);
  const slugs = rows.map((r: { slug: string }) => r.slug).join(',');
  await db.destroy();
  const { url, child } = await startAppServer();
  const s = await openBrowser({ width: 1440, height: 900 });
  try {
    await s.page.goto(`${url}/stack?drivers=${slugs}`);
    const chart = s.page.getByTestId('stack-screen').getByTestId('stack-chart-spl');
    await chart.locator('canvas').waitFor({ timeout: 60_000 });
    await chart.scrollIntoViewIfNeeded();
    await s.page.waitForTimeout(2000);
    const box = await chart.boundingBox();
    if (!box) throw new Error('no SPL chart on the page');
    // Record every animation frame while the mouse sweeps the chart back and forth.
    await s.page.evaluate('window.__frames = []; (function tick(t) { window.__frames.push(t); requestAnimationFrame(tick); })(performance.now())');
    const y = box.y + box.height / 2;
    for (let pass = 0; pass < 4; pass++) {
      for (let i = 0; i <= 100; i++) {
        const x = box.x + 50 + ((pass % 2 ? 100 - i : i) / 100) * (box.width - 70);
        await s.page.mouse.move(x, y);
      }
    }
    const frames = (await s.page.evaluate('window.__frames')) as number[];
    const gaps = frames.slice(1).map((t, i) => t - frames[i]).sort((a, b) => a - b);
    const seconds = (frames[frames.length - 1] - frames[0]) / 1000;
    const fps = (frames.length - 1) / seconds;
    const p95 = gaps[Math.floor(gaps.length * 0.95)];
    const readout = await s.page.getByTestId('stack-screen').getByTestId('cursor-readout').textContent();
    console.log('cursor benchmark: 4 drivers, 404 mouse moves across the SPL chart (headless Chromium, software rendering)');
    console.log(`frames ${frames.length - 1} in ${seconds.toFixed(2)} s: ${fps.toFixed(1)} fps, p95 frame ${p95.toFixed(1)} ms, worst ${gaps[gaps.length - 1].toFixed(1)} ms`);
    console.log(`readout after the sweep: ${(readout ?? '').replace(/\s+/g, ' ').slice(0, 200)}`);
    console.log('target: at least 60 fps');
  } finally {
    await s.close();
    child.kill('SIGTERM');
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
