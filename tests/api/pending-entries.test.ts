import { fieldsOf, newDriver, submitWith } from '../support/submit';
import { insertFixtureCatalogue } from '../support/fixtures';
import { createTestDb, removePrefixed } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-pending';

describe('a pending driver stays with its submitter and the moderators', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  const cookies: Record<'submitter' | 'otherReviewer' | 'member' | 'moderator', string> = { submitter: '', otherReviewer: '', member: '', moderator: '' };
  let slug = '';
  let listedSlug = '';
  const MAKER = `${P} Hushwerk`;
  const MODEL = 'HW-55 Secret';

  beforeAll(async () => {
    await removePrefixed(db, P);
    // A listed driver to compare against, under the same prefix so it is cleaned up with the rest.
    listedSlug = (await insertFixtureCatalogue(db, `${P}-listed`, [{ model: 'Listed One', level: 85 }])).drivers[0].slug;
    server = await startTestServer(db);
    for (const who of Object.keys(cookies) as (keyof typeof cookies)[]) cookies[who] = (await signIn(server.url, `${P}-${who.toLowerCase()}`)).cookie;
    await db('users').whereIn('login', [`${P}-submitter`, `${P}-otherreviewer`]).update({ role: 'reviewer' });
    await db('users').where({ login: `${P}-moderator` }).update({ role: 'moderator' });
    const res = await submitWith(server.url, cookies.submitter, newDriver(MAKER, MODEL));
    expect(res.status).toBe(201);
    slug = (await res.json()).driverSlug;
  });
  afterAll(async () => {
    await server.close();
    await db('saved_overlays').where('title', 'like', `${P}%`).delete();
    await removePrefixed(db, P);
    await db.destroy();
  });

  const get = (path: string, cookie?: string) => fetch(`${server.url}${path}`, { headers: cookie ? { cookie } : {} });

  it('keeps the driver page from visitors, members and other reviewers, with the answer for an unknown slug', async () => {
    const unknown = await get(`/api/drivers/${slug}-nobody`);
    expect(unknown.status).toBe(404);
    const unknownMessage = (await unknown.json()).error.message.replace(`${slug}-nobody`, slug);
    for (const cookie of [undefined, cookies.member, cookies.otherReviewer]) {
      const res = await get(`/api/drivers/${slug}`, cookie);
      expect(res.status).toBe(404);
      const text = await res.text();
      expect(text).not.toContain(MODEL);
      expect(text).not.toContain(MAKER);
      expect(JSON.parse(text).error.message).toBe(unknownMessage);
    }
  });

  it('shows the driver page to its submitter and to a moderator, without unapproved measurements', async () => {
    for (const cookie of [cookies.submitter, cookies.moderator]) {
      const res = await get(`/api/drivers/${slug}`, cookie);
      expect(res.status).toBe(200);
      const body = await res.json();
      expect(body).toMatchObject({ slug, model: MODEL, maker: { name: MAKER } });
      expect(body.measurementSets).toEqual([]);
    }
  });

  it('keeps it out of search for everyone until approved', async () => {
    for (const cookie of [undefined, cookies.submitter, cookies.moderator]) {
      const res = await get(`/api/drivers?q=${encodeURIComponent('HW-55 Secret Hushwerk')}`, cookie);
      expect(res.status).toBe(200);
      expect((await res.json()).items.map((d: { slug: string }) => d.slug)).not.toContain(slug);
    }
  });

  it('lists it as a near duplicate only for its submitter and a moderator', async () => {
    const check = async (cookie: string) => {
      const res = await get(`/api/submissions/near-duplicates?${new URLSearchParams({ makerName: MAKER, model: 'hw55 secret' })}`, cookie);
      expect(res.status).toBe(200);
      return (await res.json()).candidates.map((c: { slug: string; status: string }) => `${c.slug}:${c.status}`);
    };
    expect(await check(cookies.otherReviewer)).not.toContain(`${slug}:pending`);
    expect(await check(cookies.submitter)).toContain(`${slug}:pending`);
    expect(await check(cookies.moderator)).toContain(`${slug}:pending`);
  });

  it('answers a comparison with it the same way as one with an unknown slug', async () => {
    const withPending = await get(`/api/overlay?drivers=${listedSlug},${slug}`, cookies.submitter);
    const withUnknown = await get(`/api/overlay?drivers=${listedSlug},${slug}-nobody`);
    expect(withPending.status).toBe(404);
    expect(withUnknown.status).toBe(404);
    const a = await withPending.json();
    const b = await withUnknown.json();
    expect(a.error.details).toEqual(b.error.details);
    expect(JSON.stringify(a)).not.toContain(MODEL);
  });

  it('keeps it out of saved comparison links, which anyone with the code can open', async () => {
    const save = (entries: { slug: string }[]) =>
      fetch(`${server.url}/api/overlays`, {
        method: 'POST',
        body: JSON.stringify({ title: `${P} link`, entries }),
        headers: { cookie: cookies.submitter, origin: server.url, 'content-type': 'application/json' },
      });
    const refused = await save([{ slug: listedSlug }, { slug }]);
    expect(refused.status).toBe(400);
    expect(await fieldsOf(refused)).toEqual(['entries.1.slug']);
    const saved = await save([{ slug: listedSlug }]);
    expect(saved.status).toBe(201);
    const { code } = await saved.json();
    // Were a linked driver to lose its last approved set later, the link would stop naming it.
    const linked = await db('drivers').where({ slug: listedSlug }).first('id');
    await db('measurement_sets').where({ driver_id: linked.id }).update({ status: 'pending' });
    try {
      const res = await get(`/api/overlays/${code}`);
      expect(res.status).toBe(200);
      expect((await res.json()).entries).toEqual([]);
    } finally {
      await db('measurement_sets').where({ driver_id: linked.id }).update({ status: 'approved' });
    }
  });

  it('lets only its submitter and moderators add sets to it', async () => {
    const other = await submitWith(server.url, cookies.otherReviewer, { slug });
    expect(other.status).toBe(400);
    expect(await fieldsOf(other)).toEqual(['driver.slug']);
    expect((await submitWith(server.url, cookies.submitter, { slug })).status).toBe(201);
    expect((await submitWith(server.url, cookies.moderator, { slug })).status).toBe(201);
  });

  it('shows it to everyone once a set is approved', async () => {
    await db('measurement_sets').whereIn('driver_id', db('drivers').select('id').where({ slug })).orderBy('id').limit(1).update({ status: 'approved' });
    const res = await get(`/api/drivers/${slug}`);
    expect(res.status).toBe(200);
    expect((await res.json()).model).toBe(MODEL);
  });
});
