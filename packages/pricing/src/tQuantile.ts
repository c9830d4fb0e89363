import quantile from '@stdlib/stats-base-dists-t-quantile';

/** The p-quantile of Student's t distribution with `df` degrees of freedom (from @stdlib). */
export function tQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`A probability strictly between 0 and 1 is needed (got ${p})`);
  if (!(df > 0) || !Number.isFinite(df)) throw new RangeError(`Degrees of freedom must be above 0 (got ${df})`);
  return quantile(p, df);
}
