import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // Dies a printer owns (in storage), and stock dies a die shop lists for every printer to use.
  await knex.schema.createTable('library_dies', (t) => {
    t.increments('id');
    t.integer('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.integer('request_id').references('die_requests.id').onDelete('SET NULL');
    t.decimal('piece_width_in', 8, 3);
    t.decimal('piece_height_in', 8, 3);
    t.integer('ups').notNullable().defaultTo(1);
    t.specificType('rule_types', 'text[]').notNullable().defaultTo('{cut}');
    t.integer('press_id').references('presses.id').onDelete('SET NULL');
    t.text('storage_location');
    t.text('condition').notNullable().defaultTo('good').checkIn(['good', 'worn', 'damaged', 'retired']);
    t.bigInteger('impressions').notNullable().defaultTo(0);
    t.bigInteger('impression_limit');
    t.date('last_used_on');
    t.jsonb('metrics');
    t.jsonb('preview');
    t.boolean('listed').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id']);
    t.index(['listed']);
  });
  await knex.schema.createTable('die_runs', (t) => {
    t.increments('id');
    t.integer('die_id').notNullable().references('library_dies.id').onDelete('CASCADE');
    t.date('run_on').notNullable();
    t.bigInteger('impressions').notNullable();
    t.text('job_reference');
    t.text('notes');
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['die_id', 'run_on']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('die_runs');
  await knex.schema.dropTableIfExists('library_dies');
}
