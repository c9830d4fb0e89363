import type { Knex } from 'knex';

// Lengths are shown in inches or millimetres: each organisation has a default (millimetres outside
// the US, common practice in the trade) and each user may choose otherwise (null: the default).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('organisations', (t) => {
    t.text('length_units').notNullable().defaultTo('in');
  });
  await knex.raw(
    `alter table organisations add constraint organisations_length_units check (length_units in ('in', 'mm'))`,
  );
  await knex('organisations').whereNot({ country: 'US' }).update({ length_units: 'mm' });
  await knex.schema.alterTable('users', (t) => {
    t.text('length_units');
  });
  await knex.raw(`alter table users add constraint users_length_units check (length_units in ('in', 'mm'))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => t.dropColumn('length_units'));
  await knex.schema.alterTable('organisations', (t) => t.dropColumn('length_units'));
}
