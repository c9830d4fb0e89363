import { inv, multiply, transpose } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { fairPriceBand } from './fairPriceBand';
import type { NotEnough } from './notEnough';
import type { PriceObservation } from './observations';
import { fitPrice, type PriceFit } from './priceFit';
import { syntheticDies, syntheticLogDies } from './testing/syntheticDies';

function enough(records: PriceObservation[]): PriceFit {
  const fit = fitPrice(records);
  if (!fit.enough) throw new Error(fit.reason);
  return fit;
}

const inBand = (fit: PriceFit, r: PriceObservation, level: number) => {
  const band = fairPriceBand(fit, r, level);
  return r.dieCents >= band.lowCents && r.dieCents <= band.highCents;
};

describe('fairPriceBand', () => {
  it('is the least-squares prediction interval, computed independently with mathjs', () => {
    // 12 dies, 3 coefficients → 9 degrees of freedom; t(0.975, 9) = 2.2621571628 from the
    // reference table of t quantiles, so a 95 % band is ŷ ± 2.2621571628 · s · √(1 + x0'(X'X)⁻¹x0).
    const records = syntheticDies({ n: 12, seed: 5 });
    const fit = enough(records);
    expect(fit.model).toBe('linear');
    expect(fit.df).toBe(9);
    const X = records.map((r) => [1, r.ruleLengthIn, r.features]);
    const Xt = transpose(X);
    const xtxInverse = inv(multiply(Xt, X)) as number[][];
    const beta = multiply(
      multiply(xtxInverse, Xt),
      records.map((r) => r.dieCents),
    ) as number[];
    const rss = records.reduce((sum, r, i) => sum + (r.dieCents - (multiply(X[i]!, beta) as number)) ** 2, 0);
    const x0 = [1, 240, 28];
    const predicted = multiply(x0, beta) as number;
    const half = 2.2621571628 * Math.sqrt(rss / 9) * Math.sqrt(1 + (multiply(multiply(x0, xtxInverse), x0) as number));

    const band = fairPriceBand(fit, { ruleLengthIn: 240, features: 28 }, 0.95);
    expect(band).toEqual({
      lowCents: Math.round(predicted - half),
      typicalCents: Math.round(predicted),
      highCents: Math.round(predicted + half),
      level: 0.95,
      currency: 'USD',
      extrapolated: false,
    });
  });

  it('covers about 80 % of fresh dies at level 0.8 (seeded simulation, linear model)', () => {
    // 400 fits of 40 dies each, 25 fresh dies from the same model per fit: 10,000 checks. The
    // share's standard deviation is about 0.005 (more than √(0.8·0.2/10,000) = 0.004, since dies
    // judged by one fit share its errors); the tolerance is 0.02.
    let covered = 0;
    let total = 0;
    for (let i = 0; i < 400; i++) {
      const fit = enough(syntheticDies({ n: 40, seed: 1_000 + i }));
      for (const fresh of syntheticDies({ n: 25, seed: 50_000 + i })) {
        covered += inBand(fit, fresh, 0.8) ? 1 : 0;
        total++;
      }
    }
    expect(Math.abs(covered / total - 0.8)).toBeLessThan(0.02);
  });

  it('covers about 80 % of fresh dies at level 0.8 (seeded simulation, log model)', () => {
    let covered = 0;
    let total = 0;
    for (let i = 0; i < 200; i++) {
      const fit = enough(syntheticLogDies({ n: 40, seed: 2_000 + i }));
      for (const fresh of syntheticLogDies({ n: 25, seed: 60_000 + i })) {
        covered += inBand(fit, fresh, 0.8) ? 1 : 0;
        total++;
      }
    }
    expect(Math.abs(covered / total - 0.8)).toBeLessThan(0.025);
  });

  it('back-transforms the log model: typical is the median, the band leans upward', () => {
    const fit = enough(syntheticLogDies({ n: 200, seed: 13 }));
    expect(fit.model).toBe('log');
    const band = fairPriceBand(fit, { ruleLengthIn: 300, features: 20 });
    const { intercept, perInch, perFeature } = fit.coefficients;
    expect(band.typicalCents).toBe(Math.round(Math.exp(intercept + perInch * Math.log(300) + perFeature * 20)));
    // exp is convex: equal steps on the log scale are longer above the median than below.
    expect(band.highCents - band.typicalCents).toBeGreaterThan(band.typicalCents - band.lowCents);
    expect(band.level).toBe(0.8);
  });

  it('never goes below zero, in whole cents, and flags an extrapolation', () => {
    // Dies of about 250 in at $1.00 an inch with $20 of noise: a 1-inch die's band reaches below 0.
    const fit = enough(
      syntheticDies({ n: 30, seed: 17, baseCents: 0, perInchCents: 100, perFeatureCents: 0, noiseCents: 2_000 }),
    );
    const band = fairPriceBand(fit, { ruleLengthIn: 1, features: 0 });
    expect(band.lowCents).toBe(0);
    for (const v of [band.lowCents, band.typicalCents, band.highCents])
      expect(Number.isInteger(v) && v >= 0).toBe(true);
    expect(band.extrapolated).toBe(true);
  });

  it('refuses a fit without enough data and bad dies or levels', () => {
    const fit = enough(syntheticDies({ n: 20, seed: 19 }));
    const notEnough: NotEnough = { enough: false, reason: 'few', needed: 8 };
    expect(() => fairPriceBand(notEnough as unknown as PriceFit, { ruleLengthIn: 100, features: 1 })).toThrow(
      /enough data/,
    );
    expect(() => fairPriceBand(fit, { ruleLengthIn: 0, features: 1 })).toThrow(/ruleLengthIn/);
    expect(() => fairPriceBand(fit, { ruleLengthIn: 100, features: -2 })).toThrow(/features/);
    for (const level of [0, 1, 80, Number.NaN])
      expect(() => fairPriceBand(fit, { ruleLengthIn: 100, features: 1 }, level)).toThrow(/level/);
  });
});
