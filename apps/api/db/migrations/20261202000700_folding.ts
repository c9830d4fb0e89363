import type { Knex } from 'knex';

// What the scoring advice reads about the folds, and the stock weight as the buyer entered it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.text('stock_kind').notNullable().defaultTo('paperboard').checkIn(['paper', 'paperboard', 'corrugated']);
    t.text('stock_weight_entry');
    t.boolean('fold_across_grain');
    t.boolean('heavy_ink_on_fold');
    t.boolean('colour_break_on_fold');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('die_requests', (t) => {
    t.dropColumns('stock_kind', 'stock_weight_entry', 'fold_across_grain', 'heavy_ink_on_fold', 'colour_break_on_fold');
  });
}
