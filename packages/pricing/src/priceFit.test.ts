import { describe, expect, it } from 'vitest';
import type { PriceObservation } from './observations';
import { MODEL_CHOICE_RULE, fitPrice, type PriceFit } from './priceFit';
import { syntheticDies, syntheticLogDies } from './testing/syntheticDies';

function enough(records: PriceObservation[]): PriceFit {
  const fit = fitPrice(records);
  if (!fit.enough) throw new Error(fit.reason);
  return fit;
}

const die = (
  ruleLengthIn: number,
  features: number,
  dieCents: number,
  over: Partial<PriceObservation> = {},
): PriceObservation => ({
  dieCents,
  currency: 'USD',
  ruleLengthIn,
  features,
  complexity: 'simple',
  pricedOn: '2026-05-04',
  ...over,
});

describe('fitPrice on dies with a known price model', () => {
  // Made-up data (seeded): price = 40,000 + 300 × inches + 500 × features cents + N(0, 3,000²).
  const fit = enough(syntheticDies({ n: 2_000, seed: 7 }));

  it('chooses the linear model and recovers its coefficients', () => {
    expect(fit.model).toBe('linear');
    // Tolerance: 4 standard errors (about 1 in 16,000 to fail by chance for a normal estimate),
    // and each standard error is small beside its coefficient.
    const truth = { intercept: 40_000, perInch: 300, perFeature: 500 };
    for (const key of ['intercept', 'perInch', 'perFeature'] as const) {
      expect(Math.abs(fit.coefficients[key] - truth[key])).toBeLessThan(4 * fit.standardErrors[key]);
    }
    expect(fit.standardErrors.perInch).toBeLessThan(1); // under a cent an inch
    expect(fit.standardErrors.perFeature).toBeLessThan(10);
  });

  it('recovers the noise as the residual standard error, in whole cents', () => {
    expect(Number.isInteger(fit.residualStandardErrorCents)).toBe(true);
    // With 1,997 degrees of freedom s/σ has a standard deviation of about 1/√(2 × 1,997) ≈ 1.6 %.
    expect(Math.abs(fit.residualStandardErrorCents / 3_000 - 1)).toBeLessThan(0.064);
    expect(fit.leaveOneOutErrorCents.linear).toBeLessThan(fit.leaveOneOutErrorCents.log);
    expect(fit.n).toBe(2_000);
    expect(fit.df).toBe(1_997);
    expect(fit.currency).toBe('USD');
  });

  it('describes the fit in plain words', () => {
    expect(fit.describe).toMatch(
      /^Linear model from 2000 dies in USD: price ≈ \$4\d\d\.\d\d \+ \$(2\.9\d|3\.0\d) per inch of rule \+ \$5\.\d\d per feature/,
    );
    expect(fit.describe).toContain('leave-one-out');
    expect(MODEL_CHOICE_RULE).toContain('leave-one-out');
  });
});

describe('fitPrice on dies priced by a power of their length', () => {
  // Made-up data (seeded): price = e^6 × inches^0.8 × e^(0.01 × features) × lognormal(0, 0.15²).
  const fit = enough(syntheticLogDies({ n: 1_000, seed: 11 }));

  it('chooses the log model and recovers its exponents', () => {
    expect(fit.model).toBe('log');
    expect(fit.leaveOneOutErrorCents.log).toBeLessThan(fit.leaveOneOutErrorCents.linear);
    expect(Math.abs(fit.coefficients.perInch - 0.8)).toBeLessThan(4 * fit.standardErrors.perInch);
    expect(Math.abs(fit.coefficients.perFeature - 0.01)).toBeLessThan(4 * fit.standardErrors.perFeature);
    expect(Math.abs(fit.coefficients.intercept - 6)).toBeLessThan(4 * fit.standardErrors.intercept);
    expect(Math.abs(fit.sigma - 0.15)).toBeLessThan(0.15 * 0.1);
    expect(fit.describe).toMatch(/^Log model/);
  });
});

describe('fitPrice with too little or unusable data', () => {
  const varied = syntheticDies({ n: 12, seed: 3 });

  it('says it needs 8 records by default', () => {
    expect(fitPrice(varied.slice(0, 7))).toEqual({
      enough: false,
      reason: '7 priced dies; a price fit needs at least 8',
      needed: 8,
    });
    expect(fitPrice([])).toMatchObject({ enough: false, needed: 8 });
    expect(fitPrice(varied.slice(0, 8)).enough).toBe(true);
    expect(fitPrice(varied.slice(0, 8), { minRecords: 10 })).toMatchObject({ enough: false, needed: 10 });
  });

  it('refuses a minimum below three more than the predictors plus one', () => {
    expect(() => fitPrice(varied, { minRecords: 5 })).toThrow(/at least 6/);
    expect(fitPrice(varied.slice(0, 6), { minRecords: 6 }).enough).toBe(true);
  });

  it('says so when every die has the same rule length or the same feature count', () => {
    const sameLength = varied.map((r) => ({ ...r, ruleLengthIn: 200 }));
    expect(fitPrice(sameLength)).toMatchObject({
      enough: false,
      reason: expect.stringContaining('degenerate'),
      needed: 8,
    });
    const sameFeatures = varied.map((r) => ({ ...r, features: 12 }));
    expect(fitPrice(sameFeatures)).toMatchObject({ enough: false, reason: expect.stringContaining('degenerate') });
  });

  it('says so when features follow rule length exactly', () => {
    const tied = varied.map((r, i) => ({ ...r, ruleLengthIn: 100 + i, features: 2 * (100 + i) }));
    expect(fitPrice(tied)).toMatchObject({ enough: false, reason: expect.stringContaining('degenerate') });
  });

  it('says so when one die alone sets a coefficient', () => {
    // Seven dies of 100 in and one of 200 in: the slope per inch rests on that one die.
    const lopsided = [
      ...[3, 5, 8, 9, 12, 15, 20].map((f, i) => die(100, f, 60_000 + 500 * f + 37 * i)),
      die(200, 10, 95_000),
    ];
    expect(fitPrice(lopsided)).toMatchObject({ enough: false, reason: expect.stringContaining('One die alone') });
  });

  it('refuses mixed currencies and bad records with a clear error', () => {
    expect(() => fitPrice([...varied, { ...varied[0]!, currency: 'EUR' }])).toThrow(/mix currencies \(EUR, USD\)/);
    expect(() => fitPrice([...varied, { ...varied[0]!, dieCents: 12.5 }])).toThrow(/Record 12: dieCents/);
  });
});
