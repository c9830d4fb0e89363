import type { Knex } from 'knex';

// A die shop's holidays become records of their own: an id to remove one by, where the day came
// from (a country's public holidays, loaded, or the shop's own closure) and for which country and
// region, who added it and when. A public holiday the shop removes is kept as removed, so that
// loading the year again leaves it off. Still one day per shop and date.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop_holidays', (t) => {
    t.dropPrimary();
  });
  await knex('shop_holidays').whereNull('name').update({ name: 'Shop closed' });
  await knex.schema.alterTable('shop_holidays', (t) => {
    t.increments('id').primary();
    t.text('name').notNullable().alter();
    t.text('source').notNullable().defaultTo('own');
    t.text('country');
    t.text('region');
    t.integer('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('removed_at', { useTz: true });
    t.unique(['shop_id', 'date']);
  });
  await knex.raw(
    "ALTER TABLE shop_holidays ADD CONSTRAINT shop_holidays_source_check CHECK (source IN ('public', 'own'))",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex('shop_holidays').whereNotNull('removed_at').delete();
  await knex.raw('ALTER TABLE shop_holidays DROP CONSTRAINT shop_holidays_source_check');
  await knex.schema.alterTable('shop_holidays', (t) => {
    t.dropUnique(['shop_id', 'date']);
    t.dropColumns('id', 'source', 'country', 'region', 'created_by', 'created_at', 'removed_at');
    t.text('name').nullable().alter();
  });
  await knex.schema.alterTable('shop_holidays', (t) => {
    t.primary(['shop_id', 'date']);
  });
}
