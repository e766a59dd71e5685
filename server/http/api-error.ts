import type { ErrorCode } from '../../shared/api/errors';
import { errorCodes, zodIssuesToFields } from '../../shared/api/errors';
import type { ZodType, z } from 'zod';

/** An error the client is meant to see; anything else becomes a generic 500. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export function notFound(what: string): ApiError {
  return new ApiError(404, errorCodes.notFound, `${what} was not found`);
}

/** Parses with zod and turns failures into a 400 that names every wrong field. */
export function parseOr400<S extends ZodType>(schema: S, value: unknown, where: 'body' | 'query' | 'params'): z.infer<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    const fields = zodIssuesToFields(result.error.issues);
    const summary = fields.map((f) => `${f.field}: ${f.message}`).join('; ');
    throw new ApiError(400, errorCodes.validation, `Invalid ${where}: ${summary}`, { fields });
  }
  return result.data;
}
