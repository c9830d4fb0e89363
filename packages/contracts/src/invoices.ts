import { z } from 'zod';
import type { InvoiceMatch, PaymentRecord } from '@kerfmark/pricing';
import { calendarDate } from './dateFields';

/** An invoice's life: submitted, then disputed (and replaced) or approved, then paid. */
export const invoiceStatuses = ['submitted', 'disputed', 'approved', 'paid', 'superseded'] as const;
export type InvoiceStatus = (typeof invoiceStatuses)[number];
export const invoiceStatusLabels: Record<InvoiceStatus, string> = {
  submitted: 'Awaiting approval',
  disputed: 'Disputed',
  approved: 'Approved for payment',
  paid: 'Paid',
  superseded: 'Replaced by a revision',
};

export const invoiceKinds = ['invoice', 'credit_note'] as const;
export type InvoiceKind = (typeof invoiceKinds)[number];

const MAX_CENTS = 100_000_000_00;
const reasonText = (error: string) => z.string({ error }).trim().min(2, error).max(2000, 'At most 2,000 characters');

/** One billed line: a purchase-order line (its index) or an extra line with a reason. */
export const InvoiceLine = z
  .object({
    orderLine: z.number().int().min(0).max(19).nullable(),
    label: z.string({ error: 'Name the line' }).trim().min(1, 'Name the line').max(200, 'At most 200 characters'),
    amountCents: z
      .number({ error: 'Enter an amount' })
      .int('Amounts are whole minor units')
      .min(-MAX_CENTS, 'That amount is too large')
      .max(MAX_CENTS, 'That amount is too large'),
    reason: z.string().trim().max(500, 'At most 500 characters').nullable().optional(),
  })
  .refine((l) => l.orderLine !== null || Boolean(l.reason), {
    error: 'Say why a line not on the purchase order is billed',
    path: ['reason'],
  });
export type InvoiceLine = z.infer<typeof InvoiceLine>;

const taxRateBp = z
  .number({ error: 'Enter the tax rate in basis points' })
  .int('The tax rate is in whole basis points (825 = 8.25 %)')
  .min(0, 'A tax rate cannot be negative')
  .max(10_000, 'A tax rate is at most 100 %');

/** Raising an invoice, or revising a disputed one: lines default to the awarded bid's. */
export const InvoiceInput = z.object({
  invoiceDate: calendarDate('Enter the invoice date'),
  lines: z
    .array(InvoiceLine)
    .max(40, 'At most 40 lines')
    .refine((lines) => lines.every((l) => l.amountCents >= 0), { error: 'An invoice bills; credit with a credit note' })
    .optional(),
  taxRateBp: taxRateBp.nullable().optional(),
  dies: z.number().int().min(0).max(1000).optional(),
});
export type InvoiceInput = z.infer<typeof InvoiceInput>;

/** A credit note after a dispute: negative amounts on the lines it corrects. */
export const CreditNoteInput = z.object({
  invoiceDate: calendarDate('Enter the credit note’s date'),
  lines: z
    .array(InvoiceLine)
    .min(1, 'Add at least one line')
    .max(40, 'At most 40 lines')
    .refine((lines) => lines.every((l) => l.amountCents < 0), { error: 'A credit note’s amounts are negative' }),
  taxRateBp: taxRateBp.nullable().optional(),
});
export type CreditNoteInput = z.infer<typeof CreditNoteInput>;

export const DisputeInput = z.object({ reason: reasonText('Say what is wrong with the invoice') });
export const ApproveInput = z.object({
  reason: z.string().trim().max(2000, 'At most 2,000 characters').optional(),
});
export const PaymentInput = z.object({
  paidOn: calendarDate('Enter the date it was paid'),
  reference: z.string({ error: 'Enter the payment reference' }).trim().min(1, 'Enter the payment reference').max(200),
  amountCents: z.number({ error: 'Enter the amount paid' }).int('Whole minor units').min(1).max(MAX_CENTS),
});
export type PaymentInput = z.infer<typeof PaymentInput>;

export interface InvoicePaymentDto {
  paidOn: string;
  reference: string;
  amountCents: number;
  recordedAt: string;
}

export interface InvoiceDto {
  id: number;
  requestId: number;
  kind: InvoiceKind;
  status: InvoiceStatus;
  invoiceNumber: string;
  version: number;
  replacesId: number | null;
  creditsId: number | null;
  invoiceDate: string;
  dueDate: string;
  currency: string;
  dies: number;
  lines: InvoiceLine[];
  subtotalCents: number;
  taxRateBp: number | null;
  taxCents: number;
  totalCents: number;
  disputeReason: string | null;
  approvalReason: string | null;
  createdAt: string;
  payments: InvoicePaymentDto[];
}

/** What a print buyer sees of an invoice: its status only. */
export interface InvoiceStatusDto {
  id: number;
  requestId: number;
  kind: InvoiceKind;
  status: InvoiceStatus;
}

/** The three-way match of the open invoice (with its credit notes) against the purchase order and the receipt. */
export interface InvoiceMatchDto {
  invoiceId: number;
  creditNoteIds: number[];
  toleranceCents: number;
  match: InvoiceMatch;
}

/** A payer's record of paying invoices (the pricing package's paymentRecord), per printer for a shop. */
export interface PrinterPaymentRecordDto extends PaymentRecord {
  printerId: number;
  printerName: string;
}
