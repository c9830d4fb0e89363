import { bignumber, round, type BigNumber } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { matchInvoice, taxAtRate, type MatchInput } from './invoiceMatch';

// The three-way match of purchasing practice (common practice): the purchase order, the receipt
// and the invoice agree line by line, or each difference is flagged for purchasing to settle.
const order: MatchInput['ordered'] = {
  dies: 1,
  lines: [
    { kind: 'die', label: 'Die', amountCents: 84_500 },
    { kind: 'shipping', label: 'Shipping', amountCents: 2_500 },
  ],
};
const received: MatchInput['received'] = { dies: 1, condition: 'good' };
const asOrdered = order.lines.map((l, i) => ({ orderLine: i, label: l.label, amountCents: l.amountCents }));

const match = (over: Partial<MatchInput>) =>
  matchInvoice({
    currency: 'USD',
    ordered: order,
    received,
    invoiced: { dies: 1, lines: asOrdered },
    toleranceCents: 0,
    ...over,
  });

describe('matchInvoice', () => {
  it('matches an invoice of exactly what was ordered and received', () => {
    const m = match({});
    expect(m.matched).toBe(true);
    expect(m.flags).toEqual([]);
    expect(m.orderedCents).toBe(87_000);
    expect(m.invoicedCents).toBe(87_000);
    expect(m.lines.map((l) => l.differenceCents)).toEqual([0, 0]);
  });

  it('flags a line invoiced over the PO, and an extra line, in words', () => {
    // Worked example: shipping $50.00 against $25.00 ordered, and a $40.00 line not on the PO.
    const m = match({
      invoiced: {
        dies: 1,
        lines: [
          asOrdered[0]!,
          { ...asOrdered[1]!, amountCents: 5_000 },
          { orderLine: null, label: 'Rush courier', amountCents: 4_000, reason: 'Asked for by phone on 3 Dec' },
        ],
      },
    });
    expect(m.flags).toEqual([
      'Shipping invoiced $25.00 over the PO',
      'Rush courier invoiced $40.00, not on the PO (Asked for by phone on 3 Dec)',
    ]);
    expect(m.lines[2]).toMatchObject({
      orderedCents: null,
      invoicedCents: 4_000,
      reason: 'Asked for by phone on 3 Dec',
    });
    // $845.00 + $50.00 + $40.00 = $935.00 against $870.00.
    expect(m.invoicedCents).toBe(93_500);
    expect(m.differenceCents).toBe(6_500);
    expect(m.matched).toBe(false);
  });

  it('lets differences within the tolerance through, unless together they pass it', () => {
    const cents = (a: number, b: number) => [
      { ...asOrdered[0]!, amountCents: 84_500 + a },
      { ...asOrdered[1]!, amountCents: 2_500 + b },
    ];
    expect(match({ toleranceCents: 100, invoiced: { dies: 1, lines: cents(100, 0) } }).matched).toBe(true);
    expect(match({ toleranceCents: 100, invoiced: { dies: 1, lines: cents(101, 0) } }).flags).toEqual([
      'Die invoiced $1.01 over the PO',
    ]);
    expect(match({ toleranceCents: 100, invoiced: { dies: 1, lines: cents(80, 80) } }).flags).toEqual([
      'The total is invoiced $1.60 over the PO',
    ]);
  });

  it('reads a credit note against the line it corrects', () => {
    // The shop billed $50.00 shipping, then credits $25.00 of it: the line now matches the PO.
    const m = match({
      invoiced: {
        dies: 1,
        lines: [
          asOrdered[0]!,
          { ...asOrdered[1]!, amountCents: 5_000 },
          { orderLine: 1, label: 'Shipping', amountCents: -2_500, reason: 'Credit note CN-7' },
        ],
      },
    });
    expect(m.matched).toBe(true);
    expect(m.lines[1]).toMatchObject({ invoicedCents: 2_500, differenceCents: 0 });
  });

  it('flags quantities: dies invoiced that were not ordered or not received, and damage', () => {
    expect(match({ received: null }).flags).toEqual(['Nothing received yet']);
    expect(match({ invoiced: { dies: 2, lines: asOrdered } }).flags).toEqual([
      '2 dies invoiced, 1 die ordered',
      '2 dies invoiced, 1 die received',
    ]);
    expect(match({ received: { dies: 1, condition: 'damaged' } }).flags).toEqual(['The die was received damaged']);
  });

  it('words amounts under the PO, and in the reader’s locale and the order’s currency', () => {
    const m = matchInvoice({
      currency: 'EUR',
      ordered: order,
      received,
      invoiced: { dies: 1, lines: [asOrdered[0]!, { ...asOrdered[1]!, amountCents: 2_000 }] },
      toleranceCents: 0,
      locale: 'en-GB',
    });
    expect(m.flags).toEqual(['Shipping invoiced €5.00 under the PO']);
  });

  it('refuses a tolerance that is not whole minor units', () => {
    expect(() => match({ toleranceCents: -1 })).toThrow(RangeError);
    expect(() => match({ toleranceCents: 0.5 })).toThrow(RangeError);
  });
});

describe('taxAtRate', () => {
  // Checked against mathjs's arbitrary-precision decimals, rounding half away from zero to the
  // cent (mathjs's round of a BigNumber rounds half away from zero).
  const reference = (cents: number, basisPoints: number) =>
    (round(bignumber(cents).times(basisPoints).div(10_000)) as BigNumber).toNumber();

  it('rounds half away from zero to the minor unit', () => {
    // 8.25 % of $935.00 is $77.1375: $77.14.
    expect(taxAtRate(93_500, 825)).toBe(7_714);
    // 5 % of $0.10 is half a cent: a whole cent, and a credit rounds the same way, negative.
    expect(taxAtRate(10, 500)).toBe(1);
    expect(taxAtRate(-10, 500)).toBe(-1);
    expect(taxAtRate(93_500, 0)).toBe(0);
  });

  it('agrees with decimal arithmetic on many amounts and rates, up to the largest amount', () => {
    for (const cents of [1, 99, 12_345, 1_000_001, 9_999_999_999, 10_000_000_000])
      for (const rate of [1, 5, 250, 825, 1_999, 2_000, 10_000])
        expect(taxAtRate(cents, rate), `${cents} at ${rate}`).toBe(reference(cents, rate));
  });

  it('refuses a rate outside 0–100 %', () => {
    expect(() => taxAtRate(100, -1)).toThrow(RangeError);
    expect(() => taxAtRate(100, 10_001)).toThrow(RangeError);
    expect(() => taxAtRate(100, 8.25)).toThrow(RangeError);
  });
});
