import { invoiceStepRefusal, refuse, type InvoiceStep } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { badRequest, conflict } from '../../lib/httpError';
import { Invoice } from '../../models';
import { auditInvoice } from './auditInvoice';
import type { ServiceDeps } from '../deps';
import { invoiceContext, lockedInvoice, requestOfInvoice, type InvoiceContext } from './invoiceContext';
import { matchOfInvoice } from './invoiceMatch';
import { tellInvoice } from './tellInvoice';
import type { Knex } from 'knex';

type SettleAction = 'dispute-invoice' | 'approve-invoice' | 'record-payment';

/**
 * Purchasing's step on an invoice, inside one transaction: the request row and then the
 * invoice row are locked, so of two approvals at once the second finds it approved (409).
 */
export async function settleStep<T>(
  deps: ServiceDeps,
  actor: AuthUser,
  invoiceId: number,
  action: SettleAction,
  step: InvoiceStep,
  work: (trx: Knex.Transaction, ctx: InvoiceContext, invoice: Invoice) => Promise<T>,
): Promise<T> {
  return deps.knex.transaction(async (trx) => {
    const ctx = await invoiceContext(trx, actor, await requestOfInvoice(trx, invoiceId), action, 'update');
    const invoice = await lockedInvoice(trx, invoiceId);
    if (invoice.kind !== 'invoice') throw conflict('A credit note is settled with its invoice.');
    const refusal = invoiceStepRefusal(invoice.status, step);
    if (refusal) throw refuse(refusal);
    return work(trx, ctx, invoice);
  });
}

/** Purchasing disputes an invoice with a reason; the shop may then revise it or credit part of it. */
export function disputeInvoice(deps: ServiceDeps, actor: AuthUser, invoiceId: number, reason: string) {
  return settleStep(deps, actor, invoiceId, 'dispute-invoice', 'dispute', async (trx, _ctx, invoice) => {
    const disputed = await invoice
      .$query(trx)
      .patchAndFetch({ status: 'disputed', disputeReason: reason, disputedBy: actor.id, disputedAt: new Date() });
    await auditInvoice(trx, actor, invoice.id, 'disputed', { reason });
    await tellInvoice(trx, deps, invoice, 'invoice_disputed', (money, what) => ({
      title: `Disputed: ${what}`,
      body: `The printer disputed ${what} (${money}): ${reason} Send a revised invoice or a credit note.`,
    }));
    return disputed;
  });
}

/**
 * Purchasing approves an invoice for payment. One whose match flags a difference needs a written
 * reason, as an award above the lowest bid does (common purchasing practice).
 */
export function approveInvoice(deps: ServiceDeps, actor: AuthUser, invoiceId: number, reason?: string) {
  return settleStep(deps, actor, invoiceId, 'approve-invoice', 'approve', async (trx, ctx, invoice) => {
    const { match } = await matchOfInvoice(trx, ctx, invoice);
    const written = reason?.trim() || null;
    if (!match.matched && !written)
      throw badRequest(`The invoice does not match: ${match.flags.join('; ')}. Say why you approve it anyway.`, {
        reason: 'Write why you approve an invoice that does not match',
      });
    const approved = await invoice
      .$query(trx)
      .patchAndFetch({ status: 'approved', approvalReason: written, approvedBy: actor.id, approvedAt: new Date() });
    await Invoice.query(trx).patch({ status: 'approved' }).where({ creditsId: invoice.id });
    await auditInvoice(trx, actor, invoice.id, 'approved', { reason: written, flags: match.flags });
    await tellInvoice(trx, deps, invoice, 'invoice_approved', (money, what) => ({
      title: `Approved for payment: ${what}`,
      body: `The printer approved ${what} for payment (${money} before any credit notes), due ${invoice.dueDate}.`,
    }));
    return approved;
  });
}
