import { errorCodes } from '../../shared/api/errors';
import type { Role, User } from '../../shared/schemas/users';
import { ApiError, notFound } from '../http/api-error';
import type { UsersRepository } from './repository';

export interface ProviderProfile {
  provider: string;
  id: string;
  login: string;
  displayName: string;
  email: string | null;
}

export function createUsersService(repo: UsersRepository, options: { adminLogins?: readonly string[] } = {}) {
  const admins = new Set((options.adminLogins ?? []).map((l) => l.toLowerCase()));
  return {
    /** Finds or creates the account behind a provider profile. New accounts are members, except configured admins. */
    async signIn(p: ProviderProfile): Promise<User> {
      const existing = await repo.findByProvider(p.provider, p.id);
      if (existing) {
        await repo.updateProfile(existing.id, p);
        if (admins.has(p.login.toLowerCase()) && existing.role !== 'admin') await repo.changeRole(existing.id, 'admin', null, 'configured admin');
        return (await repo.findById(existing.id)) as User;
      }
      const role: Role = admins.has(p.login.toLowerCase()) ? 'admin' : 'member';
      const id = await repo.insert({ provider: p.provider, providerId: p.id, login: p.login, displayName: p.displayName, email: p.email, role });
      return (await repo.findById(id)) as User;
    },

    findById: (id: number) => repo.findById(id),
    list: () => repo.list(),
    audit: () => repo.audit(),

    async changeRole(actor: User, targetId: number, role: Role, reason?: string): Promise<User> {
      if (actor.id === targetId && role !== 'admin') {
        // An admin demoting themselves could leave nobody able to hand out roles.
        throw new ApiError(409, errorCodes.conflict, 'Admins cannot change their own role');
      }
      const changed = await repo.changeRole(targetId, role, actor.id, reason ?? null);
      if (!changed) throw notFound(`User ${targetId}`);
      return (await repo.findById(targetId)) as User;
    },

    /** For the seed command: makes an existing account admin without an acting user. */
    async promote(login: string): Promise<User> {
      const user = await repo.findByLogin(login);
      if (!user) throw notFound(`User "${login}"`);
      await repo.changeRole(user.id, 'admin', null, 'seed command');
      return (await repo.findById(user.id)) as User;
    },
  };
}
export type UsersService = ReturnType<typeof createUsersService>;
