import { extent } from 'd3-array';
import { formatMoney } from './money';
import type { NotEnough } from './notEnough';
import { checkObservations, type PriceObservation } from './observations';
import { fitOls } from './regression';

export type PriceModel = 'linear' | 'log';

export interface PriceCoefficients {
  /** Linear: cents. Log: ln(cents). */
  intercept: number;
  /** Linear: cents per inch of rule. Log: the price's elasticity to rule length (per unit of ln inches). */
  perInch: number;
  /** Linear: cents per feature. Log: change of ln(price) per feature (≈ share of the price). */
  perFeature: number;
}

export interface PriceFit {
  enough: true;
  model: PriceModel;
  currency: string;
  /** Unrounded model parameters, so predictions from them are not biased by rounding. */
  coefficients: PriceCoefficients;
  standardErrors: PriceCoefficients;
  /** R² on the chosen model's own scale (cents, or ln cents for the log model). */
  r2: number;
  /**
   * √(Σ (price − prediction)² / df) in whole cents, on the original scale for both models
   * (the log model's prediction is its median, exp of the fitted log price).
   */
  residualStandardErrorCents: number;
  /** Leave-one-out root-mean-square prediction error of each model, in whole cents: the basis of the choice. */
  leaveOneOutErrorCents: Record<PriceModel, number>;
  n: number;
  df: number;
  describe: string;
  /** Residual standard error on the model's own scale (cents, or ln cents), for prediction bands. */
  sigma: number;
  /** (X'X)⁻¹ of the chosen model, intercept first, for prediction bands. */
  unscaledCovariance: number[][];
  /** The range of the data fitted; a band outside it is an extrapolation. */
  observed: { ruleLengthIn: [number, number]; features: [number, number] };
}

export interface PriceFitOptions {
  /** Fewest records to fit from (default 8; at least 6, three more than the two predictors plus one). */
  minRecords?: number;
}

export const DEFAULT_MIN_RECORDS = 8;
const LEAST_MIN_RECORDS = 6;

// Leave-one-out error judges both models on the one scale purchasing cares about (cents), counts
// against a model that only fits its own data, and is exact in closed form for least squares.
export const MODEL_CHOICE_RULE =
  'Two models are fitted: price in cents on rule length (in) and feature count, and ln(price) on ' +
  'ln(rule length) and feature count. The one with the lower leave-one-out root-mean-square ' +
  'prediction error in cents on the original price scale is chosen (for the log model each ' +
  'left-out die is predicted by exp of its left-out log prediction, the median); a tie goes to the linear model.';

// The design of each model: predictors and response on the model's own scale.
const designs: Record<PriceModel, (r: PriceObservation) => { x: [number, number]; y: number }> = {
  linear: (r) => ({ x: [r.ruleLengthIn, r.features], y: r.dieCents }),
  log: (r) => ({ x: [Math.log(r.ruleLengthIn), r.features], y: Math.log(r.dieCents) }),
};

/** Back to cents from the model's own scale. */
const toCents: Record<PriceModel, (v: number) => number> = { linear: (v) => v, log: (v) => Math.exp(v) };

const rms = (errors: readonly number[], divisor: number) =>
  Math.sqrt(errors.reduce((sum, e) => sum + e * e, 0) / divisor);

function fitModel(model: PriceModel, records: readonly PriceObservation[]) {
  const rows = records.map(designs[model]);
  const fit = fitOls(
    rows.map((r) => r.x),
    rows.map((r) => r.y),
  );
  if (!fit.enough) return fit;
  const back = toCents[model];
  const prices = records.map((r) => r.dieCents);
  // Least squares' closed form: with die i left out, its prediction on the model's scale is
  // y_i − e_i / (1 − h_ii); compared with its price in cents after back-transforming.
  const looErrors = prices.map((price, i) => price - back(rows[i]!.y - fit.residuals[i]! / (1 - fit.leverages[i]!)));
  const errors = prices.map((price, i) => price - back(fit.fitted[i]!));
  return { ...fit, looRmse: rms(looErrors, fit.n), rseCents: rms(errors, fit.df) };
}

// A record with leverage this close to 1 alone fixes a coefficient: leaving it out makes the design singular.
const LEVERAGE_LIMIT = 1 - 1e-9;

/**
 * Fits what a die costs in one currency from its rule length and feature count, choosing between
 * a linear and a log model by MODEL_CHOICE_RULE. Says so (enough: false) with too few records or
 * predictors too uniform to separate; throws on a bad record or mixed currencies.
 */
export function fitPrice(records: readonly PriceObservation[], opts: PriceFitOptions = {}): PriceFit | NotEnough {
  const needed = opts.minRecords ?? DEFAULT_MIN_RECORDS;
  if (!Number.isSafeInteger(needed) || needed < LEAST_MIN_RECORDS)
    throw new RangeError(`minRecords must be a whole number of at least ${LEAST_MIN_RECORDS} (got ${needed})`);
  const currency = checkObservations(records);
  if (currency === null || records.length < needed) {
    return { enough: false, reason: `${records.length} priced dies; a price fit needs at least ${needed}`, needed };
  }

  const linear = fitModel('linear', records);
  const log = fitModel('log', records);
  if (!linear.enough) return { ...linear, needed };
  if (!log.enough) return { ...log, needed };
  if ([...linear.leverages, ...log.leverages].some((h) => h > LEVERAGE_LIMIT)) {
    return {
      enough: false,
      reason:
        'One die alone sets a coefficient (its rule length or feature count is the only one of its kind); more varied dies are needed',
      needed,
    };
  }

  const model: PriceModel = log.looRmse < linear.looRmse ? 'log' : 'linear';
  const fit = model === 'log' ? log : linear;
  const named = (v: readonly number[]): PriceCoefficients => ({ intercept: v[0]!, perInch: v[1]!, perFeature: v[2]! });
  const range = (values: number[]): [number, number] => extent(values) as [number, number]; // records is not empty here
  const result: PriceFit = {
    enough: true,
    model,
    currency,
    coefficients: named(fit.coefficients),
    standardErrors: named(fit.standardErrors),
    r2: fit.r2,
    residualStandardErrorCents: Math.round(fit.rseCents),
    leaveOneOutErrorCents: { linear: Math.round(linear.looRmse), log: Math.round(log.looRmse) },
    n: fit.n,
    df: fit.df,
    describe: '',
    sigma: fit.residualStandardError,
    unscaledCovariance: fit.unscaledCovariance,
    observed: {
      ruleLengthIn: range(records.map((r) => r.ruleLengthIn)),
      features: range(records.map((r) => r.features)),
    },
  };
  result.describe = describe(result);
  return result;
}

function describe(fit: PriceFit): string {
  const money = (cents: number) => formatMoney({ cents: Math.round(cents), currency: fit.currency });
  const { intercept, perInch, perFeature } = fit.coefficients;
  const formula =
    fit.model === 'linear'
      ? `price ≈ ${money(intercept)} + ${money(perInch)} per inch of rule + ${money(perFeature)} per feature`
      : `price ≈ ${money(Math.exp(intercept))} × (rule inches)^${perInch.toFixed(3)} × ${Math.exp(perFeature).toFixed(4)}^features ` +
        `(each 1% more rule ≈ ${perInch.toFixed(2)}% more, each feature ≈ ${((Math.exp(perFeature) - 1) * 100).toFixed(2)}% more)`;
  const other: PriceModel = fit.model === 'linear' ? 'log' : 'linear';
  return (
    `${fit.model === 'linear' ? 'Linear' : 'Log'} model from ${fit.n} dies in ${fit.currency}: ${formula}; ` +
    `R² ${fit.r2.toFixed(3)}${fit.model === 'log' ? ' (of ln price)' : ''}, residual standard error ${money(fit.residualStandardErrorCents)}, ${fit.df} degrees of freedom. ` +
    `Chosen over the ${other} model by leave-one-out error (${money(fit.leaveOneOutErrorCents[fit.model])} against ${money(fit.leaveOneOutErrorCents[other])}).`
  );
}
