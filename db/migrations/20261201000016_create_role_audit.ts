import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('role_audit', (t) => {
    t.increments('id').primary();
    t.integer('actor_id').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.integer('target_id').unsigned().notNullable().references('users.id').onDelete('CASCADE');
    t.string('old_role', 20).notNullable();
    t.string('new_role', 20).notNullable();
    t.string('reason', 200).nullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('role_audit');
}
