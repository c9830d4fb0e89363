import { Model } from 'objection';
import type { InvoiceKind, InvoiceLine, InvoiceStatus } from '@kerfmark/contracts';

/** One version of a shop's invoice against a purchase order, or a credit note against one (migration 20261205000100). */
export class Invoice extends Model {
  static override tableName = 'invoices';

  id!: number;
  requestId!: number;
  awardId!: number;
  shopId!: number;
  printerId!: number;
  /** From the shop's own sequence. */
  number!: number;
  version!: number;
  /** The disputed version this one replaces. */
  replacesId!: number | null;
  /** A credit note's invoice. */
  creditsId!: number | null;
  kind!: InvoiceKind;
  status!: InvoiceStatus;
  invoiceDate!: string;
  dueDate!: string;
  currency!: string;
  dies!: number;
  lines!: InvoiceLine[];
  subtotalCents!: number;
  taxRateBp!: number | null;
  taxCents!: number;
  totalCents!: number;
  disputeReason!: string | null;
  approvalReason!: string | null;
  raisedBy!: number | null;
  disputedBy!: number | null;
  disputedAt!: Date | null;
  approvedBy!: number | null;
  approvedAt!: Date | null;
  createdAt!: Date;

  static override get jsonAttributes() {
    return ['lines'];
  }
}
