import type { Knex } from 'knex';

// A press runs a number of shifts a day of some length: the die-cutting run's working days come from both.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('presses', (t) => {
    t.integer('shifts_per_day').notNullable().defaultTo(1);
    t.decimal('shift_hours', 4, 2).notNullable().defaultTo(8);
  });
  await knex.raw(
    'alter table presses add constraint presses_shifts_check check (shifts_per_day between 1 and 3 and shift_hours > 0 and shifts_per_day * shift_hours <= 24)',
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('presses', (t) => {
    t.dropChecks('presses_shifts_check');
    t.dropColumn('shifts_per_day');
    t.dropColumn('shift_hours');
  });
}
