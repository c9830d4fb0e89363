import type { InvoiceInput, InvoiceLine } from '@kerfmark/contracts';
import type { OrderLine } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { badRequest } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';
import { Invoice } from '../../models';
import { auditInvoice } from './auditInvoice';
import { dueDateFor } from './dueDate';
import type { InvoiceContext } from './invoiceContext';
import { invoiceFigures } from './invoiceFigures';
import { nextInvoiceNumber } from './invoiceNumber';
import { orderLinesOf } from './orderLines';

/** The lines as given, checked against the purchase order's; none given bills the order as awarded. */
export function billedLines(given: readonly InvoiceLine[] | undefined, ordered: readonly OrderLine[]): InvoiceLine[] {
  if (!given)
    return ordered.map((l, index) => ({ orderLine: index, label: l.label, amountCents: l.amountCents, reason: null }));
  if (given.length === 0) throw badRequest('Add at least one line.', { lines: 'Add at least one line' });
  given.forEach((line, index) => {
    if (line.orderLine !== null && line.orderLine >= ordered.length)
      throw badRequest(
        `Line ${index + 1} names purchase-order line ${line.orderLine + 1}, which the order does not have.`,
        {
          [`lines.${index}.orderLine`]: `The purchase order has ${ordered.length} lines`,
        },
      );
  });
  return given.map((l) => ({ ...l, reason: l.reason ?? null }));
}

/** An invoice dated no earlier than the award it bills and no later than the shop's today. */
export function checkInvoiceDate(actor: AuthUser, ctx: InvoiceContext, invoiceDate: string): void {
  const awardedOn = todayIn(actor.timeZone, ctx.award.awardedAt);
  if (invoiceDate < awardedOn)
    throw badRequest(`The invoice cannot be dated before the award (${awardedOn}).`, {
      invoiceDate: `On or after ${awardedOn}`,
    });
  const today = todayIn(actor.timeZone);
  if (invoiceDate > today)
    throw badRequest('Date the invoice today or earlier.', { invoiceDate: `On or before ${today}` });
}

/** Writes a new invoice, or the next version of a disputed one, with its number, figures and due date. */
export async function writeInvoiceVersion(
  trx: Knex.Transaction,
  actor: AuthUser,
  ctx: InvoiceContext,
  input: InvoiceInput,
  replaces: Invoice | null,
): Promise<Invoice> {
  checkInvoiceDate(actor, ctx, input.invoiceDate);
  const lines = billedLines(input.lines, await orderLinesOf(trx, ctx.award));
  const dueDate = dueDateFor(ctx.printer, input.invoiceDate);
  const invoice = await Invoice.query(trx).insertAndFetch({
    requestId: ctx.request.id,
    awardId: ctx.award.id,
    shopId: ctx.award.shopId,
    printerId: ctx.printer.id,
    number: await nextInvoiceNumber(trx, ctx.award.shopId),
    version: replaces ? replaces.version + 1 : 1,
    replacesId: replaces?.id ?? null,
    kind: 'invoice',
    status: 'submitted',
    invoiceDate: input.invoiceDate,
    dueDate,
    currency: ctx.award.currency,
    dies: input.dies ?? 1,
    lines,
    ...invoiceFigures(lines, input.taxRateBp ?? null),
    raisedBy: actor.id,
  });
  await auditInvoice(trx, actor, invoice.id, replaces ? 'revised' : 'raised', {
    number: invoice.number,
    version: invoice.version,
    totalCents: invoice.totalCents,
    replaces: replaces?.id,
  });
  return invoice;
}
