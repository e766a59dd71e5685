import useSWR from 'swr';
import { roleAtLeast, type Role, type User } from '../../../shared/schemas/users';
import { fetchMe } from '../api/account-api';

export const ME_KEY = '/api/me';

export function useMe() {
  const { data, error, isLoading, mutate } = useSWR<User | null>(ME_KEY, fetchMe);
  const user = data ?? null;
  return {
    user,
    isLoading,
    error,
    refresh: mutate,
    /** True when signed in with at least `role`; a visitor can do nothing above visitor. */
    can: (role: Role) => (user ? roleAtLeast(user.role, role) : role === 'visitor'),
  };
}
