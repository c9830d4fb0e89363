import type { InvoiceMatchDto } from '@kerfmark/contracts';
import { matchInvoice } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { Invoice } from '../../models';
import type { InvoiceContext } from './invoiceContext';
import { orderLinesOf } from './orderLines';

/**
 * The three-way match of an invoice and its credit notes: the purchase order's lines (the
 * awarded bid), one die ordered, the receipt from the request's received fields, and the
 * printer's tolerance. Amounts are before tax: the order carries none.
 */
export async function matchOfInvoice(
  trx: Knex | Knex.Transaction,
  ctx: InvoiceContext,
  invoice: Invoice,
): Promise<InvoiceMatchDto> {
  const credits = await Invoice.query(trx).where({ creditsId: invoice.id }).orderBy('id');
  const { request, printer } = ctx;
  const match = matchInvoice({
    currency: invoice.currency,
    ordered: { dies: 1, lines: await orderLinesOf(trx, ctx.award) },
    received: request.receivedAt ? { dies: 1, condition: request.receivedCondition ?? 'good' } : null,
    invoiced: { dies: invoice.dies, lines: [...invoice.lines, ...credits.flatMap((c) => c.lines)] },
    toleranceCents: printer.invoiceToleranceCents,
    locale: printer.locale,
  });
  return {
    invoiceId: invoice.id,
    creditNoteIds: credits.map((c) => c.id),
    toleranceCents: printer.invoiceToleranceCents,
    match,
  };
}
