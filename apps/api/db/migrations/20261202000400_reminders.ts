import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // Which kinds of e-mail a user turned off: { "bid_deadline_24h": false, … }. In-app notices always come.
  await knex.schema.alterTable('users', (t) => {
    t.jsonb('preferences').notNullable().defaultTo('{}');
  });
  await knex.schema.alterTable('die_requests', (t) => {
    t.timestamp('late_flagged_at', { useTz: true });
  });
  // Each reminder is sent once: its key names the rule, the request and the moment it is for.
  await knex.schema.createTable('reminders_sent', (t) => {
    t.text('key').primary();
    t.integer('request_id').notNullable().references('die_requests.id').onDelete('CASCADE');
    t.text('kind').notNullable();
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['request_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('reminders_sent');
  await knex.schema.alterTable('die_requests', (t) => t.dropColumn('late_flagged_at'));
  await knex.schema.alterTable('users', (t) => t.dropColumn('preferences'));
}
