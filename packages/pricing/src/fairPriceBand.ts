import type { PriceFit } from './priceFit';
import { newRowLeverage } from './regression';
import { tQuantile } from './tQuantile';

export interface FairPriceBand {
  lowCents: number;
  /** The point prediction (for the log model its median, exp of the log prediction). */
  typicalCents: number;
  highCents: number;
  level: number;
  currency: string;
  /** True when the die's rule length or feature count lies outside the fitted records. */
  extrapolated: boolean;
}

/**
 * The range a new die's price should fall in with probability `level`: the least-squares
 * prediction interval ŷ ± t(df) · s · √(1 + x0' (X'X)⁻¹ x0), back-transformed with exp for the
 * log model. Whole cents, never below zero.
 */
export function fairPriceBand(
  fit: PriceFit,
  die: { ruleLengthIn: number; features: number },
  level = 0.8,
): FairPriceBand {
  if (fit?.enough !== true)
    throw new TypeError('A price fit with enough data is needed (fitPrice said it had too little)');
  const { ruleLengthIn, features } = die;
  if (!(Number.isFinite(ruleLengthIn) && ruleLengthIn > 0))
    throw new RangeError(`ruleLengthIn must be a length in inches above 0 (got ${ruleLengthIn})`);
  if (!(Number.isFinite(features) && features >= 0))
    throw new RangeError(`features must be a count of 0 or more (got ${features})`);
  if (!(level > 0 && level < 1)) throw new RangeError(`level must be strictly between 0 and 1 (got ${level})`);

  const x = fit.model === 'log' ? [Math.log(ruleLengthIn), features] : [ruleLengthIn, features];
  const { intercept, perInch, perFeature } = fit.coefficients;
  const predicted = intercept + perInch * x[0]! + perFeature * x[1]!;
  const halfWidth = tQuantile((1 + level) / 2, fit.df) * fit.sigma * Math.sqrt(1 + newRowLeverage(fit, x));
  const back = fit.model === 'log' ? Math.exp : (v: number) => v;
  const cents = (v: number) => Math.max(0, Math.round(back(v)));
  const [minLength, maxLength] = fit.observed.ruleLengthIn;
  const [minFeatures, maxFeatures] = fit.observed.features;
  return {
    lowCents: cents(predicted - halfWidth),
    typicalCents: cents(predicted),
    highCents: cents(predicted + halfWidth),
    level,
    currency: fit.currency,
    extrapolated:
      ruleLengthIn < minLength || ruleLengthIn > maxLength || features < minFeatures || features > maxFeatures,
  };
}
