import { errorCodes } from '../../shared/api/errors';
import type { Health } from '../../shared/schemas/drivers';
import { ApiError } from '../http/api-error';
import type { HealthRepository } from './repository';

/** Monitors poll health and treat a slow answer as none; this keeps it well under their limits. */
export const HEALTH_TIMEOUT_MS = 800;

export function createHealthService(repo: HealthRepository, options: { timeoutMs?: number } = {}) {
  const timeoutMs = options.timeoutMs ?? HEALTH_TIMEOUT_MS;
  return {
    async check(): Promise<Health> {
      let timer: NodeJS.Timeout | undefined;
      try {
        const late = new Promise<never>((_resolve, reject) => {
          timer = setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs);
        });
        await Promise.race([repo.ping(), late]);
      } catch (err) {
        throw new ApiError(503, errorCodes.dbUnavailable, 'The database is not reachable', {
          reason: err instanceof Error ? err.message.split('\n')[0] : String(err),
        });
      } finally {
        clearTimeout(timer);
      }
      return { ok: true, db: 'up' };
    },
  };
}
