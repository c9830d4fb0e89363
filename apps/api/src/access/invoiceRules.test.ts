import { describe, expect, it } from 'vitest';
import { invoiceActionRefusal, invoiceStepRefusal } from './invoiceRules';
import { facts, printer, shop } from './testFacts';

// Printer 10 awarded its request to shop 20; shop 21 bid and lost; printer 11 is someone else.
const shipped = facts('shipped', { awardedShopId: 20, bidderShopIds: [20, 21] });

describe('who may raise, see and settle invoices', () => {
  it('lets the awarded shop raise and see, and nobody else’s shop learn anything (404)', () => {
    expect(invoiceActionRefusal(shop(20), shipped, 'raise-invoice')).toBeNull();
    expect(invoiceActionRefusal(shop(20, 'admin'), shipped, 'credit-note')).toBeNull();
    expect(invoiceActionRefusal(shop(20), shipped, 'see-invoice')).toBeNull();
    expect(invoiceActionRefusal(shop(21), shipped, 'see-invoice')?.status).toBe(404);
    expect(invoiceActionRefusal(shop(21), shipped, 'raise-invoice')?.status).toBe(404);
    expect(invoiceActionRefusal(shop(20), shipped, 'approve-invoice')?.status).toBe(403);
  });

  it('lets the printer’s purchasing and admins settle; a buyer is a 403, another printer a 404', () => {
    for (const action of ['see-invoice', 'dispute-invoice', 'approve-invoice', 'record-payment'] as const) {
      expect(invoiceActionRefusal(printer('purchasing'), shipped, action)).toBeNull();
      expect(invoiceActionRefusal(printer('admin'), shipped, action)).toBeNull();
      expect(invoiceActionRefusal(printer('buyer'), shipped, action)?.status).toBe(403);
      expect(invoiceActionRefusal(printer('purchasing', 11), shipped, action)?.status).toBe(404);
    }
    expect(invoiceActionRefusal(printer('purchasing'), shipped, 'raise-invoice')?.status).toBe(403);
  });

  it('invoices come once the die has shipped (common purchasing practice: bill on shipment)', () => {
    const inProduction = facts('in_production', { awardedShopId: 20 });
    expect(invoiceActionRefusal(shop(20), inProduction, 'raise-invoice')).toMatchObject({ status: 409 });
    expect(invoiceActionRefusal(shop(20), inProduction, 'see-invoice')).toBeNull();
    expect(invoiceActionRefusal(shop(20), facts('received', { awardedShopId: 20 }), 'raise-invoice')).toBeNull();
    expect(invoiceActionRefusal(printer('purchasing'), facts('bidding_closed'), 'see-invoice')?.status).toBe(409);
  });
});

describe('the steps of an invoice', () => {
  it('disputes and approves a submitted invoice, pays an approved one, revises or credits a disputed one', () => {
    expect(invoiceStepRefusal('submitted', 'dispute')).toBeNull();
    expect(invoiceStepRefusal('submitted', 'approve')).toBeNull();
    expect(invoiceStepRefusal('approved', 'pay')).toBeNull();
    expect(invoiceStepRefusal('disputed', 'revise')).toBeNull();
    expect(invoiceStepRefusal('disputed', 'credit')).toBeNull();
  });

  it('refuses the rest with a 409 that says why', () => {
    expect(invoiceStepRefusal('submitted', 'pay')).toEqual({
      status: 409,
      message: 'An invoice that is awaiting approval cannot be paid. Approve it for payment first.',
    });
    expect(invoiceStepRefusal('approved', 'approve')?.status).toBe(409);
    expect(invoiceStepRefusal('submitted', 'credit')?.message).toMatch(/Only a disputed invoice/);
    expect(invoiceStepRefusal('paid', 'dispute')?.status).toBe(409);
    expect(invoiceStepRefusal('superseded', 'revise')?.status).toBe(409);
  });
});
