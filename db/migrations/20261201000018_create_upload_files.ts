import type { Knex } from 'knex';

// The reviewer's original bytes and how they were read, so normalisation can be re-run later.
// Rows without a set are staged uploads waiting for their submission.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('upload_files', (t) => {
    t.increments('id').primary();
    t.string('token', 40).notNullable().unique();
    t.integer('uploaded_by').unsigned().notNullable().references('users.id').onDelete('CASCADE');
    t.integer('set_id').unsigned().nullable().references('measurement_sets.id').onDelete('CASCADE');
    t.string('file_name', 255).notNullable();
    t.string('kind', 20).notNullable();
    t.double('angle_deg').nullable();
    t.double('drive_level_v').nullable();
    // MEDIUMBLOB holds up to 16 MB, above the 5 MB upload limit.
    t.specificType('bytes', 'mediumblob').notNullable();
    t.json('parse_settings').notNullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('upload_files');
}
