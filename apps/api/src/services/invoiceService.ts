import type { CreditNoteInput, InvoiceInput, PaymentInput } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import type { ServiceDeps } from './deps';
import { creditInvoice } from './invoices/creditNote';
import { toInvoiceDto } from './invoices/invoiceDto';
import { printerPaymentRecord, shopPaymentRecords } from './invoices/paymentRecords';
import { raiseInvoice, reviseInvoice } from './invoices/raiseInvoice';
import { invoiceById, invoicesOfRequest, matchOfRequest } from './invoices/readInvoices';
import { recordPayment } from './invoices/recordPayment';
import { approveInvoice, disputeInvoice } from './invoices/settleInvoice';

/** The shop's invoice against a purchase order, the three-way match, approval and payment. */
export function createInvoiceService(deps: ServiceDeps) {
  const { knex } = deps;
  return {
    list: (actor: AuthUser, requestId: number) => invoicesOfRequest(knex, actor, requestId),
    get: (actor: AuthUser, invoiceId: number) => invoiceById(knex, actor, invoiceId),
    match: (actor: AuthUser, requestId: number) => matchOfRequest(knex, actor, requestId),
    raise: async (actor: AuthUser, requestId: number, input: InvoiceInput) =>
      toInvoiceDto(await raiseInvoice(deps, actor, requestId, input)),
    revise: async (actor: AuthUser, invoiceId: number, input: InvoiceInput) =>
      toInvoiceDto(await reviseInvoice(deps, actor, invoiceId, input)),
    credit: async (actor: AuthUser, invoiceId: number, input: CreditNoteInput) =>
      toInvoiceDto(await creditInvoice(deps, actor, invoiceId, input)),
    dispute: async (actor: AuthUser, invoiceId: number, reason: string) =>
      toInvoiceDto(await disputeInvoice(deps, actor, invoiceId, reason)),
    approve: async (actor: AuthUser, invoiceId: number, reason?: string) =>
      toInvoiceDto(await approveInvoice(deps, actor, invoiceId, reason)),
    pay: async (actor: AuthUser, invoiceId: number, input: PaymentInput) => {
      const { invoice, payments } = await recordPayment(deps, actor, invoiceId, input);
      return toInvoiceDto(invoice, payments);
    },
    record: (actor: AuthUser) =>
      actor.orgKind === 'die_shop' ? shopPaymentRecords(knex, actor) : printerPaymentRecord(knex, actor),
  };
}
