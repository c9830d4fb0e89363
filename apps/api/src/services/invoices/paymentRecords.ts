import type { PrinterPaymentRecordDto } from '@kerfmark/contracts';
import { paymentRecord, type PaidInvoice, type PaymentRecord } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import type { AuthUser } from '../../auth/passport';
import { forbidden } from '../../lib/httpError';
import { todayIn } from '../../lib/todayIn';

interface Row extends PaidInvoice {
  printerId: number;
  printerName: string;
}

/**
 * The invoices that count towards paying on time: every one not replaced by a revision and not
 * in dispute (a disputed invoice waits on the shop), with the day it was paid.
 */
function countedInvoices(knex: Knex, where: { shopId?: number; printerId?: number }) {
  const query = knex('invoices as i')
    .join('organisations as o', 'o.id', 'i.printerId')
    .where('i.kind', 'invoice')
    .whereIn('i.status', ['submitted', 'approved', 'paid'])
    .select(
      'i.printerId',
      'o.name as printerName',
      'i.invoiceDate',
      'i.dueDate',
      knex.raw('(select max(p.paid_on) from invoice_payments p where p.invoice_id = i.id) as "paidOn"'),
    )
    .orderBy('i.id');
  if (where.shopId) query.where('i.shopId', where.shopId);
  if (where.printerId) query.where('i.printerId', where.printerId);
  return query as unknown as Promise<Row[]>;
}

/** A die shop's record of how each printer pays the shop's own invoices: on time, and days to pay. */
export async function shopPaymentRecords(knex: Knex, actor: AuthUser): Promise<PrinterPaymentRecordDto[]> {
  const rows = await countedInvoices(knex, { shopId: actor.organisationId });
  const today = todayIn(actor.timeZone);
  const byPrinter = new Map<number, Row[]>();
  for (const row of rows) byPrinter.set(row.printerId, [...(byPrinter.get(row.printerId) ?? []), row]);
  return [...byPrinter.values()].map((invoices) => ({
    printerId: invoices[0]!.printerId,
    printerName: invoices[0]!.printerName,
    ...paymentRecord(invoices, today),
  }));
}

/** A printer's own record of paying its die shops on time, for its purchasing and admins. */
export async function printerPaymentRecord(knex: Knex, actor: AuthUser): Promise<PaymentRecord> {
  if (actor.role === 'buyer') throw forbidden('Only purchasing and admins see the payment record.');
  return paymentRecord(await countedInvoices(knex, { printerId: actor.organisationId }), todayIn(actor.timeZone));
}
