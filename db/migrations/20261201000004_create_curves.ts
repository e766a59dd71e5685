import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('curves', (t) => {
    t.increments('id').primary();
    t.integer('set_id').unsigned().notNullable().references('measurement_sets.id').onDelete('CASCADE');
    t.string('kind', 20).notNullable();
    t.double('angle_deg').nullable();
    t.double('drive_level_v').nullable();
    // JSON arrays of numbers: compact enough for ~500-point curves and readable in a SQL shell.
    t.json('x_values').notNullable();
    t.json('y_values').notNullable();
    t.json('phase_values').nullable();
    t.index(['set_id', 'kind']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('curves');
}
