import type { Knex } from 'knex';

// Microsecond change stamps let the search index notice renames and merges made by any process.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('drivers', (t) => {
    t.timestamp('updated_at', { precision: 6 }).notNullable().defaultTo(knex.raw('CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6)'));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('drivers', (t) => {
    t.dropColumn('updated_at');
  });
}
