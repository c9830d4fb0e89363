import type { Knex } from 'knex';

/**
 * The next purchase-order number, "PO-<year>-<five digits>", from one database sequence, so two
 * awards at once never share a number. The year is the award's (UTC).
 */
export async function nextPurchaseOrderNumber(knex: Knex | Knex.Transaction, awardedAt: Date): Promise<string> {
  const { nextval } = (await knex.raw("SELECT nextval('purchase_order_numbers') AS nextval")).rows[0] as {
    nextval: string;
  };
  return `PO-${awardedAt.getUTCFullYear()}-${String(nextval).padStart(5, '0')}`;
}
