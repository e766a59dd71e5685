import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('measurement_sets', (t) => {
    t.increments('id').primary();
    t.integer('driver_id').unsigned().notNullable().references('drivers.id').onDelete('CASCADE');
    t.string('label', 200).notNullable();
    t.string('status', 20).notNullable().defaultTo('approved').index();
    t.double('drive_voltage_v').notNullable();
    t.double('distance_m').notNullable();
    t.string('baffle', 200).notNullable();
    t.string('gating', 200).nullable();
    t.double('temperature_c').nullable();
    t.date('measured_on').nullable();
    t.string('sample_id', 80).nullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('measurement_sets');
}
