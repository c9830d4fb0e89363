import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.timestamp('bidding_closed_at', { useTz: true });
    t.boolean('closed_early').notNullable().defaultTo(false);
    t.timestamp('production_started_at', { useTz: true });
    t.timestamp('shipped_at', { useTz: true });
    t.text('tracking_note');
    t.timestamp('received_at', { useTz: true });
    t.text('received_condition').checkIn(['good', 'damaged']);
    t.text('received_notes');
  });

  await knex.schema.createTable('bids', (t) => {
    t.increments('id');
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.integer('shop_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('status').notNullable().defaultTo('submitted').checkIn(['submitted', 'withdrawn']);
    // The current revision's terms, repeated here so that comparisons read one row per bid.
    t.integer('revision').notNullable().defaultTo(1);
    t.jsonb('lines').notNullable();
    t.string('currency', 3).notNullable();
    t.bigInteger('total_cents').notNullable();
    t.bigInteger('die_cents').notNullable();
    t.integer('lead_days').notNullable();
    t.date('promised_ship_date').notNullable();
    t.date('valid_until').notNullable();
    t.text('notes');
    t.timestamp('submitted_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['request_id', 'shop_id']);
    t.index(['shop_id']);
  });

  // Every revision of every bid, as submitted: nothing a shop sent is ever overwritten.
  await knex.schema.createTable('bid_revisions', (t) => {
    t.increments('id');
    t.integer('bid_id').notNullable().references('bids.id').onDelete('CASCADE');
    t.integer('revision').notNullable();
    t.text('action').notNullable().checkIn(['submitted', 'revised', 'withdrawn']);
    t.jsonb('lines').notNullable();
    t.string('currency', 3).notNullable();
    t.bigInteger('total_cents').notNullable();
    t.integer('lead_days').notNullable();
    t.date('promised_ship_date').notNullable();
    t.date('valid_until').notNullable();
    t.text('notes');
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['bid_id', 'revision', 'action']);
  });

  await knex.schema.createTable('shop_holidays', (t) => {
    t.integer('shop_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.date('date').notNullable();
    t.text('name');
    t.primary(['shop_id', 'date']);
  });

  await knex.schema.createTable('request_declines', (t) => {
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.integer('shop_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('reason').notNullable();
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['request_id', 'shop_id']);
  });

  await knex.raw('CREATE SEQUENCE purchase_order_numbers START 1001');
  // One award per request, guaranteed by the unique constraint even if two awards race.
  await knex.schema.createTable('awards', (t) => {
    t.increments('id');
    t.integer('request_id').notNullable().unique().references('die_requests.id').onDelete('CASCADE');
    t.integer('bid_id').notNullable().references('bids.id');
    t.integer('shop_id').notNullable().references('organisations.id');
    t.integer('revision').notNullable();
    t.bigInteger('total_cents').notNullable();
    t.bigInteger('die_cents').notNullable();
    t.string('currency', 3).notNullable();
    t.integer('lead_days').notNullable();
    t.date('promised_ship_date').notNullable();
    t.text('reason');
    t.integer('awarded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('awarded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('po_number').notNullable().unique();
    t.text('po_s3_key');
    t.index(['shop_id']);
  });

  await knex.schema.createTable('notifications', (t) => {
    t.bigIncrements('id');
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('kind').notNullable();
    t.text('title').notNullable();
    t.text('body').notNullable();
    t.text('link');
    t.timestamp('read_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['user_id', 'created_at']);
  });

  // What each received die really cost, with the dieline's metrics: the price history.
  await knex.schema.createTable('price_records', (t) => {
    t.bigIncrements('id');
    t.integer('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.integer('request_id').references('die_requests.id').onDelete('SET NULL');
    t.integer('award_id').references('awards.id').onDelete('SET NULL');
    t.integer('shop_id').references('organisations.id').onDelete('SET NULL');
    t.text('shop_name').notNullable();
    t.bigInteger('total_cents').notNullable();
    t.bigInteger('die_cents').notNullable();
    t.string('currency', 3).notNullable();
    t.date('priced_on').notNullable();
    t.decimal('rule_length_in', 10, 3).notNullable();
    t.decimal('cut_in', 10, 3).notNullable().defaultTo(0);
    t.decimal('crease_in', 10, 3).notNullable().defaultTo(0);
    t.decimal('perf_in', 10, 3).notNullable().defaultTo(0);
    t.decimal('kiss_in', 10, 3).notNullable().defaultTo(0);
    t.integer('bends').notNullable().defaultTo(0);
    t.integer('curves').notNullable().defaultTo(0);
    t.integer('joints').notNullable().defaultTo(0);
    t.integer('punches').notNullable().defaultTo(0);
    t.decimal('board_area_sq_in', 10, 2).notNullable().defaultTo(0);
    t.text('complexity').notNullable().checkIn(['simple', 'complex']);
    t.text('source').notNullable().defaultTo('award').checkIn(['award', 'import']);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id', 'priced_on']);
    t.index(['shop_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'price_records',
    'notifications',
    'awards',
    'request_declines',
    'shop_holidays',
    'bid_revisions',
    'bids',
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
  await knex.raw('DROP SEQUENCE IF EXISTS purchase_order_numbers');
  await knex.schema.alterTable('die_requests', (t) => {
    t.dropColumns(
      'bidding_closed_at',
      'closed_early',
      'production_started_at',
      'shipped_at',
      'tracking_note',
      'received_at',
      'received_condition',
      'received_notes',
    );
  });
}
