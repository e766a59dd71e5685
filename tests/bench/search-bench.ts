// Search latency at growing catalogue sizes, facet counts included. Prints figures; asserts nothing.
import { performance } from 'node:perf_hooks';
import { createDb, dbSettingsFromEnv } from '../../db/connection';
import { growBenchCatalogue } from '../../db/demo/bench-catalogue';
import { prng } from '../../db/demo/catalogue';
import { createDriversRepository } from '../../server/drivers/repository';
import { createDriversService } from '../../server/drivers/service';
import { driverListQuerySchema } from '../../shared/schemas/drivers';

function pct(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function main() {
  const sizes = (process.env.BENCH_SIZES ?? '1000,10000,50000').split(',').map(Number);
  const rnd = prng(99);
  console.log('search benchmark (service.list: fuzzy text, facet filters, role ranking, facet counts)');
  console.log('size     kind          p50 ms   p99 ms   (index build ms)');
  for (const size of sizes) {
    const db = createDb({ ...dbSettingsFromEnv(), database: `conestack_bench_${size}` });
    await db.migrate.latest();
    await growBenchCatalogue(db, size);
    const repo = createDriversRepository(db);
    const names = (await db('drivers').orderByRaw('rand(42)').limit(200).select('model')).map((r: { model: string }) => r.model);
    for (const staleAfterMs of [2000, 0]) {
      const service = createDriversService(repo, { staleAfterMs });
      const t0 = performance.now();
      await service.list(driverListQuerySchema.parse({}));
      const build = performance.now() - t0;
      const kinds: Record<string, () => Record<string, string | number>> = {
        text: () => {
          const n = names[Math.floor(rnd() * names.length)];
          const i = 1 + Math.floor(rnd() * (n.length - 2));
          return { q: n.slice(0, i) + n.slice(i + 1) };
        },
        facets: () => ({ type: ['mid-range', 'woofer', 'tweeter'][Math.floor(rnd() * 3)], sizeMin: 1, sizeMax: 8, sensMin: 80 + Math.floor(rnd() * 6) }),
        role: () => ({ type: 'mid-range', bandLo: 300, bandHi: 3000, level: 85 + Math.floor(rnd() * 10) }),
      };
      for (const [kind, make] of Object.entries(kinds)) {
        const times: number[] = [];
        for (let i = 0; i < 120; i++) {
          const q = driverListQuerySchema.parse(make());
          const t = performance.now();
          await service.list(q);
          times.push(performance.now() - t);
        }
        times.sort((a, b) => a - b);
        const label = `${kind}${staleAfterMs === 0 ? '+check' : ''}`;
        console.log(`${String(size).padEnd(8)} ${label.padEnd(13)} ${pct(times, 50).toFixed(2).padStart(7)}  ${pct(times, 99).toFixed(2).padStart(7)}   (${build.toFixed(0)})`);
      }
    }
    await db.destroy();
  }
  console.log('"+check": the catalogue version is re-read on every request (the default re-reads at most every 2 s).');
  console.log('target: p50 under 20 ms at 50k drivers');
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
