import type { InvoiceAction } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { actionRefusal, loadFacts, refuse, type RequestFacts } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { notFound } from '../../lib/httpError';
import { Award, Invoice, Organisation, type DieRequest } from '../../models';

export interface InvoiceContext {
  request: DieRequest;
  facts: RequestFacts;
  award: Award;
  printer: Organisation;
}

/**
 * A request's invoicing, when the access module lets the actor take the action: its facts,
 * award and printer. Writers lock the request row, so that one request's invoices change one
 * at a time. A print buyer's refused read is left to the caller (`buyerOnly`), which shows the status.
 */
export async function invoiceContext(
  trx: Knex | Knex.Transaction,
  actor: AuthUser,
  requestId: number,
  action: InvoiceAction,
  lock?: 'update',
): Promise<InvoiceContext & { buyerOnly: boolean }> {
  const found = await loadFacts(trx, requestId, lock);
  if (!found) throw notFound('That die request');
  const refusal = actionRefusal(actor, found.facts, action, new Date());
  const buyerOnly =
    action === 'see-invoice' && refusal?.status === 403 && actor.orgKind === 'printer' && actor.role === 'buyer';
  if (refusal && !buyerOnly) throw refuse(refusal);
  const award = await Award.query(trx).findOne({ requestId });
  if (!award) throw notFound('That invoice');
  const printer = await Organisation.query(trx).findById(found.request.organisationId).throwIfNotFound();
  return { ...found, award, printer, buyerOnly };
}

/** An invoice's request id, or a 404 as for any record the actor cannot see. */
export async function requestOfInvoice(trx: Knex | Knex.Transaction, invoiceId: number): Promise<number> {
  const row = await Invoice.query(trx).findById(invoiceId).select('requestId');
  if (!row) throw notFound('That invoice');
  return row.requestId;
}

/** The invoice, locked for the change, once the actor's right to it is known. */
export async function lockedInvoice(trx: Knex.Transaction, invoiceId: number): Promise<Invoice> {
  const invoice = await Invoice.query(trx).findById(invoiceId).forUpdate();
  if (!invoice) throw notFound('That invoice');
  return invoice;
}

/** The invoice (not a credit note, not superseded) now open on the request's purchase order, if any. */
export async function openInvoice(trx: Knex | Knex.Transaction, requestId: number, lock = false) {
  const query = Invoice.query(trx).findOne({ requestId, kind: 'invoice' }).whereNot('status', 'superseded');
  if (lock) query.forUpdate();
  return query;
}
