import type { Knex } from 'knex';

// A die shop's rate card: its rates in integer minor units of the card's currency, kept as one
// document (the shop edits it whole), one per shop.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('rate_cards', (t) => {
    t.integer('organisation_id').primary().references('organisations.id').onDelete('CASCADE');
    t.string('currency', 3).notNullable();
    t.jsonb('rates').notNullable();
    t.integer('updated_by').references('users.id').onDelete('SET NULL');
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rate_cards');
}
