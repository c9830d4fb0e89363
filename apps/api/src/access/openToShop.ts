import type { Knex } from 'knex';

/** Any query builder, Knex's or Objection's, as far as the condition below needs it. */
interface Conditions {
  where(column: string, value: unknown): Conditions;
  orWhereIn(column: string, values: Knex.QueryBuilder): Conditions;
}

/**
 * The condition that a request is open to this die shop: posted to every shop, or the shop was
 * invited. For `.where(...)`; `table` names the requests' table or its alias in the query.
 */
export function openToShop(knex: Knex, shopId: number, table = 'die_requests') {
  return (q: Conditions) =>
    q
      .where(`${table}.visibility`, 'public')
      .orWhereIn(`${table}.id`, knex('request_invitations').where('shop_id', shopId).select('request_id'));
}

/**
 * The open-requests condition, the SQL form of "bidding is open and the request is open to this shop"
 * (`biddingOpen` and `maySee`): open, before its deadline, public or the shop invited.
 */
export function biddableByShop(knex: Knex, shopId: number, table = 'die_requests') {
  return (q: Knex.QueryBuilder) =>
    q
      .where(`${table}.status`, 'open')
      .where(`${table}.bid_deadline`, '>', knex.fn.now())
      .where(openToShop(knex, shopId, table));
}
