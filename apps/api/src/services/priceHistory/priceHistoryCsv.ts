import { toMajorString } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import Papa from 'papaparse';
import { formulaSafe } from '../../lib/formulaSafe';
import { filteredRecords, toPriceRecordDto, type PriceFilters } from './priceRecordQuery';

/** The filtered history as CSV, money in major units (as people read it), dates as YYYY-MM-DD. */
export async function priceHistoryCsv(knex: Knex, organisationId: number, f: PriceFilters): Promise<string> {
  const rows = (
    (await filteredRecords(knex, organisationId, f).orderBy('pricedOn').limit(200_000)) as Array<
      Record<string, unknown>
    >
  ).map(toPriceRecordDto);
  return Papa.unparse({
    fields: [
      'Date',
      'Die shop',
      'Die price',
      'Total price',
      'Currency',
      'Rule length (in)',
      'Cutting (in)',
      'Creasing (in)',
      'Perforating (in)',
      'Kiss cut (in)',
      'Bends',
      'Curves',
      'Joints',
      'Punches',
      'Board area (sq in)',
      'Complexity',
      'Source',
    ],
    // Text cells are formula-safe (an imported shop name may start with =); amounts stay numbers.
    data: rows.map((r) => [
      r.pricedOn,
      formulaSafe(r.shopName),
      toMajorString(r.dieCents, r.currency),
      toMajorString(r.totalCents, r.currency),
      r.currency,
      r.ruleLengthIn,
      r.cutIn,
      r.creaseIn,
      r.perfIn,
      r.kissIn,
      r.bends,
      r.curves,
      r.joints,
      r.punches,
      r.boardAreaSqIn,
      r.complexity,
      formulaSafe(r.source),
    ]),
  });
}
