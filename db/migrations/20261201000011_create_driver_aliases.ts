import type { Knex } from 'knex';

// Old slugs, former names and alternate model codes. A slug alias redirects to its driver, which
// is how merged duplicates keep their links working.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('driver_aliases', (t) => {
    t.increments('id').primary();
    t.integer('driver_id').unsigned().notNullable().references('drivers.id').onDelete('CASCADE');
    t.string('kind', 20).notNullable();
    t.string('alias', 200).notNullable();
    t.string('slug', 160).nullable().unique();
    t.index(['driver_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('driver_aliases');
}
