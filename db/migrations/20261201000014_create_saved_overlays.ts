import type { Knex } from 'knex';

// Entries point at driver and set ids, not slugs, so renames and merges never break a saved link.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('saved_overlays', (t) => {
    t.increments('id').primary();
    t.string('code', 16).notNullable().unique();
    t.string('title', 120).notNullable();
    t.text('note').notNullable();
    t.json('entries').notNullable();
    t.json('options').notNullable();
    t.integer('created_by').unsigned().nullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('saved_overlays');
}
