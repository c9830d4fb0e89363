import { describe, expect, it } from 'vitest';
import { AuditEntry, Invoice, Notification, Organisation } from '../../models';
import { actorOf, createShop, createWorld, deps, knex, type World } from '../../test/harness';
import { callAs, createRequestAt } from '../../test/requestStages';
import { todayIn } from '../../lib/todayIn';
import { addCalendarDays } from '@kerfmark/pricing';
import { creditInvoice } from './creditNote';
import { printerPaymentRecord, shopPaymentRecords } from './paymentRecords';
import { raiseInvoice, reviseInvoice } from './raiseInvoice';
import { invoicesOfRequest, matchOfRequest } from './readInvoices';
import { recordPayment } from './recordPayment';
import { approveInvoice, disputeInvoice } from './settleInvoice';

// The world's die shop bid 800.00 for the die and 35.00 for ground shipping (test/fixtures bidBody),
// won, and shipped the die; the printer's terms are Net 30.
async function shippedJob(terms: string | null = 'Net 30') {
  const w = await createWorld();
  const staged = await createRequestAt(w, 'shipped');
  await Organisation.query().findById(w.printer.id).patch({ paymentTerms: terms });
  return {
    w,
    requestId: staged.id,
    shop: actorOf(w.users.estimator, w.shop),
    purchasing: actorOf(w.users.purchasing, w.printer),
    buyer: actorOf(w.users.buyer, w.printer),
    today: todayIn(w.shop.timeZone),
  };
}

const receive = (w: World, requestId: number) =>
  callAs(w, 'buyer', 'post', `/api/requests/${requestId}/receive`, { condition: 'good' }, 200);

describe('an invoice from raising to payment', () => {
  it('raises, disputes, credits, matches, approves and pays, keeping the audit and telling each side', async () => {
    const { w, requestId, shop, purchasing, today } = await shippedJob();
    // Shipping billed at 60.00 against 35.00 ordered; tax 8.25 % of 860.00 = 70.95 (by hand).
    const invoice = await raiseInvoice(deps, shop, requestId, {
      invoiceDate: today,
      taxRateBp: 825,
      lines: [
        { orderLine: 0, label: 'Die', amountCents: 80_000 },
        { orderLine: 1, label: 'Shipping', amountCents: 6_000 },
      ],
    });
    expect(invoice).toMatchObject({
      status: 'submitted',
      version: 1,
      subtotalCents: 86_000,
      taxCents: 7_095,
      totalCents: 93_095,
      dueDate: addCalendarDays(today, 30),
      currency: 'USD',
    });
    await expect(raiseInvoice(deps, shop, requestId, { invoiceDate: today })).rejects.toMatchObject({ status: 409 });

    const first = await matchOfRequest(knex, purchasing, requestId);
    expect(first.match.flags).toEqual(['Shipping: Ground invoiced $25.00 over the PO', 'Nothing received yet']);
    await expect(approveInvoice(deps, purchasing, invoice.id)).rejects.toMatchObject({
      status: 400,
      fields: { reason: expect.stringMatching(/does not match/) },
    });

    await disputeInvoice(deps, purchasing, invoice.id, 'Shipping was quoted at $35.00.');
    await expect(approveInvoice(deps, purchasing, invoice.id, 'ok')).rejects.toMatchObject({ status: 409 });
    // Credit 25.00 on shipping; its tax at 8.25 % is −2.0625, so −2.06, and the note is −27.06.
    const note = await creditInvoice(deps, shop, invoice.id, {
      invoiceDate: today,
      lines: [{ orderLine: 1, label: 'Shipping correction', amountCents: -2_500 }],
    });
    expect(note).toMatchObject({ kind: 'credit_note', creditsId: invoice.id, totalCents: -2_706 });
    expect((await Invoice.query().findById(invoice.id))?.status).toBe('submitted');

    await receive(w, requestId);
    const second = await matchOfRequest(knex, purchasing, requestId);
    expect(second.match).toMatchObject({ matched: true, flags: [], invoicedCents: 83_500, orderedCents: 83_500 });

    // Two approvals at once: the invoice row is locked, so the second finds it approved.
    const both = await Promise.allSettled([
      approveInvoice(deps, purchasing, invoice.id),
      approveInvoice(deps, purchasing, invoice.id),
    ]);
    expect(both.map((r) => r.status).sort()).toEqual(['fulfilled', 'rejected']);
    expect(both.find((r) => r.status === 'rejected')).toMatchObject({ reason: { status: 409 } });

    // Due: 930.95 − 27.06 = 903.89.
    await expect(
      recordPayment(deps, purchasing, invoice.id, { paidOn: today, reference: 'ACH 1182', amountCents: 93_095 }),
    ).rejects.toMatchObject({ status: 400, message: /\$903\.89 is due, not \$930\.95/ });
    const { invoice: paid } = await recordPayment(deps, purchasing, invoice.id, {
      paidOn: today,
      reference: 'ACH 1182',
      amountCents: 90_389,
    });
    expect(paid.status).toBe('paid');
    expect((await Invoice.query().findById(note.id))?.status).toBe('paid');

    const audit = await AuditEntry.query().where({ entity: 'invoice', entityId: invoice.id }).orderBy('id');
    expect(audit.map((a) => a.action)).toEqual(['raised', 'disputed', 'credited', 'approved', 'paid']);
    const shopKinds = await Notification.query().where({ userId: w.users.estimator.id }).select('kind');
    expect(shopKinds.map((n) => n.kind)).toEqual(
      expect.arrayContaining(['invoice_disputed', 'invoice_approved', 'invoice_paid']),
    );
    const buyerKinds = await Notification.query().where({ userId: w.users.buyer.id }).select('kind');
    expect(buyerKinds.map((n) => n.kind)).not.toContain('invoice_raised');

    // Paid on the invoice date, 30 days before it was due: on time, 0 days to pay.
    expect(await shopPaymentRecords(knex, shop)).toEqual([
      expect.objectContaining({ printerId: w.printer.id, paid: 1, paidOnTime: 1, onTimeRate: 1, averageDaysToPay: 0 }),
    ]);
    expect(await printerPaymentRecord(knex, purchasing)).toMatchObject({ paid: 1, onTimeRate: 1, overdue: 0 });
  });

  it('keeps every version: a revision supersedes the disputed invoice and takes the next number', async () => {
    const { requestId, shop, purchasing, buyer, today } = await shippedJob();
    const first = await raiseInvoice(deps, shop, requestId, { invoiceDate: today });
    expect(first).toMatchObject({ subtotalCents: 83_500, taxCents: 0, totalCents: 83_500 });
    await expect(reviseInvoice(deps, shop, first.id, { invoiceDate: today, taxRateBp: 0 })).rejects.toMatchObject({
      status: 409,
    });
    await disputeInvoice(deps, purchasing, first.id, 'Our PO number is missing.');
    const second = await reviseInvoice(deps, shop, first.id, { invoiceDate: today });
    expect(second).toMatchObject({ version: 2, replacesId: first.id, number: first.number + 1, status: 'submitted' });
    const all = await invoicesOfRequest(knex, purchasing, requestId);
    expect(all.map((i) => [i.id, i.status])).toEqual([
      [first.id, 'superseded'],
      [second.id, 'submitted'],
    ]);
    // A print buyer sees where the invoices stand, nothing of their money.
    expect(await invoicesOfRequest(knex, buyer, requestId)).toEqual([
      { id: first.id, requestId, kind: 'invoice', status: 'superseded' },
      { id: second.id, requestId, kind: 'invoice', status: 'submitted' },
    ]);
  });

  it('refuses out of turn: payment before approval, a credit note before a dispute, a buyer approving, another shop', async () => {
    const { requestId, shop, purchasing, buyer, today } = await shippedJob();
    const invoice = await raiseInvoice(deps, shop, requestId, { invoiceDate: today });
    const pay = { paidOn: today, reference: 'Cheque 311', amountCents: 83_500 };
    await expect(recordPayment(deps, purchasing, invoice.id, pay)).rejects.toMatchObject({
      status: 409,
      message: /Approve it for payment first/,
    });
    const credit = { invoiceDate: today, lines: [{ orderLine: 0, label: 'Die', amountCents: -1_000 }] };
    await expect(creditInvoice(deps, shop, invoice.id, credit)).rejects.toMatchObject({ status: 409 });
    await expect(approveInvoice(deps, buyer, invoice.id)).rejects.toMatchObject({ status: 403 });
    const other = await createShop();
    const stranger = actorOf(other.estimator, other.shop);
    await expect(approveInvoice(deps, stranger, invoice.id)).rejects.toMatchObject({ status: 404 });
    await expect(raiseInvoice(deps, stranger, requestId, { invoiceDate: today })).rejects.toMatchObject({
      status: 404,
    });
  });

  it('lets differences within the printer’s tolerance through unflagged', async () => {
    const { w, requestId, shop, purchasing, today } = await shippedJob();
    await Organisation.query().findById(w.printer.id).patch({ invoiceToleranceCents: 2_500 });
    await receive(w, requestId);
    const lines = (shippingCents: number) => [
      { orderLine: 0, label: 'Die', amountCents: 80_000 },
      { orderLine: 1, label: 'Shipping', amountCents: shippingCents },
    ];
    // 25.00 over on shipping is within a 25.00 tolerance; 25.01 is not.
    const invoice = await raiseInvoice(deps, shop, requestId, { invoiceDate: today, lines: lines(6_000) });
    expect((await matchOfRequest(knex, purchasing, requestId)).match).toMatchObject({ matched: true, flags: [] });
    await disputeInvoice(deps, purchasing, invoice.id, 'Resend with the freight receipt.');
    await reviseInvoice(deps, shop, invoice.id, { invoiceDate: today, lines: lines(6_001) });
    expect((await matchOfRequest(knex, purchasing, requestId)).match.flags).toEqual([
      'Shipping: Ground invoiced $25.01 over the PO',
    ]);
  });

  it('asks the printer to set its payment days when its terms name none', async () => {
    const { requestId, shop, today } = await shippedJob('Net 30 EOM');
    await expect(raiseInvoice(deps, shop, requestId, { invoiceDate: today })).rejects.toMatchObject({
      status: 409,
      code: 'payment_days_missing',
    });
    expect(await Invoice.query().where({ requestId })).toEqual([]);
  });
});
