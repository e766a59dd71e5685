import { setTimeout as sleep } from 'node:timers/promises';
import { isLockConflict } from '../../db/db-errors';
import { errorCodes } from '../../shared/api/errors';
import { charCount, columnLimits, truncateChars } from '../../shared/schemas/column-limits';
import type { Role, User } from '../../shared/schemas/users';
import { ApiError, notFound } from '../http/api-error';
import type { RoleChangeOutcome, UsersRepository } from './repository';

/** Attempts of a role change that lost a lock race before the caller is told to try again. */
export const ROLE_CHANGE_ATTEMPTS = 4;

/** Runs a role change again when the database rolled it back for a deadlock or a lock wait. */
async function withLockRetry(run: () => Promise<RoleChangeOutcome>): Promise<RoleChangeOutcome> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await run();
    } catch (err) {
      if (!isLockConflict(err)) throw err;
      if (attempt >= ROLE_CHANGE_ATTEMPTS) throw new ApiError(409, errorCodes.conflict, 'Another role change held the same accounts; try again');
      // Jitter, so two retrying requests do not meet again in step.
      await sleep(10 + Math.random() * 40 * attempt);
    }
  }
}

export interface ProviderProfile {
  provider: string;
  id: string;
  login: string;
  displayName: string;
  email: string | null;
}

const limits = columnLimits.users;

/**
 * A provider profile made to fit the users table. Providers allow longer names than we store; a
 * shortened display name or login is still the same person, so they are cut. A shortened e-mail
 * would be someone else's address, so an over-long one is dropped. The account id is the identity
 * itself: one that does not fit is refused rather than cut into a possible collision.
 */
export function fitProfile(p: ProviderProfile): ProviderProfile {
  if (charCount(p.id) > limits.provider_id) throw new ApiError(400, errorCodes.badRequest, `The sign-in provider sent an account id longer than ${limits.provider_id} characters`);
  const login = truncateChars(p.login, limits.login);
  return {
    ...p,
    login,
    displayName: truncateChars(p.displayName.trim(), limits.display_name) || login,
    email: p.email !== null && charCount(p.email) <= limits.email ? p.email : null,
  };
}

export function createUsersService(repo: UsersRepository, options: { adminLogins?: readonly string[] } = {}) {
  const admins = new Set((options.adminLogins ?? []).map((l) => l.toLowerCase()));
  return {
    /** Finds or creates the account behind a provider profile. New accounts are members, except configured admins. */
    async signIn(profile: ProviderProfile): Promise<User> {
      const p = fitProfile(profile);
      const existing = await repo.findByProvider(p.provider, p.id);
      if (existing) {
        await repo.updateProfile(existing.id, p);
        if (admins.has(p.login.toLowerCase()) && existing.role !== 'admin') await withLockRetry(() => repo.changeRole(existing.id, 'admin', null, 'configured admin'));
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
      const result = await withLockRetry(() => repo.changeRole(targetId, role, actor.id, reason ?? null));
      if (result.outcome === 'not-found') throw notFound(`User ${targetId}`);
      if (result.outcome === 'last-admin') throw new ApiError(409, errorCodes.conflict, 'This is the last admin; make someone else admin first');
      if (result.outcome === 'actor-not-admin') throw new ApiError(403, errorCodes.forbidden, 'You are no longer an admin');
      return (await repo.findById(targetId)) as User;
    },

    /** For the seed command: makes an existing account admin without an acting user. */
    async promote(login: string): Promise<User> {
      const user = await repo.findByLogin(login);
      if (!user) throw notFound(`User "${login}"`);
      await withLockRetry(() => repo.changeRole(user.id, 'admin', null, 'seed command'));
      return (await repo.findById(user.id)) as User;
    },
  };
}
export type UsersService = ReturnType<typeof createUsersService>;
