// GET /api/overlay under load with autocannon on loopback, against a bare mysql2 + http handler
// that returns the same rows, in the same run, on a 10,000-driver catalogue. Prints figures.
import autocannon from 'autocannon';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import mysql from 'mysql2/promise';
import { createDb, dbSettingsFromEnv } from '../../db/connection';
import { growBenchCatalogue } from '../../db/demo/bench-catalogue';
import { seedDemo } from '../../db/demo/seed';
import { createApp } from '../../server/app';

const listen = (s: Server) => new Promise<number>((r) => s.listen(0, '127.0.0.1', () => r((s.address() as AddressInfo).port)));

async function load(url: string) {
  const result = await autocannon({ url, connections: 20, duration: 10, pipelining: 1 });
  return { rps: result.requests.average, p50: result.latency.p50, p99: result.latency.p99, errors: result.errors + result.non2xx };
}

async function main() {
  const settings = { ...dbSettingsFromEnv(), database: 'conestack_bench_10000' };
  const db = createDb(settings);
  await db.migrate.latest();
  await growBenchCatalogue(db, 10000);
  await seedDemo(db);
  const mids = await db('drivers').where({ type: 'mid-range', nominal_size_in: 3 }).whereNotNull('price').join('measurement_sets as s', 's.driver_id', 'drivers.id').distinct('drivers.slug').limit(4);
  const slugs = mids.map((r: { slug: string }) => r.slug);
  const count = (await db('drivers').count({ n: '*' }).first())?.n;

  const app = createApp({ db });
  const appServer = createServer(app);
  const appPort = await listen(appServer);

  // The bare handler: the same rows (drivers, sets, parameters, curves) straight to JSON.
  const pool = mysql.createPool({ ...settings, connectionLimit: 10 });
  const bare = createServer(async (_req, res) => {
    const [drivers] = await pool.query('select id, slug, model, type, nominal_size_in, nominal_impedance_ohm from drivers where slug in (?)', [slugs]);
    const ids = (drivers as { id: number }[]).map((d) => d.id);
    const [sets] = await pool.query('select * from measurement_sets where driver_id in (?) and status = ? order by id', [ids, 'approved']);
    const setIds = (sets as { id: number; driver_id: number }[]).filter((s, i, all) => all.findIndex((x) => x.driver_id === s.driver_id) === i).map((s) => s.id);
    const [params] = await pool.query('select * from parameters where set_id in (?)', [setIds]);
    const [curves] = await pool.query("select set_id, kind, angle_deg, drive_level_v, x_values, y_values, phase_values from curves where set_id in (?) and kind in ('spl','impedance','thd','h2','h3')", [setIds]);
    res.setHeader('content-type', 'application/json');
    res.end(JSON.stringify({ drivers, sets, params, curves }));
  });
  const barePort = await listen(bare);

  const query = `drivers=${slugs.join(',')}`;
  // Warm both paths once so neither pays a cold start inside the measurement.
  await fetch(`http://127.0.0.1:${appPort}/api/overlay?${query}`);
  await fetch(`http://127.0.0.1:${barePort}/`);
  console.log(`overlay benchmark: ${count} drivers in the catalogue, 4 three-inch mid-ranges, 20 connections, 10 s each`);
  const bareResult = await load(`http://127.0.0.1:${barePort}/`);
  const appResult = await load(`http://127.0.0.1:${appPort}/api/overlay?${query}`);
  const row = (name: string, r: Awaited<ReturnType<typeof load>>) =>
    console.log(`${name.padEnd(22)} ${r.rps.toFixed(0).padStart(7)} req/s   p50 ${String(r.p50).padStart(4)} ms   p99 ${String(r.p99).padStart(4)} ms   errors ${r.errors}`);
  row('bare mysql2 + http', bareResult);
  row('GET /api/overlay', appResult);
  console.log(`throughput ratio ${(appResult.rps / bareResult.rps).toFixed(2)} (target at least 0.8); p99 target under 50 ms`);
  appServer.close();
  bare.close();
  await pool.end();
  await db.destroy();
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
