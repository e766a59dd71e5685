import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('parameters', (t) => {
    t.increments('id').primary();
    t.integer('set_id').unsigned().notNullable().references('measurement_sets.id').onDelete('CASCADE');
    t.string('name', 40).notNullable();
    t.double('value').notNullable();
    t.string('unit', 20).notNullable();
    t.unique(['set_id', 'name']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('parameters');
}
