import { request as httpRequest } from 'node:http';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { logFrequencyGrid } from '../../shared/acoustics/curves';
import { PREVIEW_MAX_POINTS, UPLOAD_LIMITS } from '../../shared/uploads';
import { createTestDb, removePrefixed } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-upl';
const fixtures = join(__dirname, '..', 'fixtures', 'uploads');
const MB = 1024 * 1024;

/** A dense SPL sweep, `lines` points from 20 Hz to 20 kHz, as a tab-separated text export. */
function denseSweep(lines: number): string {
  const rows = ['Freq\tSPL'];
  for (let i = 0; i < lines; i++) {
    const f = 20 * Math.pow(1000, i / (lines - 1));
    rows.push(`${f.toFixed(4)}\t${(85 + Math.sin(i / 50)).toFixed(4)}`);
  }
  return `${rows.join('\n')}\n`;
}

describe('POST /api/uploads/parse limits, previews and names', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let reviewer = '';

  const staged = async () => Number((await db('upload_files').whereIn('uploaded_by', db('users').select('id').where({ login: `${P}-reviewer` })).count({ n: '*' }).first())?.n);
  const send = (form: FormData) => fetch(`${server.url}/api/uploads/parse`, { method: 'POST', body: form, headers: { cookie: reviewer, origin: server.url } });

  beforeAll(async () => {
    await removePrefixed(db, P);
    server = await startTestServer(db);
    reviewer = (await signIn(server.url, `${P}-reviewer`)).cookie;
    await db('users').where({ login: `${P}-reviewer` }).update({ role: 'reviewer' });
  });
  afterAll(async () => {
    await server.close();
    await removePrefixed(db, P);
    await db.destroy();
  });

  it('refuses a request whose files add up to more than 20 MB with a 413 naming the limits, staging nothing', async () => {
    expect(UPLOAD_LIMITS.requestBytes).toBe(20 * MB);
    const form = new FormData();
    // Each file is under the 5 MB a file may have; together they are 22.5 MB.
    const part = new Uint8Array(4.5 * MB).fill(0x31);
    for (let i = 0; i < 5; i++) form.append('files', new Blob([part]), `sweep-${i}.txt`);
    form.append('meta', JSON.stringify(Array.from({ length: 5 }, () => ({ kind: 'spl', angleDeg: 0 }))));
    const before = await staged();
    const res = await send(form);
    expect(res.status).toBe(413);
    const body = await res.json();
    expect(body.error.code).toBe('payload_too_large');
    expect(body.error.message).toMatch(/at most 20 MB of files, 40 files and 5 MB each/);
    expect(body.error.details.limits).toEqual(UPLOAD_LIMITS);
    expect(await staged()).toBe(before);
  });

  it('also stops a request sent without a length once its files pass 20 MB', async () => {
    const boundary = 'conestack-test-boundary';
    const url = new URL(`${server.url}/api/uploads/parse`);
    const status = await new Promise<{ status: number; body: string }>((resolve, reject) => {
      const req = httpRequest(
        { host: url.hostname, port: url.port, path: url.pathname, method: 'POST', headers: { cookie: reviewer, origin: server.url, 'content-type': `multipart/form-data; boundary=${boundary}`, 'transfer-encoding': 'chunked' } },
        (res) => {
          let text = '';
          res.on('data', (d) => (text += d));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text }));
        },
      );
      req.on('error', reject);
      req.write(`--${boundary}\r\ncontent-disposition: form-data; name="meta"\r\n\r\n${JSON.stringify(Array.from({ length: 6 }, () => ({ kind: 'spl', angleDeg: 0 })))}\r\n`);
      const chunk = Buffer.alloc(MB, 0x31);
      for (let i = 0; i < 6; i++) {
        req.write(`--${boundary}\r\ncontent-disposition: form-data; name="files"; filename="part-${i}.txt"\r\ncontent-type: text/plain\r\n\r\n`);
        for (let k = 0; k < 4; k++) req.write(chunk);
        req.write('\r\n');
      }
      req.end(`--${boundary}--\r\n`);
    });
    expect(status.status).toBe(413);
    expect(JSON.parse(status.body).error.code).toBe('payload_too_large');
  });

  it('refuses more than 40 files in one request with the same 413', async () => {
    const form = new FormData();
    for (let i = 0; i < UPLOAD_LIMITS.files + 1; i++) form.append('files', new Blob(['f spl\n']), `f-${i}.txt`);
    form.append('meta', JSON.stringify([]));
    const res = await send(form);
    expect(res.status).toBe(413);
    expect((await res.json()).error.code).toBe('payload_too_large');
  });

  it('answers a dense sweep with a preview on the common grid, not every point read', async () => {
    const lines = 60_000;
    const form = new FormData();
    form.append('files', new Blob([denseSweep(lines)]), 'dense-spl.txt');
    form.append('files', new Blob([readFileSync(join(fixtures, 'bl-x-mm.csv'))]), 'bl-x-mm.csv');
    form.append('meta', JSON.stringify([{ kind: 'spl', angleDeg: 0 }, { kind: 'bl_x' }]));
    const res = await send(form);
    expect(res.status).toBe(200);
    const [spl, bl] = (await res.json()).files;
    expect(spl).toMatchObject({ ok: true, pointCount: lines });
    expect(spl.summary).toMatch(/^60000 points, 20–20000 Hz, tab-separated/);
    expect(spl.points).toBeUndefined();
    // 1/48 octave from 10 Hz: the grid points inside 20 Hz–20 kHz, 6 significant figures.
    const grid = logFrequencyGrid().filter((f) => f >= 20 && f <= 20_000);
    expect(spl.preview.x).toHaveLength(grid.length);
    spl.preview.x.forEach((f: number, i: number) => expect(f / grid[i]).toBeCloseTo(1, 5));
    expect(spl.preview.y).toHaveLength(grid.length);
    // Large-signal curves stay on their own x points, no more than the preview bound (82 here).
    expect(bl.ok).toBe(true);
    expect(bl.preview.x.length).toBe(Math.min(bl.pointCount, PREVIEW_MAX_POINTS));
    expect(bl.preview.x[0]).toBeCloseTo(-0.008, 6);
  });

  it('reads file names sent as UTF-8 and gives the same name back and to the staged original', async () => {
    const name = 'измерение-周波数特性-0deg.txt';
    const form = new FormData();
    form.append('files', new Blob([readFileSync(join(fixtures, 'spl-0deg-tab.txt'))]), name);
    form.append('meta', JSON.stringify([{ kind: 'spl', angleDeg: 0 }]));
    const res = await send(form);
    expect(res.status).toBe(200);
    const [file] = (await res.json()).files;
    expect(file.fileName).toBe(name);
    expect((await db('upload_files').where({ token: file.token }).first()).file_name).toBe(name);
  });
});
