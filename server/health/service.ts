import { errorCodes } from '../../shared/api/errors';
import type { Health } from '../../shared/schemas/drivers';
import { ApiError } from '../http/api-error';
import type { HealthRepository } from './repository';

export function createHealthService(repo: HealthRepository) {
  return {
    async check(): Promise<Health> {
      try {
        await repo.ping();
      } catch (err) {
        throw new ApiError(503, errorCodes.dbUnavailable, 'The database is not reachable', {
          reason: err instanceof Error ? err.message : String(err),
        });
      }
      return { ok: true, db: 'up' };
    },
  };
}
