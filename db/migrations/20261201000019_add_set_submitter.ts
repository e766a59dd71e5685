import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_sets', (t) => {
    t.integer('submitted_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_sets', (t) => {
    t.dropForeign(['submitted_by']);
    t.dropColumn('submitted_by');
  });
}
