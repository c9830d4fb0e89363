import type { InvoiceDto, InvoiceStatusDto } from '@kerfmark/contracts';
import type { Invoice, InvoicePayment } from '../../models';

/** An invoice as the shop that raised it and the printer's purchasing read it. */
export function toInvoiceDto(invoice: Invoice, payments: readonly InvoicePayment[] = []): InvoiceDto {
  return {
    id: invoice.id,
    requestId: invoice.requestId,
    kind: invoice.kind,
    status: invoice.status,
    invoiceNumber: String(invoice.number),
    version: invoice.version,
    replacesId: invoice.replacesId,
    creditsId: invoice.creditsId,
    invoiceDate: invoice.invoiceDate,
    dueDate: invoice.dueDate,
    currency: invoice.currency,
    dies: invoice.dies,
    lines: invoice.lines,
    subtotalCents: invoice.subtotalCents,
    taxRateBp: invoice.taxRateBp,
    taxCents: invoice.taxCents,
    totalCents: invoice.totalCents,
    disputeReason: invoice.disputeReason,
    approvalReason: invoice.approvalReason,
    createdAt: invoice.createdAt.toISOString(),
    payments: payments
      .filter((p) => p.invoiceId === invoice.id)
      .map((p) => ({
        paidOn: p.paidOn,
        reference: p.reference,
        amountCents: p.amountCents,
        recordedAt: p.recordedAt.toISOString(),
      })),
  };
}

/** What a print buyer sees: where the invoice stands, nothing of its money. */
export const toInvoiceStatus = (invoice: Invoice): InvoiceStatusDto => ({
  id: invoice.id,
  requestId: invoice.requestId,
  kind: invoice.kind,
  status: invoice.status,
});
