import { featureCount, type Complexity } from '@kerfmark/dieline';
import type { PriceObservation } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import { filteredRecords, type PriceFilters } from './priceRecordQuery';

/** The fit works on at most this many records (a pseudo-random sample past it): enough for stable estimates. */
export const FIT_SAMPLE = 5000;

/** The currency most of the filtered records are in, when the filters name none. */
export async function mainCurrency(
  knex: Knex,
  organisationId: number,
  f: Partial<PriceFilters>,
): Promise<string | null> {
  const row = await filteredRecords(knex, organisationId, f)
    .groupBy('currency')
    .select('currency')
    .count('* as n')
    .orderBy('n', 'desc')
    .first();
  return (row?.currency as string | undefined) ?? null;
}

/** The filtered records in one currency as observations for the price fit, with the shop of each. */
export async function priceObservations(
  knex: Knex,
  organisationId: number,
  f: Partial<PriceFilters>,
  currency: string,
): Promise<{ total: number; rows: Array<{ observation: PriceObservation; shopName: string }> }> {
  const [{ count }] = await filteredRecords(knex, organisationId, { ...f, currency }).count('* as count');
  const q = filteredRecords(knex, organisationId, { ...f, currency }).select(
    'dieCents',
    'currency',
    'ruleLengthIn',
    'bends',
    'curves',
    'joints',
    'punches',
    'complexity',
    'pricedOn',
    'shopName',
  );
  // A sample in a fixed pseudo-random order (by a hash of the id), not random(): every API
  // instance, and every refit, then shows the same band for the same history.
  if (Number(count) > FIT_SAMPLE) q.orderByRaw('hashint8(price_records.id)').limit(FIT_SAMPLE);
  const rows = (await q) as Array<Record<string, unknown>>;
  return {
    total: Number(count),
    rows: rows.map((r) => ({
      observation: {
        dieCents: Number(r.dieCents),
        currency: String(r.currency),
        ruleLengthIn: Number(r.ruleLengthIn),
        features: featureCount({
          bends: Number(r.bends),
          curves: Number(r.curves),
          joints: Number(r.joints),
          punches: Number(r.punches),
        }),
        complexity: r.complexity as Complexity,
        pricedOn: String(r.pricedOn),
      },
      shopName: String(r.shopName),
    })),
  };
}
