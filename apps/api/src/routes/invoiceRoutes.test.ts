import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { app, createShop, createWorld, type World } from '../test/harness';
import { createInvoiceAt, invoiceToday, netThirty } from '../test/invoiceStages';
import { createRequestAt } from '../test/requestStages';

let w: World;
let other: World;
const as = (world: World, who: keyof World['tokens']) => ({ Authorization: `Bearer ${world.tokens[who]}` });

beforeAll(async () => {
  [w, other] = await Promise.all([createWorld(), createWorld()]);
});

describe('invoices as an attacker would try them', () => {
  it('answers another shop and another printer 404 with nothing of the invoice', async () => {
    const { requestId, invoiceId } = await createInvoiceAt(w, 'submitted');
    const stranger = await createShop();
    for (const path of [`/api/invoices/${invoiceId}`, `/api/requests/${requestId}/invoices`]) {
      const byShop = await request(app)
        .get(path)
        .set({ Authorization: `Bearer ${stranger.token}` });
      expect(byShop.status).toBe(404);
      expect(JSON.stringify(byShop.body)).not.toMatch(/totalCents|83500/);
      expect((await request(app).get(path).set(as(other, 'purchasing'))).status).toBe(404);
    }
    const approve = await request(app)
      .post(`/api/invoices/${invoiceId}/approve`)
      .set(as(other, 'purchasing'))
      .send({ reason: 'Looks fine' });
    expect(approve.status).toBe(404);
    const revise = await request(app)
      .post(`/api/invoices/${invoiceId}/revisions`)
      .set({ Authorization: `Bearer ${stranger.token}` })
      .send({ invoiceDate: invoiceToday(w) });
    expect(revise.status).toBe(404);
  });

  it('shows a print buyer the status only, and refuses the buyer approving or reading the match', async () => {
    const { requestId, invoiceId } = await createInvoiceAt(w, 'submitted');
    const one = await request(app).get(`/api/invoices/${invoiceId}`).set(as(w, 'buyer'));
    expect(one.status).toBe(200);
    expect(one.body).toEqual({ id: invoiceId, requestId, kind: 'invoice', status: 'submitted' });
    const approve = await request(app)
      .post(`/api/invoices/${invoiceId}/approve`)
      .set(as(w, 'buyer'))
      .send({ reason: 'Fine' });
    expect(approve.status).toBe(403);
    expect((await request(app).get(`/api/requests/${requestId}/invoice-match`).set(as(w, 'buyer'))).status).toBe(403);
    const full = await request(app).get(`/api/invoices/${invoiceId}`).set(as(w, 'purchasing'));
    // Invoiced as awarded: 800.00 die + 35.00 shipping (test/fixtures bidBody), no tax.
    expect(full.body).toMatchObject({ totalCents: 83_500, status: 'submitted', payments: [] });
  });

  it('lets one of two approvals at once through and answers the other 409', async () => {
    const { invoiceId } = await createInvoiceAt(w, 'submitted');
    const approve = (who: 'purchasing' | 'printerAdmin') =>
      request(app)
        .post(`/api/invoices/${invoiceId}/approve`)
        .set(as(w, who))
        .send({ reason: 'Die checked at the dock' });
    const answers = await Promise.all([approve('purchasing'), approve('printerAdmin')]);
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
  });

  it('refuses payment before approval and a credit note before any dispute (409)', async () => {
    const { invoiceId } = await createInvoiceAt(w, 'submitted');
    const pay = await request(app)
      .post(`/api/invoices/${invoiceId}/payments`)
      .set(as(w, 'purchasing'))
      .send({ paidOn: invoiceToday(w), reference: 'ACH 77', amountCents: 83_500 });
    expect(pay.status).toBe(409);
    expect(pay.body.error.message).toMatch(/Approve it for payment first/);
    const credit = await request(app)
      .post(`/api/invoices/${invoiceId}/credit-notes`)
      .set(as(w, 'estimator'))
      .send({ invoiceDate: invoiceToday(w), lines: [{ orderLine: 1, label: 'Shipping', amountCents: -500 }] });
    expect(credit.status).toBe(409);
  });

  it('refuses an invoice before shipping, an extra line with no reason, and a second invoice', async () => {
    await netThirty(w);
    const { id: early } = await createRequestAt(w, 'in_production');
    const before = await request(app)
      .post(`/api/requests/${early}/invoices`)
      .set(as(w, 'estimator'))
      .send({ invoiceDate: invoiceToday(w) });
    expect(before.status).toBe(409);
    const { requestId } = await createInvoiceAt(w, 'submitted');
    const second = await request(app)
      .post(`/api/requests/${requestId}/invoices`)
      .set(as(w, 'estimator'))
      .send({ invoiceDate: invoiceToday(w) });
    expect(second.status).toBe(409);
    const extra = await request(app)
      .post(`/api/requests/${early}/invoices`)
      .set(as(w, 'estimator'))
      .send({ invoiceDate: invoiceToday(w), lines: [{ orderLine: null, label: 'Rush', amountCents: 5_000 }] });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields).toHaveProperty(['lines.0.reason']);
  });

  it('pays an approved invoice in full and shows it in both sides’ records', async () => {
    const { invoiceId } = await createInvoiceAt(w, 'approved');
    const paid = await request(app)
      .post(`/api/invoices/${invoiceId}/payments`)
      .set(as(w, 'purchasing'))
      .send({ paidOn: invoiceToday(w), reference: 'ACH 78', amountCents: 83_500 });
    expect(paid.status).toBe(201);
    expect(paid.body).toMatchObject({ status: 'paid', payments: [{ reference: 'ACH 78', amountCents: 83_500 }] });
    const shopRecord = await request(app).get('/api/invoice-record').set(as(w, 'estimator'));
    expect(shopRecord.body).toEqual([expect.objectContaining({ printerId: w.printer.id, paidOnTime: 1 })]);
    expect((await request(app).get('/api/invoice-record').set(as(w, 'purchasing'))).body).toMatchObject({
      paidOnTime: 1,
    });
    expect((await request(app).get('/api/invoice-record').set(as(w, 'buyer'))).status).toBe(403);
  });
});
