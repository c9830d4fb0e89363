import type { Knex } from 'knex';

/**
 * The next number of the shop's own invoice sequence, taken inside the caller's transaction:
 * the upsert locks the shop's counter row, so two invoices at once get two numbers, and a
 * rolled-back insert gives its number back.
 */
export async function nextInvoiceNumber(trx: Knex.Transaction, shopId: number): Promise<number> {
  const { rows } = await trx.raw<{ rows: Array<{ number: number }> }>(
    `insert into invoice_sequences (shop_id, last_number) values (?, 1)
     on conflict (shop_id) do update set last_number = invoice_sequences.last_number + 1
     returning last_number as "number"`,
    [shopId],
  );
  return rows[0]!.number;
}
