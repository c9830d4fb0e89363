import { Model } from 'objection';

/** A payment purchasing recorded against an approved invoice. */
export class InvoicePayment extends Model {
  static override tableName = 'invoice_payments';

  id!: number;
  invoiceId!: number;
  paidOn!: string;
  reference!: string;
  amountCents!: number;
  recordedBy!: number | null;
  recordedAt!: Date;
}
