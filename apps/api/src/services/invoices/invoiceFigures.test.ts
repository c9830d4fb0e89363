import { describe, expect, it } from 'vitest';
import { invoiceFigures } from './invoiceFigures';

describe('invoice figures', () => {
  it('adds tax at the shop’s rate to the subtotal, in whole cents (worked by hand)', () => {
    // 800.00 + 35.00 = 835.00; 8.25 % of it is 68.8875, rounded half away from zero to 68.89.
    expect(invoiceFigures([{ amountCents: 80_000 }, { amountCents: 3_500 }], 825)).toEqual({
      subtotalCents: 83_500,
      taxRateBp: 825,
      taxCents: 6_889,
      totalCents: 90_389,
    });
  });

  it('credits tax on a credit note at the same rate: −25.00 at 8.25 % is −2.06 (−2.0625 by hand)', () => {
    expect(invoiceFigures([{ amountCents: -2_500 }], 825)).toMatchObject({ taxCents: -206, totalCents: -2_706 });
  });

  it('leaves tax out when the shop enters no rate', () => {
    expect(invoiceFigures([{ amountCents: 12_345 }], null)).toMatchObject({ taxCents: 0, totalCents: 12_345 });
  });
});
