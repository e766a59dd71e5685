import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('drivers', (t) => {
    t.increments('id').primary();
    t.string('slug', 160).notNullable().unique();
    t.integer('maker_id').unsigned().notNullable().references('makers.id').onDelete('RESTRICT');
    t.string('model', 200).notNullable();
    t.string('type', 20).notNullable().index();
    // Inches, because the trade sizes drivers that way; SI values live in parameters.
    t.double('nominal_size_in').notNullable();
    t.double('nominal_impedance_ohm').notNullable();
    // Set when a moderator merges this entry into another; reads follow it to the survivor.
    t.integer('canonical_id').unsigned().nullable().references('drivers.id').onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('drivers');
}
