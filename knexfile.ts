import { dbSettingsFromEnv, knexConfig } from './db/connection';

// For the knex CLI: `node --import tsx node_modules/knex/bin/cli.js --knexfile knexfile.ts migrate:status`.
export default knexConfig(dbSettingsFromEnv());
