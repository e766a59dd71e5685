import type { Knex } from 'knex';

// The maker's published figures, kept apart from independent measurements so they never mix.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('maker_specs', (t) => {
    t.increments('id').primary();
    t.integer('driver_id').unsigned().notNullable().references('drivers.id').onDelete('CASCADE');
    t.string('name', 40).notNullable();
    t.double('value').notNullable();
    t.string('unit', 20).notNullable();
    t.unique(['driver_id', 'name']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('maker_specs');
}
