import type { Page, PriceRecordDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { filteredRecords, toPriceRecordDto, type PriceFilters } from './priceRecordQuery';

/** One page of the filtered history, newest first. */
export async function priceRecordPage(
  knex: Knex,
  organisationId: number,
  f: PriceFilters,
): Promise<Page<PriceRecordDto>> {
  const [rows, [{ count }]] = await Promise.all([
    filteredRecords(knex, organisationId, f)
      .orderBy([
        { column: 'pricedOn', order: 'desc' },
        { column: 'id', order: 'desc' },
      ])
      .limit(f.pageSize)
      .offset((f.page - 1) * f.pageSize),
    filteredRecords(knex, organisationId, f).count('* as count'),
  ]);
  return {
    items: (rows as Array<Record<string, unknown>>).map(toPriceRecordDto),
    total: Number(count),
    page: f.page,
    pageSize: f.pageSize,
  };
}
