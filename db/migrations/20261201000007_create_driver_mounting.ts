import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('driver_mounting', (t) => {
    t.integer('driver_id').unsigned().primary().references('drivers.id').onDelete('CASCADE');
    t.double('cutout_diameter_m').nullable();
    t.double('outer_diameter_m').nullable();
    t.double('mounting_depth_m').nullable();
    t.double('bolt_circle_m').nullable();
    t.integer('hole_count').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('driver_mounting');
}
