import type { Knex } from 'knex';

export function createHealthRepository(db: Knex) {
  return {
    async ping(): Promise<boolean> {
      await db.raw('select 1');
      return true;
    },
  };
}
export type HealthRepository = ReturnType<typeof createHealthRepository>;
