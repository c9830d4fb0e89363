import type { CreditNoteInput } from '@kerfmark/contracts';
import { formatMoney } from '@kerfmark/pricing';
import { invoiceStepRefusal, refuse } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { badRequest, conflict } from '../../lib/httpError';
import { Invoice } from '../../models';
import { auditInvoice } from './auditInvoice';
import type { ServiceDeps } from '../deps';
import { invoiceContext, lockedInvoice, requestOfInvoice } from './invoiceContext';
import { invoiceFigures } from './invoiceFigures';
import { nextInvoiceNumber } from './invoiceNumber';
import { orderLinesOf } from './orderLines';
import { tellInvoice } from './tellInvoice';
import { billedLines, checkInvoiceDate } from './writeVersion';

/**
 * After a dispute the shop may credit part of a disputed invoice instead of revising it: negative
 * lines on the order lines they correct, taxed at the invoice's rate unless it says otherwise.
 * The invoice goes back to purchasing to approve or dispute again, matched with its credits.
 */
export async function creditInvoice(deps: ServiceDeps, actor: AuthUser, invoiceId: number, input: CreditNoteInput) {
  return deps.knex.transaction(async (trx) => {
    const ctx = await invoiceContext(trx, actor, await requestOfInvoice(trx, invoiceId), 'credit-note', 'update');
    const invoice = await lockedInvoice(trx, invoiceId);
    if (invoice.kind !== 'invoice') throw conflict('Credit the invoice itself, not a credit note.');
    const refusal = invoiceStepRefusal(invoice.status, 'credit');
    if (refusal) throw refuse(refusal);
    checkInvoiceDate(actor, ctx, input.invoiceDate);
    const lines = billedLines(input.lines, await orderLinesOf(trx, ctx.award));
    const figures = invoiceFigures(lines, input.taxRateBp === undefined ? invoice.taxRateBp : input.taxRateBp);
    const earlier = await Invoice.query(trx).where({ creditsId: invoice.id });
    const left = invoice.totalCents + earlier.reduce((sum, c) => sum + c.totalCents, 0);
    if (left + figures.totalCents < 0)
      throw badRequest(
        `A credit note cannot credit more than is left on the invoice (${formatMoney({ cents: left, currency: invoice.currency })}).`,
        { lines: 'Credit no more than is left on the invoice' },
      );
    const note = await Invoice.query(trx).insertAndFetch({
      requestId: invoice.requestId,
      awardId: invoice.awardId,
      shopId: invoice.shopId,
      printerId: invoice.printerId,
      number: await nextInvoiceNumber(trx, invoice.shopId),
      version: 1,
      creditsId: invoice.id,
      kind: 'credit_note',
      status: 'submitted',
      invoiceDate: input.invoiceDate,
      dueDate: input.invoiceDate > invoice.dueDate ? input.invoiceDate : invoice.dueDate,
      currency: invoice.currency,
      dies: 0,
      lines,
      ...figures,
      raisedBy: actor.id,
    });
    await invoice.$query(trx).patch({ status: 'submitted' });
    await auditInvoice(trx, actor, invoice.id, 'credited', {
      creditNoteId: note.id,
      number: note.number,
      totalCents: note.totalCents,
    });
    await tellInvoice(trx, deps, note, 'invoice_raised', (money, what) => ({
      title: `New ${what}: ${money} credited`,
      body: `The die shop sent ${what}, crediting ${money} against invoice ${invoice.number}. The invoice awaits your approval again.`,
    }));
    return note;
  });
}
