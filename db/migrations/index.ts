import type { Knex } from 'knex';
import * as m1 from './20261201000001_create_makers';
import * as m2 from './20261201000002_create_drivers';
import * as m3 from './20261201000003_create_measurement_sets';
import * as m4 from './20261201000004_create_curves';
import * as m5 from './20261201000005_create_parameters';

type Migration = { up: (k: Knex) => Promise<void>; down: (k: Knex) => Promise<void> };

// Listed statically so the same migrations run under tsx, jest and the knex CLI without a loader.
const migrations: Record<string, Migration> = {
  '20261201000001_create_makers': m1,
  '20261201000002_create_drivers': m2,
  '20261201000003_create_measurement_sets': m3,
  '20261201000004_create_curves': m4,
  '20261201000005_create_parameters': m5,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations).sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name],
};
