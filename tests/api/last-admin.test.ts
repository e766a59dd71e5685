import { createTestDb } from '../support/test-db';
import { signIn, startTestServer } from '../support/sign-in';

const P = 'apitest-lastadmin';

describe('at least one admin, always', () => {
  const db = createTestDb();
  let server: Awaited<ReturnType<typeof startTestServer>>;
  let others: number[] = [];
  const admin: Record<'a' | 'b', { id: number; cookie: string }> = { a: { id: 0, cookie: '' }, b: { id: 0, cookie: '' } };

  beforeAll(async () => {
    await db('users').where('login', 'like', `${P}-%`).delete();
    server = await startTestServer(db, { auth: { adminLogins: [`${P}-a`, `${P}-b`] } });
    for (const k of ['a', 'b'] as const) {
      const { cookie } = await signIn(server.url, `${P}-${k}`);
      admin[k] = { id: (await db('users').where({ login: `${P}-${k}` }).first('id')).id, cookie };
    }
    // Only these two may hold the role while the test runs, or "last admin" would never arise.
    others = (await db('users').where({ role: 'admin' }).whereNotIn('id', [admin.a.id, admin.b.id]).select('id')).map((r: { id: number }) => r.id);
    if (others.length) await db('users').whereIn('id', others).update({ role: 'member' });
  });
  afterAll(async () => {
    if (others.length) await db('users').whereIn('id', others).update({ role: 'admin' });
    await server.close();
    await db('users').where('login', 'like', `${P}-%`).delete();
    await db.destroy();
  });

  const setRole = (actor: 'a' | 'b', targetId: number, role: string) =>
    fetch(`${server.url}/api/admin/users/${targetId}/role`, {
      method: 'PATCH',
      headers: { 'content-type': 'application/json', origin: server.url, cookie: admin[actor].cookie },
      body: JSON.stringify({ role, reason: 'mutual demotion' }),
    });

  it('lets exactly one of two admins demoting each other at once win; the other gets a 409 or 403', async () => {
    for (let round = 0; round < 15; round++) {
      const [ab, ba] = await Promise.all([setRole('a', admin.b.id, 'member'), setRole('b', admin.a.id, 'member')]);
      const statuses = [ab.status, ba.status].sort();
      expect(statuses.filter((s) => s === 200)).toHaveLength(1);
      expect([403, 409]).toContain(statuses[1]);
      const loser = ab.status === 200 ? ba : ab;
      expect((await loser.json()).error.code).toMatch(/^(conflict|forbidden)$/);
      const admins = await db('users').whereIn('id', [admin.a.id, admin.b.id]).where({ role: 'admin' }).count({ n: '*' });
      expect(Number(admins[0].n)).toBe(1);
      // The one left an admin makes the other admin again for the next round.
      const winner = ab.status === 200 ? 'a' : 'b';
      const restored = await setRole(winner, winner === 'a' ? admin.b.id : admin.a.id, 'admin');
      expect(restored.status).toBe(200);
    }
  });

  it('keeps the audit trail in step with the roles', async () => {
    for (const id of [admin.a.id, admin.b.id]) {
      const last = await db('role_audit').where({ target_id: id }).orderBy('id', 'desc').first('new_role');
      const user = await db('users').where({ id }).first('role');
      expect(last.new_role).toBe(user.role);
    }
  });
});
