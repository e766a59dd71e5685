import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_sets', (t) => {
    t.string('reviewer', 120).notNullable().defaultTo('unknown');
    t.string('burn_in', 20).notNullable().defaultTo('out-of-box');
    t.json('angles_deg').nullable();
    // What the server did to bring the upload to 2.83 V / 1 m on the common grid, for the record.
    t.json('normalisation').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurement_sets', (t) => {
    t.dropColumns('reviewer', 'burn_in', 'angles_deg', 'normalisation');
  });
}
