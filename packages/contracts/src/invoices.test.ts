import { describe, expect, it } from 'vitest';
import { CreditNoteInput, DisputeInput, InvoiceInput, PaymentInput } from './invoices';

describe('invoice inputs', () => {
  it('takes an invoice with no lines (the awarded bid’s are used) and refuses an extra line with no reason', () => {
    expect(InvoiceInput.parse({ invoiceDate: '2026-12-05' })).toEqual({ invoiceDate: '2026-12-05' });
    const extra = InvoiceInput.safeParse({
      invoiceDate: '2026-12-05',
      lines: [{ orderLine: null, label: 'Second perf', amountCents: 2500 }],
    });
    expect(extra.success).toBe(false);
    expect(extra.error?.issues[0]).toMatchObject({ path: ['lines', 0, 'reason'] });
  });

  it('keeps money whole and signed the right way: invoices bill, credit notes credit', () => {
    const line = { orderLine: 0, label: 'Die', amountCents: 12.5 };
    expect(InvoiceInput.safeParse({ invoiceDate: '2026-12-05', lines: [line] }).success).toBe(false);
    expect(InvoiceInput.safeParse({ invoiceDate: '2026-12-05', lines: [{ ...line, amountCents: -100 }] }).success).toBe(
      false,
    );
    expect(
      CreditNoteInput.safeParse({ invoiceDate: '2026-12-05', lines: [{ ...line, amountCents: 100 }] }).success,
    ).toBe(false);
    expect(
      CreditNoteInput.safeParse({ invoiceDate: '2026-12-05', lines: [{ ...line, amountCents: -2500 }] }).success,
    ).toBe(true);
    expect(InvoiceInput.safeParse({ invoiceDate: '2026-12-05', taxRateBp: 10_001 }).success).toBe(false);
  });

  it('needs a reason to dispute, and a date, reference and amount to record a payment', () => {
    expect(DisputeInput.safeParse({ reason: ' ' }).success).toBe(false);
    expect(PaymentInput.safeParse({ paidOn: '2026-12-05', reference: 'ACH 1182', amountCents: 0 }).success).toBe(false);
    expect(PaymentInput.safeParse({ paidOn: '2026-12-05', reference: 'ACH 1182', amountCents: 48725 }).success).toBe(
      true,
    );
  });
});
