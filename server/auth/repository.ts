import type { Knex } from 'knex';
import type { AuditEntry, Role, User } from '../../shared/schemas/users';

export type RoleChangeOutcome =
  | { outcome: 'changed'; oldRole: Role }
  | { outcome: 'not-found' }
  | { outcome: 'last-admin' }
  | { outcome: 'actor-not-admin' };

const columns = ['id', 'login', 'display_name as displayName', 'email', 'role'];

export function createUsersRepository(db: Knex) {
  return {
    async findById(id: number): Promise<User | undefined> {
      return db('users').where({ id }).first(columns);
    },

    async findByProvider(provider: string, providerId: string): Promise<User | undefined> {
      return db('users').where({ provider, provider_id: providerId }).first(columns);
    },

    async insert(u: { provider: string; providerId: string; login: string; displayName: string; email: string | null; role: Role }): Promise<number> {
      const [id] = await db('users').insert({ provider: u.provider, provider_id: u.providerId, login: u.login, display_name: u.displayName, email: u.email, role: u.role });
      return id;
    },

    async updateProfile(id: number, u: { login: string; displayName: string; email: string | null }): Promise<void> {
      await db('users').where({ id }).update({ login: u.login, display_name: u.displayName, email: u.email });
    },

    async list(): Promise<User[]> {
      return db('users').orderBy('id').select(columns);
    },

    async findByLogin(login: string): Promise<User | undefined> {
      return db('users').where({ login }).first(columns);
    },

    /**
     * Changes a role and writes the audit entry in one transaction: both land or neither. Every
     * admin row (and the target's) is locked first, always in id order, so two admins demoting
     * each other queue up instead of deadlocking, and the second sees what the first did.
     */
    async changeRole(targetId: number, newRole: Role, actorId: number | null, reason: string | null): Promise<RoleChangeOutcome> {
      return db.transaction(async (trx) => {
        const rows: { id: number; role: Role }[] = await trx('users')
          .where({ role: 'admin' })
          .orWhere({ id: targetId })
          .orderBy('id')
          .forUpdate()
          .select('id', 'role');
        const target = rows.find((r) => r.id === targetId);
        if (!target) return { outcome: 'not-found' as const };
        const admins = rows.filter((r) => r.role === 'admin');
        if (target.role === 'admin' && newRole !== 'admin' && admins.length === 1) return { outcome: 'last-admin' as const };
        if (actorId !== null && !admins.some((r) => r.id === actorId)) return { outcome: 'actor-not-admin' as const };
        await trx('users').where({ id: targetId }).update({ role: newRole });
        await trx('role_audit').insert({ actor_id: actorId, target_id: targetId, old_role: target.role, new_role: newRole, reason });
        return { outcome: 'changed' as const, oldRole: target.role };
      });
    },

    async audit(limit = 100): Promise<AuditEntry[]> {
      const rows = await db('role_audit as a')
        .leftJoin('users as actor', 'actor.id', 'a.actor_id')
        .join('users as target', 'target.id', 'a.target_id')
        .orderBy('a.id', 'desc')
        .limit(limit)
        .select('a.id', 'actor.login as actor', 'target.login as target', 'a.old_role as oldRole', 'a.new_role as newRole', 'a.reason', 'a.created_at as at');
      return rows.map((r: AuditEntry) => ({ ...r, at: String(r.at) }));
    },
  };
}
export type UsersRepository = ReturnType<typeof createUsersRepository>;
