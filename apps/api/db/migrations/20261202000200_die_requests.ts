import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('die_requests', (t) => {
    t.increments('id');
    t.integer('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    t.text('title').notNullable();
    t.text('job_reference');
    t.text('status')
      .notNullable()
      .defaultTo('draft')
      .checkIn(['draft', 'open', 'bidding_closed', 'awarded', 'in_production', 'shipped', 'received', 'cancelled']);
    t.integer('quantity').notNullable().defaultTo(1);
    t.integer('ups').notNullable().defaultTo(1);
    t.decimal('piece_width_in', 8, 3);
    t.decimal('piece_height_in', 8, 3);
    t.text('stock_name');
    t.decimal('caliper_in', 6, 4);
    t.decimal('stock_weight_gsm', 7, 1);
    t.text('grain').checkIn(['long', 'short']);
    t.integer('press_id').references('presses.id').onDelete('SET NULL');
    t.integer('run_sheets');
    t.integer('planned_lead_days').notNullable().defaultTo(5);
    t.specificType('rule_types', 'text[]').notNullable().defaultTo('{cut}');
    t.boolean('counter_wanted').notNullable().defaultTo(false);
    t.boolean('ejection_rubber_wanted').notNullable().defaultTo(true);
    t.date('need_by_date');
    t.timestamp('bid_deadline', { useTz: true });
    t.text('delivery_address');
    t.text('delivery_postcode');
    t.text('notes');
    t.text('visibility').notNullable().defaultTo('public').checkIn(['public', 'invited']);
    t.timestamp('published_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id', 'status']);
    t.index(['status', 'bid_deadline']);
  });

  await knex.schema.createTable('dieline_files', (t) => {
    t.increments('id');
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.integer('uploaded_by').references('users.id').onDelete('SET NULL');
    t.text('file_name').notNullable();
    t.text('format').notNullable().checkIn(['dxf', 'svg', 'pdf']);
    t.text('content_type').notNullable();
    t.bigInteger('byte_size').notNullable();
    t.text('sha256').notNullable();
    t.text('s3_key').notNullable().unique();
    t.boolean('is_primary').notNullable().defaultTo(false);
    t.text('analysis_status').notNullable().defaultTo('pending').checkIn(['pending', 'analysing', 'done', 'failed']);
    t.text('analysis_error');
    t.jsonb('metrics');
    t.jsonb('preview');
    t.jsonb('layer_map').notNullable().defaultTo('{}');
    t.integer('analysis_attempts').notNullable().defaultTo(0);
    t.timestamp('analysed_at', { useTz: true });
    t.timestamp('uploaded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['request_id']);
  });
  await knex.raw(
    "CREATE INDEX dieline_files_waiting ON dieline_files (uploaded_at) WHERE analysis_status IN ('pending', 'analysing')",
  );

  await knex.schema.createTable('request_invitations', (t) => {
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.integer('shop_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.timestamp('invited_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['request_id', 'shop_id']);
    t.index(['shop_id']);
  });

  await knex.schema.createTable('request_questions', (t) => {
    t.increments('id');
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.integer('shop_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.integer('asked_by').references('users.id').onDelete('SET NULL');
    t.text('question').notNullable();
    t.timestamp('asked_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('answer');
    t.integer('answered_by').references('users.id').onDelete('SET NULL');
    t.timestamp('answered_at', { useTz: true });
    t.index(['request_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['request_questions', 'request_invitations', 'dieline_files', 'die_requests']) {
    await knex.schema.dropTableIfExists(table);
  }
}
