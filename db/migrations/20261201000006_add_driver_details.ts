import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('drivers', (t) => {
    t.string('diaphragm_material', 80).nullable();
    t.string('surround_material', 80).nullable();
    t.double('voice_coil_diameter_m').nullable();
    t.string('magnet_type', 80).nullable();
    t.decimal('price', 10, 2).nullable();
    t.string('currency', 3).nullable();
    t.string('availability', 20).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('drivers', (t) => {
    t.dropColumns('diaphragm_material', 'surround_material', 'voice_coil_diameter_m', 'magnet_type', 'price', 'currency', 'availability');
  });
}
