import { quantileSorted } from 'd3-array';
import type { NotEnough } from './notEnough';
import { checkObservations, type PriceObservation } from './observations';

export interface PerInchSpread {
  enough: true;
  n: number;
  /** Quartiles (R-7, as d3-array and most spreadsheets compute them) of die price per inch of rule, whole cents. */
  q1Cents: number;
  medianCents: number;
  q3Cents: number;
}

export interface PricePerInch {
  /** null when there are no records. */
  currency: string | null;
  simple: PerInchSpread | NotEnough;
  complex: PerInchSpread | NotEnough;
}

export const DEFAULT_MIN_PER_CLASS = 4;

/**
 * Die price per inch of rule for simple and complex dies apart: n, median and quartiles in
 * whole cents. A class with fewer than `minPerClass` records (default 4, so each quartile
 * rests on more than one die) says so. Throws on a bad record or mixed currencies.
 */
export function pricePerInch(records: readonly PriceObservation[], opts: { minPerClass?: number } = {}): PricePerInch {
  const needed = opts.minPerClass ?? DEFAULT_MIN_PER_CLASS;
  if (!Number.isSafeInteger(needed) || needed < 1)
    throw new RangeError(`minPerClass must be a whole number of at least 1 (got ${needed})`);
  const currency = checkObservations(records);
  const spread = (complexity: PriceObservation['complexity']): PerInchSpread | NotEnough => {
    const perInch = records
      .filter((r) => r.complexity === complexity)
      .map((r) => r.dieCents / r.ruleLengthIn)
      .sort((a, b) => a - b);
    if (perInch.length < needed)
      return {
        enough: false,
        reason: `${perInch.length} ${complexity} dies; price per inch needs at least ${needed}`,
        needed,
      };
    const at = (p: number) => Math.round(quantileSorted(perInch, p)!);
    return { enough: true, n: perInch.length, q1Cents: at(0.25), medianCents: at(0.5), q3Cents: at(0.75) };
  };
  return { currency, simple: spread('simple'), complex: spread('complex') };
}
