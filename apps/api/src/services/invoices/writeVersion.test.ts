import { describe, expect, it } from 'vitest';
import { billedLines } from './writeVersion';

const ordered = [
  { kind: 'die', label: 'Die: Steel-rule die', amountCents: 80_000 },
  { kind: 'shipping', label: 'Shipping: Ground', amountCents: 3_500 },
];

describe('billed lines', () => {
  it('bills the purchase order as awarded when the shop gives no lines', () => {
    expect(billedLines(undefined, ordered)).toEqual([
      { orderLine: 0, label: 'Die: Steel-rule die', amountCents: 80_000, reason: null },
      { orderLine: 1, label: 'Shipping: Ground', amountCents: 3_500, reason: null },
    ]);
  });

  it('refuses a line that names an order line the order does not have, and an empty invoice', () => {
    expect(() => billedLines([{ orderLine: 2, label: 'Counter', amountCents: 100 }], ordered)).toThrow(
      /purchase-order line 3, which the order does not have/,
    );
    expect(() => billedLines([], ordered)).toThrow(/at least one line/);
  });
});
