import { describe, expect, it } from 'vitest';
import { MixedCurrencyError, checkObservations, type PriceObservation } from './observations';

const die = (over: Partial<PriceObservation> = {}): PriceObservation => ({
  dieCents: 95_000,
  currency: 'USD',
  ruleLengthIn: 180.5,
  features: 24,
  complexity: 'simple',
  pricedOn: '2026-03-31',
  ...over,
});

describe('checkObservations', () => {
  it('returns the one currency, or null for no records', () => {
    expect(checkObservations([die(), die({ currency: 'USD' })])).toBe('USD');
    expect(checkObservations([])).toBeNull();
  });

  it('refuses mixed currencies, naming them', () => {
    const mixed = () => checkObservations([die(), die({ currency: 'EUR' }), die({ currency: 'CAD' })]);
    expect(mixed).toThrow(MixedCurrencyError);
    expect(mixed).toThrow('Records mix currencies (CAD, EUR, USD)');
  });

  it.each<[Partial<PriceObservation>, RegExp]>([
    [{ dieCents: 950.5 }, /Record 1: dieCents must be a whole number of cents/],
    [{ dieCents: 0 }, /dieCents/],
    [{ currency: 'usd' }, /ISO 4217/],
    [{ ruleLengthIn: 0 }, /ruleLengthIn/],
    [{ ruleLengthIn: Number.NaN }, /ruleLengthIn/],
    [{ features: -1 }, /features/],
    [{ features: 2.5 }, /features/],
    [{ complexity: 'hard' as 'simple' }, /complexity/],
    [{ pricedOn: '2026-02-30' }, /pricedOn/], // February has no 30th (Gregorian calendar)
    [{ pricedOn: '2026-13-01' }, /pricedOn/],
    [{ pricedOn: '31/03/2026' }, /pricedOn/],
  ])('refuses a bad record %o with a clear error', (bad, message) => {
    expect(() => checkObservations([die(), die(bad)])).toThrow(message);
  });

  it('refuses what is not an array of records', () => {
    expect(() => checkObservations('dies' as unknown as PriceObservation[])).toThrow(TypeError);
    expect(() => checkObservations([null as unknown as PriceObservation])).toThrow(/Record 0: not a price record/);
  });
});
