import type { Knex } from 'knex';

// The cutting rule height a press's dies are made to (0.937 in or 0.918 in), and corrugated
// board's crushed thickness, on which its creasing rule and channel are sized.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('presses', (t) => {
    t.decimal('cutting_rule_height_in', 5, 3).notNullable().defaultTo(0.937);
  });
  await knex.raw(
    'alter table presses add constraint presses_rule_height_check check (cutting_rule_height_in in (0.937, 0.918))',
  );
  await knex.schema.alterTable('die_requests', (t) => {
    t.decimal('crushed_caliper_in', 6, 4);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.dropColumn('crushed_caliper_in');
  });
  await knex.schema.alterTable('presses', (t) => {
    t.dropChecks('presses_rule_height_check');
    t.dropColumn('cutting_rule_height_in');
  });
}
