import type { InvoiceDto, InvoiceMatchDto, InvoiceStatusDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { forbidden, notFound } from '../../lib/httpError';
import { Invoice, InvoicePayment } from '../../models';
import { invoiceContext, openInvoice, requestOfInvoice } from './invoiceContext';
import { toInvoiceDto, toInvoiceStatus } from './invoiceDto';
import { matchOfInvoice } from './invoiceMatch';

/** Every version and credit note of a request's invoicing, oldest first; a print buyer sees the status only. */
export async function invoicesOfRequest(
  knex: Knex,
  actor: AuthUser,
  requestId: number,
): Promise<InvoiceDto[] | InvoiceStatusDto[]> {
  const ctx = await invoiceContext(knex, actor, requestId, 'see-invoice');
  const invoices = await Invoice.query(knex).where({ requestId }).orderBy('id');
  if (ctx.buyerOnly) return invoices.map(toInvoiceStatus);
  const payments = await InvoicePayment.query(knex)
    .whereIn(
      'invoiceId',
      invoices.map((i) => i.id),
    )
    .orderBy('id');
  return invoices.map((i) => toInvoiceDto(i, payments));
}

/** One invoice or credit note; another organisation's is a 404, a print buyer sees its status only. */
export async function invoiceById(
  knex: Knex,
  actor: AuthUser,
  invoiceId: number,
): Promise<InvoiceDto | InvoiceStatusDto> {
  const ctx = await invoiceContext(knex, actor, await requestOfInvoice(knex, invoiceId), 'see-invoice');
  const invoice = await Invoice.query(knex).findById(invoiceId).throwIfNotFound();
  if (ctx.buyerOnly) return toInvoiceStatus(invoice);
  return toInvoiceDto(invoice, await InvoicePayment.query(knex).where({ invoiceId }).orderBy('id'));
}

/** The three-way match of the request's open invoice, for the printer's purchasing and the shop. */
export async function matchOfRequest(knex: Knex, actor: AuthUser, requestId: number): Promise<InvoiceMatchDto> {
  const ctx = await invoiceContext(knex, actor, requestId, 'see-invoice');
  if (ctx.buyerOnly) throw forbidden('Only purchasing and admins see and settle invoices.');
  const invoice = await openInvoice(knex, requestId);
  if (!invoice) throw notFound('An invoice on this purchase order');
  return matchOfInvoice(knex, ctx, invoice);
}
