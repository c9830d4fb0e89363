import type { PaymentInput } from '@kerfmark/contracts';
import { formatMoney } from '@kerfmark/pricing';
import type { AuthUser } from '../../auth/passport';
import { badRequest } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';
import { Invoice, InvoicePayment } from '../../models';
import { auditInvoice } from './auditInvoice';
import type { ServiceDeps } from '../deps';
import { settleStep } from './settleInvoice';
import { tellInvoice } from './tellInvoice';

/**
 * Purchasing records the payment of an approved invoice: the amount due is the invoice's total
 * less its credit notes, paid in one payment, on a day from the invoice date to today.
 */
export function recordPayment(deps: ServiceDeps, actor: AuthUser, invoiceId: number, input: PaymentInput) {
  return settleStep(deps, actor, invoiceId, 'record-payment', 'pay', async (trx, ctx, invoice) => {
    const credits = await Invoice.query(trx).where({ creditsId: invoice.id });
    const dueCents = invoice.totalCents + credits.reduce((sum, c) => sum + c.totalCents, 0);
    const money = (cents: number) => formatMoney({ cents, currency: invoice.currency }, ctx.printer.locale);
    if (input.amountCents !== dueCents)
      throw badRequest(
        `Record the payment in full: ${money(dueCents)} is due, not ${money(input.amountCents)}. ` +
          'Part payments are not recorded yet; if the amount is wrong, dispute the invoice before approving it.',
        { amountCents: `${money(dueCents)} is due` },
      );
    const today = todayIn(ctx.printer.timeZone);
    if (input.paidOn > today) throw badRequest('Record a payment once made.', { paidOn: `On or before ${today}` });
    if (input.paidOn < invoice.invoiceDate)
      throw badRequest('The payment cannot be dated before the invoice.', {
        paidOn: `On or after ${invoice.invoiceDate}`,
      });
    const payment = await InvoicePayment.query(trx).insertAndFetch({ invoiceId, ...input, recordedBy: actor.id });
    const paid = await invoice.$query(trx).patchAndFetch({ status: 'paid' });
    await Invoice.query(trx).patch({ status: 'paid' }).where({ creditsId: invoice.id });
    await auditInvoice(trx, actor, invoice.id, 'paid', {
      paymentId: payment.id,
      paidOn: input.paidOn,
      amountCents: input.amountCents,
    });
    await tellInvoice(
      trx,
      deps,
      invoice,
      'invoice_paid',
      (amount, what) => ({
        title: `Paid: ${what}`,
        body: `The printer paid ${amount} on ${what} on ${input.paidOn} (reference ${input.reference}).`,
      }),
      dueCents,
    );
    return { invoice: paid, payments: [payment] };
  });
}
