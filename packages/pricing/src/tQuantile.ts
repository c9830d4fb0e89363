import quantile from '@stdlib/stats-base-dists-t-quantile';

// Remembered: a fair-price band asks for the same few quantiles (one level, one fit's degrees of
// freedom) on every bid comparison, and each takes tens of microseconds to invert.
const remembered = new Map<string, number>();

/** The p-quantile of Student's t distribution with `df` degrees of freedom (from @stdlib). */
export function tQuantile(p: number, df: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`A probability strictly between 0 and 1 is needed (got ${p})`);
  if (!(df > 0) || !Number.isFinite(df)) throw new RangeError(`Degrees of freedom must be above 0 (got ${df})`);
  const key = `${p}:${df}`;
  let value = remembered.get(key);
  if (value === undefined) {
    if (remembered.size >= 1000) remembered.clear();
    value = quantile(p, df);
    remembered.set(key, value);
  }
  return value;
}
