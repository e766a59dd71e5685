import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseMeasurementFile } from '../../shared/uploads';
import { createTestDb, removePrefixed } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-subm';
const fixtures = join(__dirname, '..', 'fixtures', 'uploads');

describe('reviewer submissions', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let reviewer = '';
  let member = '';
  let moderator = '';
  let landedSetId = 0;

  const cleanup = () => removePrefixed(db, P);

  beforeAll(async () => {
    await cleanup();
    server = await startTestServer(db);
    reviewer = (await signIn(server.url, `${P}-reviewer`)).cookie;
    member = (await signIn(server.url, `${P}-member`)).cookie;
    moderator = (await signIn(server.url, `${P}-moderator`)).cookie;
    await db('users').where({ login: `${P}-reviewer` }).update({ role: 'reviewer' });
    await db('users').where({ login: `${P}-moderator` }).update({ role: 'moderator' });
  });
  afterAll(async () => {
    await server.close();
    await cleanup();
    await db.destroy();
  });

  const upload = (cookie: string, files: { name: string; meta: Record<string, unknown> }[]) => {
    const form = new FormData();
    for (const f of files) form.append('files', new Blob([readFileSync(join(fixtures, f.name))]), f.name);
    form.append('meta', JSON.stringify(files.map((f) => f.meta)));
    return fetch(`${server.url}/api/uploads/parse`, { method: 'POST', body: form, headers: { cookie, origin: server.url } });
  };
  const submit = (body: unknown) =>
    fetch(`${server.url}/api/submissions`, { method: 'POST', body: JSON.stringify(body), headers: { cookie: reviewer, origin: server.url, 'content-type': 'application/json' } });
  // Other API suites run alongside this one and write to the same tables, so the counts cover only
  // rows this suite could have written: makers under its prefix and everything hanging off them.
  const counts = async (tokens: string[]) => {
    const makerIds = (await db('makers').where('slug', 'like', `${P}%`).select('id')).map((m: { id: number }) => m.id);
    const driverIds = (await db('drivers').whereIn('maker_id', makerIds).select('id')).map((d: { id: number }) => d.id);
    const setIds = (await db('measurement_sets').whereIn('driver_id', driverIds).select('id')).map((s: { id: number }) => s.id);
    const curves = Number((await db('curves').whereIn('set_id', setIds).count({ n: '*' }).first())?.n);
    const attached = Number((await db('upload_files').whereIn('token', tokens).whereNotNull('set_id').count({ n: '*' }).first())?.n);
    return { makers: makerIds.length, drivers: driverIds.length, sets: setIds.length, curves, attached };
  };
  const method = { driveVoltageV: 5.66, distanceM: 0.5, baffle: 'test baffle 600 x 400 mm', temperatureC: 21, sampleId: 'S1', burnIn: 'out-of-box' };

  it('only reviewers may upload', async () => {
    const res = await upload(member, [{ name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } }]);
    expect(res.status).toBe(403);
  });

  it('refuses a file over the size limit, naming it, and stages nothing from that request', async () => {
    const form = new FormData();
    form.append('files', new Blob([readFileSync(join(fixtures, 'spl-0deg-tab.txt'))]), 'small.txt');
    form.append('files', new Blob([new Uint8Array(5 * 1024 * 1024 + 1).fill(0x31)]), 'huge-sweep.txt');
    form.append('meta', JSON.stringify([{ kind: 'spl', angleDeg: 0 }, { kind: 'spl', angleDeg: 30 }]));
    const before = Number((await db('upload_files').whereIn('uploaded_by', db('users').select('id').where({ login: `${P}-reviewer` })).count({ n: '*' }).first())?.n);
    const res = await fetch(`${server.url}/api/uploads/parse`, { method: 'POST', body: form, headers: { cookie: reviewer, origin: server.url } });
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toBe('"huge-sweep.txt" is over the 5 MB limit');
    const after = Number((await db('upload_files').whereIn('uploaded_by', db('users').select('id').where({ login: `${P}-reviewer` })).count({ n: '*' }).first())?.n);
    expect(after).toBe(before);
  });

  it('parses each file on its own and names the line of a broken one', async () => {
    const res = await upload(reviewer, [
      { name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } },
      { name: 'broken-line-212.txt', meta: { kind: 'spl', angleDeg: 0 } },
    ]);
    expect(res.status).toBe(200);
    const { files } = await res.json();
    expect(files[0]).toMatchObject({ ok: true, fileName: 'spl-0deg-tab.txt' });
    expect(files[0].token).toMatch(/^[a-f0-9]{32}$/);
    expect(files[1]).toMatchObject({ ok: false, error: { file: 'broken-line-212.txt', line: 212 } });
  });

  it('lands a submission whole, referred to 2.83 V / 1 m, pending, with the original kept', async () => {
    const res = await upload(reviewer, [{ name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } }, { name: 'impedance-3col-header.csv', meta: { kind: 'impedance' } }]);
    const { files } = await res.json();
    const sub = await submit({ driver: { makerName: `${P} Works`, model: 'Test 80', type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4 }, method, uploads: files.map((f: { token: string }) => f.token), parameters: [{ name: 'fs', value: 101 }] });
    expect(sub.status).toBe(201);
    const { setId } = await sub.json();
    landedSetId = setId;
    const set = await db('measurement_sets').where({ id: setId }).first();
    expect(set.status).toBe('pending');
    const spl = await db('curves').where({ set_id: setId, kind: 'spl' }).first();
    const x: number[] = typeof spl.x_values === 'string' ? JSON.parse(spl.x_values) : spl.x_values;
    const y: number[] = typeof spl.y_values === 'string' ? JSON.parse(spl.y_values) : spl.y_values;
    // From 5.66 V at 0.5 m to 2.83 V at 1 m: 20·log10(2.83/5.66) + 20·log10(0.5) = −12.04 dB
    // (voltage ratio in dB and inverse-distance law; common practice, no source).
    const original = parseMeasurementFile({ name: 'spl', bytes: readFileSync(join(fixtures, 'spl-0deg-tab.txt')), kind: 'spl' });
    if (!original.ok) throw new Error('fixture must parse');
    const i = original.points.x.findIndex((f) => f >= 1000);
    const at = x.findIndex((f) => Math.abs(f - original.points.x[i]) / f < 1e-3);
    if (at >= 0) expect(y[at]).toBeCloseTo(original.points.y[i] + 20 * Math.log10(2.83 / 5.66) + 20 * Math.log10(0.5), 2);
    expect(x.length).toBeGreaterThan(10);
    const stored = await db('upload_files').where({ set_id: setId }).select('file_name', 'bytes');
    expect(stored.map((r: { file_name: string }) => r.file_name).sort()).toEqual(['impedance-3col-header.csv', 'spl-0deg-tab.txt']);
    expect(Buffer.from(stored.find((r: { file_name: string }) => r.file_name === 'spl-0deg-tab.txt').bytes).equals(readFileSync(join(fixtures, 'spl-0deg-tab.txt')))).toBe(true);
    const mine = await (await fetch(`${server.url}/api/submissions/mine`, { headers: { cookie: reviewer } })).json();
    expect(mine.submissions[0]).toMatchObject({ id: setId, status: 'pending', model: 'Test 80', makerName: `${P} Works`, curveCount: 2 });
    // Pending work is not in the public catalogue until a moderator approves it.
    const search = await (await fetch(`${server.url}/api/drivers?q=${encodeURIComponent(`${P} Works Test 80`)}`)).json();
    expect(search.items.map((d: { model: string }) => d.model)).not.toContain('Test 80');
  });

  it('lets a moderator read a set’s kept originals again and get the same curves back', async () => {
    const renormalise = (id: number, cookie: string) => fetch(`${server.url}/api/submissions/${id}/renormalise`, { method: 'POST', headers: { cookie, origin: server.url } });
    const curvesOf = async () => (await db('curves').where({ set_id: landedSetId }).orderBy('kind').select('kind', 'x_values', 'y_values', 'phase_values'))
      .map((c: Record<string, unknown>) => ({ ...c, x_values: String(c.x_values), y_values: String(c.y_values), phase_values: c.phase_values === null ? null : String(c.phase_values) }));
    const before = await curvesOf();
    await db('curves').where({ set_id: landedSetId, kind: 'spl' }).update({ y_values: JSON.stringify([0]) });
    expect((await renormalise(landedSetId, reviewer)).status).toBe(403);
    const res = await renormalise(landedSetId, moderator);
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ setId: landedSetId, curves: 2, normalisation: { reference: '2.83 V / 1 m' } });
    expect(await curvesOf()).toEqual(before);
    expect((await renormalise(2_000_000_000, moderator)).status).toBe(404);
    // A set loaded by the demo seed has no originals to read.
    const demoSet = await db('measurement_sets').whereNull('submitted_by').first('id');
    const none = await renormalise(demoSet.id, moderator);
    expect(none.status).toBe(409);
    expect((await none.json()).error.message).toMatch(/no kept originals/);
  });

  it('leaves no rows behind when a submission fails part-way', async () => {
    const res = await upload(reviewer, [{ name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } }, { name: 'thd-db-relative.txt', meta: { kind: 'thd', driveLevelV: 2.83 } }]);
    const { files } = await res.json();
    // Damage the second stored original: it fails when re-read, after the maker, driver, set and
    // first curve have been written inside the transaction.
    await db('upload_files').where({ token: files[1].token }).update({ bytes: Buffer.from('frequency,thd\nnot,a number\n') });
    const tokens = files.map((f: { token: string }) => f.token);
    const before = await counts(tokens);
    const sub = await submit({ driver: { makerName: `${P} Brand New Maker`, model: 'Never 1', type: 'tweeter', nominalSizeIn: 1, nominalImpedanceOhm: 6 }, method, uploads: files.map((f: { token: string }) => f.token) });
    expect(sub.status).toBe(400);
    expect((await sub.json()).error.details.fields[0].field).toBe('uploads.1');
    expect(await counts(tokens)).toEqual(before);
    expect(before.attached).toBe(0);
    expect(await db('makers').where({ slug: `${P.toLowerCase()}-brand-new-maker` }).first()).toBeUndefined();
  });

  it('drops the reviewer’s staged files left unsubmitted for a day when they upload again', async () => {
    const first = await (await upload(reviewer, [{ name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } }])).json();
    const old = first.files[0].token;
    await db('upload_files').where({ token: old }).update({ created_at: db.raw('NOW() - INTERVAL 25 HOUR') });
    const second = await (await upload(reviewer, [{ name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } }])).json();
    expect(await db('upload_files').where({ token: old }).first()).toBeUndefined();
    expect(await db('upload_files').where({ token: second.files[0].token }).first()).toBeDefined();
    const sub = await submit({ driver: { makerName: `${P} Works`, model: 'Test 81', type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4 }, method, uploads: [old] });
    expect(sub.status).toBe(400);
    expect((await sub.json()).error.details.fields).toEqual([{ field: 'uploads.0', message: 'unknown upload' }]);
  });

  it('refuses two uploads of the same curve, naming the second', async () => {
    const res = await upload(reviewer, [{ name: 'spl-0deg-tab.txt', meta: { kind: 'spl', angleDeg: 0 } }, { name: 'spl-30deg-semicolon-decimal-comma.csv', meta: { kind: 'spl', angleDeg: 0 } }]);
    const { files } = await res.json();
    const sub = await submit({ driver: { makerName: `${P} Works`, model: 'Test 82', type: 'mid-range', nominalSizeIn: 3, nominalImpedanceOhm: 4 }, method, uploads: files.map((f: { token: string }) => f.token) });
    expect(sub.status).toBe(400);
    expect((await sub.json()).error.details.fields).toEqual([{ field: 'uploads.1', message: 'spl-30deg-semicolon-decimal-comma.csv: the same curve as uploads.0' }]);
    expect(await db('drivers').where({ model: 'Test 82' }).first()).toBeUndefined();
  });

  it('rejects a bad submission body naming each field', async () => {
    const sub = await submit({ driver: { slug: 'Not A Slug' }, method: { ...method, distanceM: -1 }, uploads: [] });
    expect(sub.status).toBe(400);
    const fields = (await sub.json()).error.details.fields.map((f: { field: string }) => f.field);
    expect(fields).toEqual(expect.arrayContaining(['method.distanceM', 'uploads']));
  });
});
