// Seeded made-up dies whose true price model is known, for tests and benchmarks only (not exported
// from the package: it needs @stdlib/random-base-normal, a development dependency).
import normal from '@stdlib/random-base-normal';
import type { PriceObservation } from '../observations';

export interface SyntheticOptions {
  n: number;
  seed: number;
  /** The true model: price = baseCents + perInchCents × inches + perFeatureCents × features (+ noise). */
  baseCents?: number;
  perInchCents?: number;
  perFeatureCents?: number;
  /** Standard deviation of the normal noise added to each price, in cents. */
  noiseCents?: number;
  currency?: string;
}

/** Dies of about 250 ± 80 in of rule and 30 ± 12 features, priced by a known linear model. */
export function syntheticDies(opts: SyntheticOptions): PriceObservation[] {
  const z = normal.factory(0, 1, { seed: opts.seed });
  const { baseCents = 40_000, perInchCents = 300, perFeatureCents = 500, noiseCents = 3_000, currency = 'USD' } = opts;
  return Array.from({ length: opts.n }, (_, i) => {
    const ruleLengthIn = Math.max(20, Math.round((250 + 80 * z()) * 8) / 8); // to the eighth of an inch
    const features = Math.max(0, Math.round(30 + 12 * z()));
    const price = baseCents + perInchCents * ruleLengthIn + perFeatureCents * features + noiseCents * z();
    const day = new Date(Date.UTC(2025, 0, 1 + (i % 730))).toISOString().slice(0, 10);
    return {
      dieCents: Math.max(1, Math.round(price)),
      currency,
      ruleLengthIn,
      features,
      complexity: features > 35 ? 'complex' : 'simple',
      pricedOn: day,
    };
  });
}

/** Dies priced by a known multiplicative model: price = e^a × inches^b × e^(c × features) × lognormal noise. */
export function syntheticLogDies(opts: {
  n: number;
  seed: number;
  a?: number;
  b?: number;
  c?: number;
  noiseLog?: number;
}): PriceObservation[] {
  const z = normal.factory(0, 1, { seed: opts.seed });
  const { a = 6, b = 0.8, c = 0.01, noiseLog = 0.15 } = opts;
  return Array.from({ length: opts.n }, () => {
    const ruleLengthIn = Math.round(Math.exp(5.3 + 0.6 * z()) * 8) / 8; // about 40 to 1,200 in, skewed like real dies
    const features = Math.max(0, Math.round(30 + 12 * z()));
    const price = Math.exp(a + b * Math.log(ruleLengthIn) + c * features + noiseLog * z());
    return {
      dieCents: Math.max(1, Math.round(price)),
      currency: 'USD',
      ruleLengthIn,
      features,
      complexity: 'simple',
      pricedOn: '2026-01-15',
    };
  });
}
