import { columnLimits } from '../../shared/schemas/column-limits';
import { fieldsOf, newDriver, submitWith, uploadAs } from '../support/submit';
import { createTestDb, removePrefixed, testDbSettings } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-collim';

describe('string column limits', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let reviewer = '';

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

  it('match the live schema, every string column included', async () => {
    const rows: { table: string; column: string; max: number }[] = await db('information_schema.COLUMNS')
      .where({ TABLE_SCHEMA: testDbSettings().database })
      .whereIn('DATA_TYPE', ['varchar', 'char'])
      .whereNot('TABLE_NAME', 'like', 'knex\\_%')
      .select('TABLE_NAME as table', 'COLUMN_NAME as column', 'CHARACTER_MAXIMUM_LENGTH as max');
    expect(rows.length).toBeGreaterThan(30);
    const live = Object.fromEntries(rows.map((r) => [`${r.table}.${r.column}`, Number(r.max)]));
    const defined = Object.fromEntries(Object.entries(columnLimits).flatMap(([table, cols]) => Object.entries(cols).map(([column, max]) => [`${table}.${column}`, max])));
    expect(defined).toEqual(live);
  });

  it('refuses a model or maker name longer than its column with a 400 naming the field', async () => {
    const longModel = await submitWith(server.url, reviewer, newDriver(`${P} Works`, 'M'.repeat(columnLimits.drivers.model + 1)));
    expect(longModel.status).toBe(400);
    expect(await fieldsOf(longModel)).toEqual(['driver.model']);
    const longMaker = await submitWith(server.url, reviewer, newDriver(`${P} ${'Works '.repeat(40)}`, 'LM-1'));
    expect(longMaker.status).toBe(400);
    expect(await fieldsOf(longMaker)).toEqual(['driver.makerName']);
    expect(await db('makers').where('slug', 'like', `${P}%`).count({ n: '*' }).first()).toEqual({ n: 0 });
  });

  it('takes maker and model names of exactly the column length, their slugs cut to fit', async () => {
    const name = `${P} ${'k'.repeat(columnLimits.makers.name - P.length - 1)}`;
    const model = `FL-1 ${'Long Model '.repeat(20)}`.slice(0, columnLimits.drivers.model);
    const res = await submitWith(server.url, reviewer, newDriver(name, model));
    expect(res.status).toBe(201);
    const { driverSlug } = await res.json();
    const maker = await db('makers').where({ name }).first('slug');
    expect(maker.slug.length).toBeLessThanOrEqual(columnLimits.makers.slug);
    expect(driverSlug.length).toBeLessThanOrEqual(columnLimits.drivers.slug);
    expect(driverSlug.startsWith(maker.slug)).toBe(true);
  });

  it('refuses a 300-character file name with a 400 naming the file, and stages nothing', async () => {
    const name = `${'long-sweep-name-'.repeat(19)}0deg.txt`.slice(-300);
    expect(name).toHaveLength(300);
    const before = await db('upload_files').count({ n: '*' }).first();
    const res = await uploadAs(server.url, reviewer, name);
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.details.fields).toEqual([{ field: 'files.0', message: expect.stringContaining(`longer than ${columnLimits.upload_files.file_name} characters`) }]);
    expect(body.error.details.fields[0].message).toContain(name.slice(0, 40));
    expect(await db('upload_files').count({ n: '*' }).first()).toEqual(before);
  });

  it('refuses a saved comparison title over its column, naming it', async () => {
    const res = await fetch(`${server.url}/api/overlays`, {
      method: 'POST',
      body: JSON.stringify({ title: 'T'.repeat(columnLimits.saved_overlays.title + 1), entries: [{ slug: 'any-driver' }] }),
      headers: { cookie: reviewer, origin: server.url, 'content-type': 'application/json' },
    });
    expect(res.status).toBe(400);
    expect(await fieldsOf(res)).toEqual(['title']);
  });

  it('signs in an account whose provider display name is over the column, cut to fit', async () => {
    // A display name of 150 characters with a non-Latin tail: cut by characters, as MariaDB counts them.
    const name = `Invented Person ${'Longname '.repeat(12)}音響工房測定者`.slice(0, 150);
    expect(name.length).toBeGreaterThan(columnLimits.users.display_name);
    const longEmail = `${'x'.repeat(columnLimits.users.email)}@example.invalid`;
    const { cookie, location } = await signIn(server.url, `${P}-longname`, '/account', { name, email: longEmail });
    expect(location).toBe('/account');
    const me = await (await fetch(`${server.url}/api/me`, { headers: { cookie } })).json();
    expect(me.displayName).toBe(name.slice(0, columnLimits.users.display_name));
    // A cut address would be somebody else's, so an over-long one is not kept.
    expect(me.email).toBeNull();
  });
});
