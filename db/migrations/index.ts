import type { Knex } from 'knex';
import * as m1 from './20261201000001_create_makers';
import * as m2 from './20261201000002_create_drivers';
import * as m3 from './20261201000003_create_measurement_sets';
import * as m4 from './20261201000004_create_curves';
import * as m5 from './20261201000005_create_parameters';
import * as m6 from './20261201000006_add_driver_details';
import * as m7 from './20261201000007_create_driver_mounting';
import * as m8 from './20261201000008_create_maker_specs';
import * as m9 from './20261201000009_add_set_method';
import * as m10 from './20261201000010_add_parameter_signal';
import * as m11 from './20261201000011_create_driver_aliases';
import * as m12 from './20261201000012_create_driver_figures';
import * as m13 from './20261201000013_add_driver_updated_at';
import * as m14 from './20261201000014_create_saved_overlays';
import * as m15 from './20261201000015_create_users';
import * as m16 from './20261201000016_create_role_audit';
import * as m17 from './20261201000017_create_sessions';
import * as m18 from './20261201000018_create_upload_files';
import * as m19 from './20261201000019_add_set_submitter';

type Migration = { up: (k: Knex) => Promise<void>; down: (k: Knex) => Promise<void> };

// Listed statically so the same migrations run under tsx, jest and the knex CLI without a loader.
const migrations: Record<string, Migration> = {
  '20261201000001_create_makers': m1,
  '20261201000002_create_drivers': m2,
  '20261201000003_create_measurement_sets': m3,
  '20261201000004_create_curves': m4,
  '20261201000005_create_parameters': m5,
  '20261201000006_add_driver_details': m6,
  '20261201000007_create_driver_mounting': m7,
  '20261201000008_create_maker_specs': m8,
  '20261201000009_add_set_method': m9,
  '20261201000010_add_parameter_signal': m10,
  '20261201000011_create_driver_aliases': m11,
  '20261201000012_create_driver_figures': m12,
  '20261201000013_add_driver_updated_at': m13,
  '20261201000014_create_saved_overlays': m14,
  '20261201000015_create_users': m15,
  '20261201000016_create_role_audit': m16,
  '20261201000017_create_sessions': m17,
  '20261201000018_create_upload_files': m18,
  '20261201000019_add_set_submitter': m19,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations).sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name],
};
