import type { Knex } from 'knex';

// The layout the session store reads and writes (its default column names).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (t) => {
    t.string('session_id', 128).primary();
    t.integer('expires').unsigned().notNullable().index();
    t.text('data', 'mediumtext').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sessions');
}
