import type { Knex } from 'knex';

// Dates and numbers follow a locale: each organisation has a default (en-GB outside the US,
// en-US in it) and each user may choose otherwise (null: the default).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('organisations', (t) => {
    t.text('locale').notNullable().defaultTo('en-US');
  });
  await knex.raw(`alter table organisations add constraint organisations_locale check (locale in ('en-US', 'en-GB'))`);
  await knex('organisations').whereNot({ country: 'US' }).update({ locale: 'en-GB' });
  await knex.schema.alterTable('users', (t) => {
    t.text('locale');
  });
  await knex.raw(`alter table users add constraint users_locale check (locale in ('en-US', 'en-GB'))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => t.dropColumn('locale'));
  await knex.schema.alterTable('organisations', (t) => t.dropColumn('locale'));
}
