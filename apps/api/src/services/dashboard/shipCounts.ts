import type { Knex } from 'knex';

/**
 * The columns of a shop's shipping record over awards `a` joined to their requests `r`: dies
 * shipped, and those shipped on or before the ship date the shop promised.
 */
export function shipCounts(knex: Knex) {
  return [
    knex.raw('count(r.shipped_at)::int as shipped'),
    knex.raw('(count(*) filter (where r.shipped_at::date <= a.promised_ship_date))::int as on_time'),
  ];
}
