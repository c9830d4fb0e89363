import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('organisations', (t) => {
    t.increments('id');
    t.text('name').notNullable().unique();
    t.text('kind').notNullable().checkIn(['printer', 'die_shop']);
    t.text('time_zone').notNullable().defaultTo('UTC');
    t.text('postcode');
    t.text('country').notNullable().defaultTo('US');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('users', (t) => {
    t.increments('id');
    t.integer('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('email').notNullable().unique();
    t.text('name').notNullable();
    t.text('password_hash').notNullable();
    t.text('role').notNullable().checkIn(['buyer', 'purchasing', 'estimator', 'admin']);
    t.text('status').notNullable().defaultTo('active').checkIn(['active', 'disabled']);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('last_sign_in_at', { useTz: true });
    t.index(['organisation_id']);
  });

  await knex.schema.createTable('invitations', (t) => {
    t.increments('id');
    t.integer('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('email').notNullable();
    t.text('name').notNullable();
    t.text('role').notNullable();
    // Only a SHA-256 of the token is kept: a database leak gives no working links.
    t.text('token_hash').notNullable().unique();
    t.integer('invited_by').references('users.id').onDelete('SET NULL');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id']);
  });
  // One live invitation per address.
  await knex.raw(
    'CREATE UNIQUE INDEX invitations_pending_email ON invitations (email) WHERE accepted_at IS NULL AND revoked_at IS NULL',
  );

  await knex.schema.createTable('presses', (t) => {
    t.increments('id');
    t.integer('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('kind').notNullable().checkIn(['platen', 'flatbed', 'rotary']);
    t.decimal('max_sheet_width_in', 8, 3).notNullable();
    t.decimal('max_sheet_length_in', 8, 3).notNullable();
    t.integer('typical_speed_sph').notNullable();
    t.integer('max_speed_sph').notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['organisation_id', 'name']);
  });

  // Signed-out tokens until they would have expired anyway.
  await knex.schema.createTable('revoked_tokens', (t) => {
    t.uuid('jti').primary();
    t.timestamp('expires_at', { useTz: true }).notNullable().index();
  });

  await knex.schema.createTable('audit_log', (t) => {
    t.bigIncrements('id');
    t.integer('organisation_id').references('organisations.id').onDelete('CASCADE');
    t.integer('actor_user_id').references('users.id').onDelete('SET NULL');
    t.text('entity').notNullable();
    t.integer('entity_id').notNullable();
    t.text('action').notNullable();
    t.jsonb('detail').notNullable().defaultTo('{}');
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['entity', 'entity_id']);
    t.index(['organisation_id', 'at']);
  });

  // Every e-mail is written here first, in the same transaction as what caused it; the worker
  // delivers it, retries with backoff, and marks it sent, so nothing is lost or sent twice.
  await knex.schema.createTable('email_outbox', (t) => {
    t.bigIncrements('id');
    t.text('to_address').notNullable();
    t.text('subject').notNullable();
    t.text('text_body').notNullable();
    t.text('html_body');
    t.text('kind').notNullable();
    t.text('status').notNullable().defaultTo('pending').checkIn(['pending', 'sent', 'failed']);
    t.integer('attempts').notNullable().defaultTo(0);
    t.text('last_error');
    t.timestamp('next_attempt_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('sent_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("CREATE INDEX email_outbox_due ON email_outbox (next_attempt_at) WHERE status = 'pending'");
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'email_outbox',
    'audit_log',
    'revoked_tokens',
    'presses',
    'invitations',
    'users',
    'organisations',
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
}
