import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('parameters', (t) => {
    t.string('signal', 10).notNullable().defaultTo('small');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('parameters', (t) => {
    t.dropColumn('signal');
  });
}
