// The server killed with SIGKILL in the middle of a submission and of a role change. A lock held
// by the test stops the transaction after its first write, so the kill lands while rows are
// written but not committed; afterwards the database must hold all of the change or none of it.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Knex } from 'knex';
import { createConnection, type Connection } from 'mysql2/promise';
import { createDb } from '../../db/connection';
import { signIn } from '../support/sign-in';
import { startApp, type AppProcess } from './support/app-process';
import { faultDbSettings, sleep } from './support/fault-db';
import { recordFigure } from './support/figures';

jest.setTimeout(60_000);

const MODEL = 'Crash Test C-1';
const ANGLES = [0, 10, 20, 30, 40, 50, 60, 70];

describe('a server killed mid-write leaves nothing half-written', () => {
  let app: AppProcess;
  let db: Knex;
  let locker: Connection;
  let watcher: Connection;
  let reviewer = '';
  let admin = '';

  const as = (cookie: string, method: string, path: string, body?: unknown) =>
    fetch(`${app.url}${path}`, { method, headers: { 'content-type': 'application/json', origin: app.url, cookie }, body: body === undefined ? undefined : JSON.stringify(body) });

  /** Polls a dirty read until `seen` holds; READ UNCOMMITTED shows what an open transaction wrote. */
  async function until(seen: () => Promise<boolean>, what: string, limitMs = 10_000): Promise<void> {
    const started = Date.now();
    while (!(await seen())) {
      if (Date.now() - started > limitMs) throw new Error(`${what}: not seen within ${limitMs} ms`);
      await sleep(5);
    }
  }
  const dirty = async (sql: string, params: unknown[]) => {
    const [rows] = await watcher.query(sql, params);
    return rows as Record<string, unknown>[];
  };

  /**
   * Kills the server while new rows of `table` are blocked (a gap lock past its last id), so the
   * request waits inside its transaction after its first write.
   */
  async function killMidTransaction(table: 'curves' | 'role_audit', send: () => Promise<Response>, started: () => Promise<boolean>): Promise<number> {
    await locker.query('BEGIN');
    const [[{ last }]] = (await locker.query(`SELECT COALESCE(MAX(id), 0) AS last FROM ${table}`)) as unknown as [[{ last: number }]];
    await locker.query(`SELECT id FROM ${table} WHERE id > ? FOR UPDATE`, [last]);
    const inFlight = send().catch(() => 'connection dropped');
    let waitedMs: number;
    try {
      const t0 = Date.now();
      await until(started, 'the first write of the transaction');
      waitedMs = Date.now() - t0;
      await app.kill('SIGKILL');
    } finally {
      await locker.query('ROLLBACK');
    }
    expect(await inFlight).toBe('connection dropped');
    return waitedMs;
  }

  beforeAll(async () => {
    db = createDb(faultDbSettings());
    const s = faultDbSettings();
    locker = await createConnection({ ...s });
    watcher = await createConnection({ ...s });
    await watcher.query('SET SESSION TRANSACTION ISOLATION LEVEL READ UNCOMMITTED');
    app = await startApp();
    reviewer = (await signIn(app.url, 'fault-reviewer')).cookie;
    await db('users').where({ login: 'fault-reviewer' }).update({ role: 'reviewer' });
    admin = (await signIn(app.url, 'fault-admin')).cookie;
    await signIn(app.url, 'fault-crash-target');
    const driver = await db('drivers').where({ model: MODEL }).first('id');
    if (driver) await db('drivers').where({ id: driver.id }).delete();
  });
  afterAll(async () => {
    await app?.kill();
    await locker?.end();
    await watcher?.end();
    await db?.destroy();
  });

  it('keeps a submission whole or absent when the server dies during it', async () => {
    const file = readFileSync(join(__dirname, '..', 'fixtures', 'uploads', 'spl-0deg-tab.txt'));
    const form = new FormData();
    for (const a of ANGLES) form.append('files', new Blob([file]), `spl-${a}deg.txt`);
    form.append('meta', JSON.stringify(ANGLES.map((angleDeg) => ({ kind: 'spl', angleDeg }))));
    const parsed = await fetch(`${app.url}/api/uploads/parse`, { method: 'POST', body: form, headers: { origin: app.url, cookie: reviewer } });
    expect(parsed.status).toBe(200);
    const uploads = (await parsed.json()).files.map((f: { token: string }) => f.token);
    expect(uploads).toHaveLength(ANGLES.length);
    const body = { driver: { makerName: 'Crash Test Works', model: MODEL, type: 'mid-range', nominalSizeIn: 4, nominalImpedanceOhm: 8 }, method: { driveVoltageV: 2.83, distanceM: 1, baffle: 'crash baffle' }, uploads };

    const waited = await killMidTransaction(
      'curves',
      () => as(reviewer, 'POST', '/api/submissions', body),
      async () => (await dirty('select id from drivers where model = ?', [MODEL])).length === 1,
    );
    // The orphaned transaction ends when MariaDB sees its client gone.
    await until(async () => (await dirty('select id from drivers where model = ?', [MODEL])).length === 0, 'the rollback');
    expect(await db('drivers').where({ model: MODEL }).count({ n: '*' })).toEqual([{ n: 0 }]);
    const staged = await db('upload_files').whereIn('token', uploads).select('set_id');
    expect(staged.map((u: { set_id: number | null }) => u.set_id)).toEqual(uploads.map(() => null));

    // After a restart the same submission goes through, whole.
    app = await startApp();
    const again = await as(reviewer, 'POST', '/api/submissions', body);
    expect(again.status).toBe(201);
    const { setId } = await again.json();
    expect(await db('curves').where({ set_id: setId }).count({ n: '*' })).toEqual([{ n: ANGLES.length }]);
    expect(await db('upload_files').where({ set_id: setId }).count({ n: '*' })).toEqual([{ n: ANGLES.length }]);
    recordFigure('SIGKILL during a submission', `killed ${waited} ms after its first uncommitted write; 0 rows kept, all ${ANGLES.length} curves after resubmitting`);
  });

  it('keeps a role and its audit entry in agreement when the server dies during the change', async () => {
    const target = await db('users').where({ login: 'fault-crash-target' }).first('id', 'role');
    const auditBefore = await db('role_audit').where({ target_id: target.id }).count({ n: '*' });
    const next = target.role === 'reviewer' ? 'member' : 'reviewer';

    const waited = await killMidTransaction(
      'role_audit',
      () => as(admin, 'PATCH', `/api/admin/users/${target.id}/role`, { role: next, reason: 'crash test' }),
      async () => (await dirty('select role from users where id = ?', [target.id]))[0]?.role === next,
    );
    await until(async () => (await dirty('select role from users where id = ?', [target.id]))[0]?.role === target.role, 'the rollback');
    expect((await db('users').where({ id: target.id }).first('role')).role).toBe(target.role);
    expect(await db('role_audit').where({ target_id: target.id }).count({ n: '*' })).toEqual(auditBefore);

    app = await startApp();
    const again = await as(admin, 'PATCH', `/api/admin/users/${target.id}/role`, { role: next, reason: 'crash test' });
    expect(again.status).toBe(200);
    const last = await db('role_audit').where({ target_id: target.id }).orderBy('id', 'desc').first('old_role', 'new_role');
    expect(last).toEqual({ old_role: target.role, new_role: next });
    expect((await db('users').where({ id: target.id }).first('role')).role).toBe(next);
    recordFigure('SIGKILL during a role change', `killed ${waited} ms after the uncommitted role write; role and audit unchanged, then both changed on retry`);
  });
});
