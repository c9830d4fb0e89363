import type { Complexity } from '@kerfmark/dieline';
import type { PriceHistoryQuery, PriceRecordDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { z } from 'zod';

export type PriceFilters = z.output<typeof PriceHistoryQuery>;

/** The printer's own price records, narrowed by the filters of the price history view. */
export function filteredRecords(knex: Knex, organisationId: number, f: Partial<PriceFilters>): Knex.QueryBuilder {
  const q = knex('priceRecords').where('priceRecords.organisationId', organisationId);
  if (f.from) q.where('pricedOn', '>=', f.from);
  if (f.to) q.where('pricedOn', '<=', f.to);
  if (f.complexity) q.where('complexity', f.complexity);
  if (f.shop) q.where('shopName', f.shop);
  if (f.minIn !== undefined) q.where('ruleLengthIn', '>=', f.minIn);
  if (f.maxIn !== undefined) q.where('ruleLengthIn', '<=', f.maxIn);
  if (f.currency) q.where('currency', f.currency);
  if (f.ruleType) q.where(`${f.ruleType}In`, '>', 0);
  return q;
}

/** A price_records row as the API answers it. */
export const toPriceRecordDto = (r: Record<string, unknown>): PriceRecordDto => ({
  id: Number(r.id),
  pricedOn: String(r.pricedOn),
  shopName: String(r.shopName),
  requestId: (r.requestId as number | null) ?? null,
  totalCents: Number(r.totalCents),
  dieCents: Number(r.dieCents),
  currency: String(r.currency),
  ruleLengthIn: Number(r.ruleLengthIn),
  cutIn: Number(r.cutIn),
  creaseIn: Number(r.creaseIn),
  perfIn: Number(r.perfIn),
  kissIn: Number(r.kissIn),
  bends: Number(r.bends),
  curves: Number(r.curves),
  joints: Number(r.joints),
  punches: Number(r.punches),
  boardAreaSqIn: Number(r.boardAreaSqIn),
  complexity: r.complexity as Complexity,
  source: r.source as 'award' | 'import',
});
