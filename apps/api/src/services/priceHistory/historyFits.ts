import { fitPrice } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { priceObservations } from './priceObservations';

/** Fits are kept this long per organisation and currency: the history changes slowly. */
const FIT_CACHE_MS = 5 * 60_000;

export type HistoryFit = ReturnType<typeof fitPrice>;

/**
 * The unfiltered fit behind every fair-price band, cached so that a bid comparison does not
 * refit the whole history; an import or a received die clears the organisation's entries. The
 * promise is what is kept, so that many comparisons arriving together share one fit.
 */
export function createHistoryFits(knex: Knex) {
  const fits = new Map<string, { at: number; fit: Promise<HistoryFit> }>();
  return {
    fitFor(organisationId: number, currency: string): Promise<HistoryFit> {
      const key = `${organisationId}:${currency}`;
      const hit = fits.get(key);
      if (hit && Date.now() - hit.at < FIT_CACHE_MS) return hit.fit;
      const fit = priceObservations(knex, organisationId, {}, currency).then(({ rows }) =>
        fitPrice(rows.map((r) => r.observation)),
      );
      fits.set(key, { at: Date.now(), fit });
      // A failed fit (the database was down, say) is not kept.
      fit.catch(() => fits.get(key)?.fit === fit && fits.delete(key));
      return fit;
    },
    /** Drops the cached fits of an organisation whose history just changed. */
    forget(organisationId: number) {
      for (const key of fits.keys()) if (key.startsWith(`${organisationId}:`)) fits.delete(key);
    },
  };
}

export type HistoryFits = ReturnType<typeof createHistoryFits>;
