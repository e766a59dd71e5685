import type { Knex } from 'knex';

// Per-driver figures precomputed from its primary measurement set, so search and role ranking
// never touch curves: headline numbers plus 1/3-octave band summaries.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('driver_figures', (t) => {
    t.integer('driver_id').unsigned().primary().references('drivers.id').onDelete('CASCADE');
    t.integer('set_id').unsigned().nullable().references('measurement_sets.id').onDelete('SET NULL');
    t.double('fs_hz').nullable();
    t.double('qts').nullable();
    t.double('vas_m3').nullable();
    t.double('xmax_m').nullable();
    t.double('sensitivity_db').nullable();
    t.json('bands').notNullable();
    t.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('driver_figures');
}
