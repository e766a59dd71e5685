// Two admins demoting each other at the same moment, 100 times over HTTP against the real server:
// never a 5xx, and the site never without an admin (a watcher polls the count throughout).
import type { Knex } from 'knex';
import { createDb } from '../../db/connection';
import { signIn } from '../support/sign-in';
import { startApp, type AppProcess } from './support/app-process';
import { faultDbSettings, sleep } from './support/fault-db';
import { recordFigure } from './support/figures';

jest.setTimeout(120_000);
const ROUNDS = 100;

describe('two admins demoting each other', () => {
  let app: AppProcess;
  let db: Knex;
  const admins: { login: string; id: number; cookie: string }[] = [];

  beforeAll(async () => {
    db = createDb(faultDbSettings());
    app = await startApp();
    for (const login of ['fault-admin-a', 'fault-admin-b']) {
      const { cookie } = await signIn(app.url, login);
      admins.push({ login, id: (await db('users').where({ login }).first('id')).id, cookie });
    }
    // Only these two hold the role, so each round could leave the site without an admin.
    await db('users').where({ role: 'admin' }).whereNotIn('id', admins.map((a) => a.id)).update({ role: 'member' });
    expect(await db('users').where({ role: 'admin' }).count({ n: '*' })).toEqual([{ n: 2 }]);
  });
  afterAll(async () => {
    await app?.kill();
    await db?.destroy();
  });

  const setRole = (actor: number, target: number, role: string) =>
    fetch(`${app.url}/api/admin/users/${admins[target].id}/role`, {
      method: 'PATCH',
      headers: { 'content-type': 'application/json', origin: app.url, cookie: admins[actor].cookie },
      body: JSON.stringify({ role, reason: 'mutual demotion' }),
    });

  it(`never leaves the site without an admin, nor answers 5xx, in ${ROUNDS} rounds`, async () => {
    let watching = true;
    let fewest = Infinity;
    const watcher = (async () => {
      while (watching) {
        const [{ n }] = await db('users').where({ role: 'admin' }).count({ n: '*' });
        fewest = Math.min(fewest, Number(n));
        await sleep(2);
      }
    })();
    const outcomes = new Map<number, number>();
    try {
      for (let round = 0; round < ROUNDS; round++) {
        const pair = await Promise.all([setRole(0, 1, 'member'), setRole(1, 0, 'member')]);
        for (const r of pair) outcomes.set(r.status, (outcomes.get(r.status) ?? 0) + 1);
        expect(pair.map((r) => r.status).filter((s) => s >= 500)).toEqual([]);
        const left = await db('users').whereIn('id', admins.map((a) => a.id)).where({ role: 'admin' }).select('id');
        expect(left).toHaveLength(1);
        // The one still admin makes the other admin again for the next round.
        const winner = admins.findIndex((a) => a.id === left[0].id);
        expect((await setRole(winner, 1 - winner, 'admin')).status).toBe(200);
      }
    } finally {
      watching = false;
      await watcher;
    }
    const summary = [...outcomes].sort(([a], [b]) => a - b).map(([s, n]) => `${n}× ${s}`).join(', ');
    recordFigure(`two admins demoting each other, ${ROUNDS} concurrent pairs`, `${summary}; fewest admins seen: ${fewest}`);
    expect(fewest).toBeGreaterThanOrEqual(1);
    expect(outcomes.get(200)).toBe(ROUNDS);
  });
});
