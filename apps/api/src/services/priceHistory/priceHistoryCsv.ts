import { areaIn, areaUnitName, lengthIn, type LengthUnit } from '@kerfmark/dieline';
import { toMajorString } from '@kerfmark/pricing';
import type { Knex } from 'knex';
import Papa from 'papaparse';
import { formulaSafe } from '../../lib/formulaSafe';
import { filteredRecords, toPriceRecordDto, type PriceFilters } from './priceRecordQuery';

/**
 * The filtered history as CSV, money in major units (as people read it), dates as YYYY-MM-DD,
 * lengths in the reader's units (millimetres to 0.1, areas in cm²) and named so in the headings.
 */
export async function priceHistoryCsv(
  knex: Knex,
  organisationId: number,
  f: PriceFilters,
  units: LengthUnit = 'in',
): Promise<string> {
  const len = (inches: number) => (units === 'mm' ? Math.round(lengthIn('mm', inches) * 10) / 10 : inches);
  const area = (sqIn: number) => (units === 'mm' ? Math.round(areaIn('mm', sqIn) * 10) / 10 : sqIn);
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
      `Rule length (${units})`,
      `Cutting (${units})`,
      `Creasing (${units})`,
      `Perforating (${units})`,
      `Kiss cut (${units})`,
      'Bends',
      'Curves',
      'Joints',
      'Punches',
      `Board area (${areaUnitName(units)})`,
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
      len(r.ruleLengthIn),
      len(r.cutIn),
      len(r.creaseIn),
      len(r.perfIn),
      len(r.kissIn),
      r.bends,
      r.curves,
      r.joints,
      r.punches,
      area(r.boardAreaSqIn),
      r.complexity,
      formulaSafe(r.source),
    ]),
  });
}
