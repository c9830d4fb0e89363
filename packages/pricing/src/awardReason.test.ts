import { describe, expect, it } from 'vitest';
import { awardReason } from './awardReason';

// Common purchasing practice: an award that passes over a lower price is explained in writing.
describe('awardReason', () => {
  const usd = (totalCents: number) => ({ totalCents, currency: 'USD' });

  it('asks for a reason only when a lower total in the same currency is passed over', () => {
    const bids = [usd(90_000), usd(84_500), usd(120_000)];
    expect(awardReason(usd(84_500), bids)).toEqual({ needsReason: false, lowestCents: 84_500 });
    expect(awardReason(usd(90_000), bids)).toEqual({ needsReason: true, lowestCents: 84_500 });
  });

  it('does not rank totals across currencies', () => {
    const yen = { totalCents: 150_000, currency: 'JPY' };
    expect(awardReason(yen, [usd(500), yen]).needsReason).toBe(false);
    expect(awardReason(usd(900), [usd(500), yen]).needsReason).toBe(true);
  });

  it('treats a tie for lowest as lowest', () => {
    expect(awardReason(usd(100), [usd(100), usd(100)]).needsReason).toBe(false);
  });
});
