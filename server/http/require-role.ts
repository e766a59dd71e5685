import type { RequestHandler } from 'express';
import { errorCodes } from '../../shared/api/errors';
import { roleAtLeast, type Role, type User } from '../../shared/schemas/users';
import { ApiError } from './api-error';

export function currentUser(req: { user?: unknown }): User | null {
  return (req.user as User | undefined) ?? null;
}

type SessionRequest = { sessionFailure?: unknown };

/** Records that the session could not be read (database away), so the request runs as a visitor's. */
export function markSessionUnreadable(req: object, err: unknown): void {
  (req as SessionRequest).sessionFailure = err;
}

/** The database error that kept the session from being read, if any: the answer for routes that need the user. */
export function sessionUnreadable(req: object): unknown {
  return (req as SessionRequest).sessionFailure;
}

/** 401 without a session, 403 when the signed-in role is below `needed`. */
export function requireRole(needed: Role): RequestHandler {
  return (req, _res, next) => {
    const user = currentUser(req);
    if (!user) return next(sessionUnreadable(req) ?? new ApiError(401, errorCodes.unauthenticated, 'Sign in first'));
    if (!roleAtLeast(user.role, needed)) return next(new ApiError(403, errorCodes.forbidden, `This needs the ${needed} role; you are a ${user.role}`));
    next();
  };
}
