import type { RequestHandler } from 'express';
import { errorCodes } from '../../shared/api/errors';
import { roleAtLeast, type Role, type User } from '../../shared/schemas/users';
import { ApiError } from './api-error';

export function currentUser(req: { user?: unknown }): User | null {
  return (req.user as User | undefined) ?? null;
}

/** 401 without a session, 403 when the signed-in role is below `needed`. */
export function requireRole(needed: Role): RequestHandler {
  return (req, _res, next) => {
    const user = currentUser(req);
    if (!user) return next(new ApiError(401, errorCodes.unauthenticated, 'Sign in first'));
    if (!roleAtLeast(user.role, needed)) return next(new ApiError(403, errorCodes.forbidden, `This needs the ${needed} role; you are a ${user.role}`));
    next();
  };
}
