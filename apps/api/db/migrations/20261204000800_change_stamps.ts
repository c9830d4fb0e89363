import type { Knex } from 'knex';

// What the die shops' board shows changes when a request, an organisation or a shop's bid
// changes, by any route (the measure trigger of migration 009 included). Each such row keeps
// the moment it last changed, stamped by the database on every update, so that the newest
// stamp and the count among the rows a board reads tell whether the board is still current.
const TABLES = ['die_requests', 'organisations', 'bids'] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create function stamp_changed_at() returns trigger language plpgsql as $$
    begin
      new.changed_at := clock_timestamp();
      return new;
    end $$;
  `);
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.timestamp('changed_at', { useTz: true }).notNullable().defaultTo(knex.raw('clock_timestamp()'));
    });
    await knex.raw(
      `create trigger ${table}_changed_at before update on ${table} for each row execute function stamp_changed_at()`,
    );
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const table of TABLES) {
    await knex.raw(`drop trigger if exists ${table}_changed_at on ${table}`);
    await knex.schema.alterTable(table, (t) => t.dropColumn('changed_at'));
  }
  await knex.raw('drop function if exists stamp_changed_at()');
}
