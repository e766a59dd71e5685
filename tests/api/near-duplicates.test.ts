import { createTestDb, removePrefixed } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-neardup';

describe('near-duplicate check for new driver entries', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let reviewer = '';
  let member = '';
  let moderator = '';
  let pendingId = 0;

  const cleanup = () => removePrefixed(db, P);

  beforeAll(async () => {
    await cleanup();
    // A driver with no approved set, as a submission leaves it before moderation.
    const [makerId] = await db('makers').insert({ slug: `${P}-maker`, name: 'Neardup Pending Works' });
    [pendingId] = await db('drivers').insert({ slug: `${P}-nd-77-pending`, maker_id: makerId, model: 'ND-77 Pending', type: 'tweeter', nominal_size_in: 1, nominal_impedance_ohm: 6 });
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

  const check = (query: Record<string, string>, cookie?: string) =>
    fetch(`${server.url}/api/submissions/near-duplicates?${new URLSearchParams(query)}`, { headers: cookie ? { cookie } : {} });

  it('needs a signed-in reviewer', async () => {
    const query = { makerName: 'Anyone', model: 'X-1' };
    expect((await check(query)).status).toBe(401);
    expect((await check(query, member)).status).toBe(403);
  });

  it('finds a listed driver from its maker and a mangled model code, as strong', async () => {
    // Any demo row; other suites' fixture makers come and go while this runs, so skip them.
    const row = await db('drivers as d').join('makers as m', 'm.id', 'd.maker_id').whereNot('d.slug', 'like', 'apitest%').whereNull('d.canonical_id').orderBy('d.id')
      .first('d.id', 'd.slug', 'd.model', 'm.name as makerName');
    expect(row).toBeDefined();
    const mangled = row.model.replace(/[\s-]+/g, '').toUpperCase();
    expect(mangled).not.toBe(row.model);
    const res = await check({ makerName: row.makerName, model: mangled }, reviewer);
    expect(res.status).toBe(200);
    const { candidates } = await res.json();
    const hit = candidates.find((c: { id: number }) => c.id === row.id);
    expect(hit).toMatchObject({ slug: row.slug, model: row.model, makerName: row.makerName, status: 'listed', strength: 'strong' });
    expect(hit.reasons).toEqual(['same model code once spaces, dashes and case are ignored', 'same maker']);
    expect(Array.isArray(hit.aliases)).toBe(true);
    expect(candidates[0].strength).toBe('strong');
  });

  it('returns a driver without an approved set as pending to a moderator, and to no other reviewer', async () => {
    const query = { makerName: 'neardup pending works', model: 'nd77pending' };
    const res = await check(query, moderator);
    expect(res.status).toBe(200);
    const { candidates } = await res.json();
    expect(candidates.find((c: { id: number }) => c.id === pendingId)).toMatchObject({ status: 'pending', strength: 'strong' });
    const other = await (await check(query, reviewer)).json();
    expect(other.candidates.map((c: { id: number }) => c.id)).not.toContain(pendingId);
  });

  it('finds nothing for an unrelated name', async () => {
    const res = await check({ makerName: 'Zzqx Nothing', model: 'QQ-000' }, reviewer);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ candidates: [] });
  });

  it('names the missing or empty field', async () => {
    const missing = await check({ makerName: 'Zzqx Nothing' }, reviewer);
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.details.fields.map((f: { field: string }) => f.field)).toEqual(['model']);
    const blank = await check({ makerName: '  ', model: 'QQ-000' }, reviewer);
    expect(blank.status).toBe(400);
    expect((await blank.json()).error.details.fields.map((f: { field: string }) => f.field)).toEqual(['makerName']);
  });
});
