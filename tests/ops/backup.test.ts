// `npm run backup` and `npm run restore` on a scratch database of the test instance, filled by the
// demo setup plus rows a dump could get wrong: every byte value in a blob, and non-Latin text.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Knex } from 'knex';
import { createDb } from '../../db/connection';
import { testDbSettings } from '../support/test-db';

const root = join(__dirname, '..', '..');
const settings = { ...testDbSettings(), database: 'conestack_backup_test' };
// The test instance's data folder under .data/ (npm test starts `mariadb-test`).
const instance = process.env.TEST_DB_INSTANCE ?? 'mariadb-test';
const cnf = join(root, '.data', instance, 'my.cnf');
const backupDir = mkdtempSync(join(tmpdir(), 'conestack-backup-'));
const env = {
  ...process.env,
  CONESTACK_DB_INSTANCE: instance,
  DB_PORT: String(settings.port),
  DB_NAME: settings.database,
  BACKUP_DIR: backupDir,
};

jest.setTimeout(180_000);

const asRoot = (sql: string) => execFileSync('mariadb', [`--defaults-file=${cnf}`, '--user=root', '-e', sql], { encoding: 'utf8' });

type Snapshot = Record<string, { rows: number; checksum: string }>;

async function snapshot(db: Knex): Promise<Snapshot> {
  const tables: { name: string }[] = await db('information_schema.tables').where('table_schema', settings.database).select('table_name as name').orderBy('table_name');
  const out: Snapshot = {};
  for (const { name } of tables) {
    const [{ n }] = await db(name).count({ n: '*' });
    const [[sum]] = await db.raw('CHECKSUM TABLE ??', [name]);
    out[name] = { rows: Number(n), checksum: String(sum.Checksum) };
  }
  return out;
}

function run(script: string, args: string[] = []): string {
  const r = spawnSync('node', [script, ...args], { cwd: root, env, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`${script} exited ${r.status}: ${r.stdout}${r.stderr}`);
  return r.stdout;
}

let db: Knex;

beforeAll(() => {
  asRoot(
    `DROP DATABASE IF EXISTS ${settings.database}; CREATE DATABASE ${settings.database} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci; GRANT ALL PRIVILEGES ON ${settings.database}.* TO '${settings.user}'@'127.0.0.1';`,
  );
  execFileSync('node', ['--import', 'tsx', 'db/setup.ts', '--demo'], { cwd: root, env, stdio: 'ignore' });
  db = createDb(settings);
});

afterAll(async () => {
  await db?.destroy();
  asRoot(`DROP DATABASE IF EXISTS ${settings.database}`);
  rmSync(backupDir, { recursive: true, force: true });
});

describe('npm run backup / npm run restore', () => {
  it('brings back every table with the same row count and CHECKSUM TABLE after the database was emptied', async () => {
    const [userId] = await db('users').insert({ provider: 'test', provider_id: 'backup-1', login: 'backup-user', display_name: 'Ёлка 試験 ✓', role: 'reviewer' });
    await db('upload_files').insert({
      token: 'backup-test-token',
      uploaded_by: userId,
      file_name: 'измерение-周波数.txt',
      kind: 'spl',
      bytes: Buffer.from(Array.from({ length: 256 }, (_, i) => i)),
      parse_settings: JSON.stringify({ options: {} }),
    });
    const before = await snapshot(db);
    expect(Object.keys(before).length).toBeGreaterThan(10);
    expect(before.drivers.rows).toBeGreaterThan(0);

    const file = run('scripts/backup.mjs').trim();
    expect(file.startsWith(backupDir)).toBe(true);
    expect(file).toMatch(/conestack_backup_test-\d{8}-\d{6}\.sql\.gz$/);
    expect(existsSync(file)).toBe(true);

    asRoot(`SET FOREIGN_KEY_CHECKS = 0; DROP TABLE ${Object.keys(before).map((t) => `${settings.database}.${t}`).join(', ')};`);
    expect(await snapshot(db)).toEqual({});

    run('scripts/restore.mjs', [file]);
    expect(await snapshot(db)).toEqual(before);
    const restored = await db('upload_files').where('token', 'backup-test-token').first();
    expect(Buffer.from(restored.bytes)).toEqual(Buffer.from(Array.from({ length: 256 }, (_, i) => i)));
    expect(restored.file_name).toBe('измерение-周波数.txt');
  });

  it('refuses an instance that is not running, naming what to do', () => {
    const r = spawnSync('node', ['scripts/backup.mjs'], { cwd: root, env: { ...env, CONESTACK_DB_INSTANCE: 'mariadb-not-there' }, encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/not running; start it with `npm start`/);
  });
});
