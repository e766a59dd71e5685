import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('makers', (t) => {
    t.increments('id').primary();
    t.string('slug', 120).notNullable().unique();
    t.string('name', 200).notNullable();
    t.string('country', 80).nullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('makers');
}
