import { featureCount } from '@kerfmark/dieline';
import { pricedLength, type DielineMetrics } from '@kerfmark/contracts';
import { fairPriceBand } from '@kerfmark/pricing';
import type { HistoryFits } from './historyFits';

/** The band for a die of these metrics, from the organisation's history, or why there is none. */
export async function fairPriceFor(
  fits: Pick<HistoryFits, 'fitFor'>,
  organisationId: number,
  metrics: DielineMetrics | null | undefined,
  currency: string,
) {
  if (!metrics) return { enough: false as const, reason: 'The request has no measured dieline yet.', needed: 0 };
  const fit = await fits.fitFor(organisationId, currency);
  if (!fit.enough) return fit;
  const die = { ruleLengthIn: pricedLength(metrics.length), features: featureCount(metrics) };
  if (!(die.ruleLengthIn > 0))
    return { enough: false as const, reason: 'The dieline has no priced rule to price.', needed: 0 };
  return {
    enough: true as const,
    band: fairPriceBand(fit, die),
    die,
    model: fit.model,
    n: fit.n,
    describe: fit.describe,
  };
}
