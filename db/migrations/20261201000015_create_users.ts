import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.string('provider', 20).notNullable();
    t.string('provider_id', 80).notNullable();
    t.string('login', 80).notNullable();
    t.string('display_name', 120).notNullable();
    t.string('email', 200).nullable();
    t.string('role', 20).notNullable().defaultTo('member');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.unique(['provider', 'provider_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('users');
}
