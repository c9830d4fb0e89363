import { describe, expect, it } from 'vitest';
import { compareBids, type BidToCompare } from './compareBids';

const bid = (id: number, totalCents: number, over: Partial<BidToCompare> = {}): BidToCompare => ({
  bidId: id,
  totalCents,
  currency: 'USD',
  leadDays: 5,
  promisedShipDate: '2026-12-14',
  validUntil: '2026-12-31',
  onTimeRate: null,
  ...over,
});

describe('compareBids', () => {
  it('measures each bid against the lowest and per inch of rule', () => {
    const rows = compareBids([bid(1, 100_000), bid(2, 125_050)], {
      ruleLengthIn: 250,
      needByDate: null,
      today: '2026-12-02',
    });
    expect(rows.map((r) => r.overLowestCents)).toEqual([0, 25_050]);
    // $1,000.00 over 250 in = 400 cents an inch; $1,250.50 / 250 = 500.2 → 500 cents.
    expect(rows.map((r) => r.centsPerInch)).toEqual([400, 500]);
    expect(rows[0]!.best).toContain('total');
    expect(rows[1]!.best).not.toContain('total');
  });

  it('counts lateness in working days past the need-by date', () => {
    // Need-by Fri 11 Dec 2026; a ship date of Tue 15 Dec is 2 working days late (Mon, Tue).
    const rows = compareBids(
      [bid(1, 1, { promisedShipDate: '2026-12-15' }), bid(2, 2, { promisedShipDate: '2026-12-10' })],
      {
        ruleLengthIn: null,
        needByDate: '2026-12-11',
        today: '2026-12-02',
      },
    );
    expect(rows.map((r) => r.daysLate)).toEqual([2, 0]);
    expect(rows[1]!.best).toContain('ship');
    expect(rows[0]!.centsPerInch).toBeNull();
  });

  it('flags expired bids and marks the best on-time record and lead time', () => {
    const rows = compareBids(
      [
        bid(1, 10, { validUntil: '2026-12-01', onTimeRate: 0.5, leadDays: 3 }),
        bid(2, 20, { onTimeRate: 0.9, leadDays: 8 }),
      ],
      { ruleLengthIn: 10, needByDate: null, today: '2026-12-02' },
    );
    expect(rows.map((r) => r.expired)).toEqual([true, false]);
    expect(rows[0]!.best).toEqual(expect.arrayContaining(['lead', 'total']));
    expect(rows[1]!.best).toContain('onTime');
  });

  it('does not compare prices across currencies', () => {
    const rows = compareBids([bid(1, 100), bid(2, 50, { currency: 'CAD' })], {
      ruleLengthIn: 10,
      needByDate: null,
      today: '2026-12-02',
    });
    expect(rows.map((r) => r.overLowestCents)).toEqual([0, 0]);
    expect(rows.flatMap((r) => r.best)).not.toContain('total');
  });

  it('marks nothing best with a single bid', () => {
    expect(compareBids([bid(1, 100)], { ruleLengthIn: 10, needByDate: null, today: '2026-12-02' })[0]!.best).toEqual(
      [],
    );
  });
});
