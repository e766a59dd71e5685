import { fieldsOf, newDriver, submitWith } from '../support/submit';
import { createTestDb, removePrefixed } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-slugs';
// Invented maker names. The first two are the same words in traditional and simplified Han, so
// they transliterate alike and must still stay two makers; they have no Latin prefix to clean up
// by, so their slugs are listed here.
const JAPANESE = '日本音響';
const SIMPLIFIED = '日本音响';
const KANA = 'オト工房';
const unprefixed = ['ri-ben-yin-xiang', 'otogong-fang'];

describe('slugs of new makers and drivers', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let reviewer = '';

  const cleanup = async () => {
    for (const slug of unprefixed) {
      const makers = await db('makers').where('slug', slug).orWhere('slug', 'like', `${slug}-%`).select('id');
      const ids = makers.map((m: { id: number }) => m.id);
      await db('drivers').whereIn('maker_id', ids).delete();
      await db('makers').whereIn('id', ids).delete();
    }
    await removePrefixed(db, P);
  };
  const makerOf = async (driverSlug: string) =>
    db('drivers as d').join('makers as m', 'm.id', 'd.maker_id').where('d.slug', driverSlug).first('m.id', 'm.slug', 'm.name', 'd.model');

  beforeAll(async () => {
    await cleanup();
    server = await startTestServer(db);
    reviewer = (await signIn(server.url, `${P}-reviewer`)).cookie;
    await db('users').where({ login: `${P}-reviewer` }).update({ role: 'reviewer' });
  });
  afterAll(async () => {
    await server.close();
    await cleanup();
    await db.destroy();
  });

  it('gives a Japanese maker a transliterated, non-empty slug', async () => {
    const res = await submitWith(server.url, reviewer, newDriver(JAPANESE, 'NA-10'));
    expect(res.status).toBe(201);
    const { driverSlug } = await res.json();
    const maker = await makerOf(driverSlug);
    expect(maker).toMatchObject({ name: JAPANESE, model: 'NA-10' });
    expect(maker.slug).toMatch(/^[a-z0-9]+(-[a-z0-9]+)+$/);
    expect(driverSlug).toBe(`${maker.slug}-na-10`);
  });

  it('never files a driver under another maker, even when both names transliterate alike', async () => {
    const first = await makerOf((await (await submitWith(server.url, reviewer, newDriver(JAPANESE, 'NA-11'))).json()).driverSlug);
    const res = await submitWith(server.url, reviewer, newDriver(SIMPLIFIED, 'NA-12'));
    expect(res.status).toBe(201);
    const second = await makerOf((await res.json()).driverSlug);
    expect(second.name).toBe(SIMPLIFIED);
    expect(second.id).not.toBe(first.id);
    expect(second.slug).toBe(`${first.slug}-2`);
    const other = await makerOf((await (await submitWith(server.url, reviewer, newDriver(KANA, 'KO-3'))).json()).driverSlug);
    expect(other.name).toBe(KANA);
    expect([first.id, second.id]).not.toContain(other.id);
  });

  it('files a driver under the existing maker when the name differs only in case, spacing or accents', async () => {
    const a = await makerOf((await (await submitWith(server.url, reviewer, newDriver(`${P} Lydvérk`, 'LV-1'))).json()).driverSlug);
    const res = await submitWith(server.url, reviewer, newDriver(`  ${P.toUpperCase()}  lydverk `, 'LV-2'));
    expect(res.status).toBe(201);
    const b = await makerOf((await res.json()).driverSlug);
    expect(b.id).toBe(a.id);
    expect(b.name).toBe(`${P} Lydvérk`);
  });

  it('refuses a maker or model name of only punctuation with a 400 naming it, writing nothing', async () => {
    const before = await db('makers').count({ n: '*' }).first();
    const maker = await submitWith(server.url, reviewer, newDriver('!!! — …', 'PX-1'));
    expect(maker.status).toBe(400);
    expect(await fieldsOf(maker)).toEqual(['driver.makerName']);
    const model = await submitWith(server.url, reviewer, newDriver(`${P} Punct`, '—·—'));
    expect(model.status).toBe(400);
    expect(await fieldsOf(model)).toEqual(['driver.model']);
    expect(await db('makers').count({ n: '*' }).first()).toEqual(before);
  });

  it('answers the same model under the same maker with a 409, and a different model with the same slug gets its own', async () => {
    const first = await submitWith(server.url, reviewer, newDriver(`${P} Omega`, 'Ω-8'));
    expect(first.status).toBe(201);
    const { driverSlug } = await first.json();
    const again = await submitWith(server.url, reviewer, newDriver(`${P} Omega`, 'ω 8'));
    expect(again.status).toBe(409);
    expect(await fieldsOf(again)).toEqual(['driver.model']);
    // "O-8" is another model whose slug comes out as the first one's.
    const lookalike = await submitWith(server.url, reviewer, newDriver(`${P} Omega`, 'O-8'));
    expect(lookalike.status).toBe(201);
    expect((await lookalike.json()).driverSlug).toBe(`${driverSlug}-2`);
  });

  it('treats a slug kept as an alias as taken, so old links keep leading to their driver', async () => {
    const first = await submitWith(server.url, reviewer, newDriver(`${P} Alias`, 'AL-1'));
    const { driverSlug } = await first.json();
    const row = await db('drivers').where({ slug: driverSlug }).first('id');
    const merged = driverSlug.replace(/al-1$/, 'al-2');
    // As a merge leaves it: AL-2's old slug now leads to AL-1.
    await db('driver_aliases').insert({ driver_id: row.id, kind: 'old-slug', alias: 'AL-2', slug: merged });
    const res = await submitWith(server.url, reviewer, newDriver(`${P} Alias`, 'AL-2'));
    expect(res.status).toBe(201);
    expect((await res.json()).driverSlug).toBe(`${merged}-2`);
  });
});
