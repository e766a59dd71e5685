import type { Role, User } from '../../../shared/schemas/users';
import { ApiRequestError, fetchJson, sendJson } from '../../ui';

/** The signed-in user, or null for a visitor (the API answers 401). */
export async function fetchMe(): Promise<User | null> {
  try {
    return await fetchJson<User>('/api/me');
  } catch (err) {
    if (err instanceof ApiRequestError && err.status === 401) return null;
    throw err;
  }
}

/** Where the browser goes to sign in; it comes back to `returnTo` afterwards. */
export function signInHref(returnTo: string): string {
  const safe = returnTo.startsWith('/') && !returnTo.startsWith('//') ? returnTo : '/';
  return `/auth/github?returnTo=${encodeURIComponent(safe)}`;
}

export const signOut = () => sendJson<null>('POST', '/auth/signout');
export const changeRole = (id: number, role: Role, reason?: string) => sendJson<User>('PATCH', `/api/admin/users/${id}/role`, { role, ...(reason ? { reason } : {}) });
