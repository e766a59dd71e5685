import { z } from 'zod';
import { columnLimits, columnText } from './column-limits';

/** Ordered from least to most trusted; each role can do everything the ones before it can. */
export const roles = ['visitor', 'member', 'reviewer', 'moderator', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export function roleAtLeast(role: Role, needed: Role): boolean {
  return roles.indexOf(role) >= roles.indexOf(needed);
}

export const userSchema = z.object({
  id: z.number().int(),
  login: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  role: roleSchema,
});
export type User = z.infer<typeof userSchema>;

export const roleChangeSchema = z.object({ role: roleSchema, reason: columnText(columnLimits.role_audit.reason).optional() }).strict();

export const auditEntrySchema = z.object({
  id: z.number().int(),
  actor: z.string().nullable(),
  target: z.string(),
  oldRole: roleSchema,
  newRole: roleSchema,
  reason: z.string().nullable(),
  at: z.string(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;
