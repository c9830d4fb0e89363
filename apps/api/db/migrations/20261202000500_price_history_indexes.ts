import type { Knex } from 'knex';

// The price history view filters a printer's records by date, complexity, shop and rule length.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('price_records', (t) => {
    t.index(['organisation_id', 'complexity', 'priced_on'], 'price_records_org_complexity_date');
    t.index(['organisation_id', 'rule_length_in'], 'price_records_org_length');
    t.index(['organisation_id', 'shop_id', 'priced_on'], 'price_records_org_shop_date');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('price_records', (t) => {
    t.dropIndex([], 'price_records_org_complexity_date');
    t.dropIndex([], 'price_records_org_length');
    t.dropIndex([], 'price_records_org_shop_date');
  });
}
