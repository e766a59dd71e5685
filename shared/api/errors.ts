import { z } from 'zod';

/** Every failed API response has this body, whatever the route. */
export const errorEnvelopeSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ErrorEnvelope = z.infer<typeof errorEnvelopeSchema>;

export const errorCodes = {
  badRequest: 'bad_request',
  validation: 'validation_failed',
  notFound: 'not_found',
  unauthenticated: 'unauthenticated',
  forbidden: 'forbidden',
  conflict: 'conflict',
  tooLarge: 'payload_too_large',
  tooManyRequests: 'too_many_requests',
  dbUnavailable: 'db_unavailable',
  internal: 'internal_error',
} as const;
export type ErrorCode = (typeof errorCodes)[keyof typeof errorCodes];

/** A field-level problem, with the path as dotted text so a form can show it beside the input. */
export interface FieldIssue {
  field: string;
  message: string;
}

export function zodIssuesToFields(issues: readonly { path: readonly PropertyKey[]; message: string }[]): FieldIssue[] {
  return issues.map((i) => ({ field: i.path.map(String).join('.') || '(root)', message: i.message }));
}

export function isErrorEnvelope(value: unknown): value is ErrorEnvelope {
  return errorEnvelopeSchema.safeParse(value).success;
}
