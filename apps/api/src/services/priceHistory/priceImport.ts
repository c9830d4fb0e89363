import {
  dateInRange,
  earliestDate,
  importFields,
  latestDate,
  unitOfHeading,
  type ImportField,
  type ImportPreviewDto,
  type ImportRowError,
} from '@kerfmark/contracts';
import { complexityOf, inchesOf, type Complexity, type LengthUnit } from '@kerfmark/dieline';
import { isCurrencyCode, parseMoneyInput } from '@kerfmark/pricing';
import Papa from 'papaparse';
import { badRequest } from '../../lib/httpError';

export const MAX_IMPORT_ROWS = 20_000;

function parseCsv(text: string): string[][] {
  const result = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' });
  // A single-column file only warns about its delimiter; broken quoting loses data, so it stops.
  const fatal = result.errors.find((e) => e.type === 'Quotes');
  if (fatal) throw badRequest(`The file is not readable CSV: ${fatal.message} (row ${(fatal.row ?? 0) + 1}).`);
  if (result.data.length < 2) throw badRequest('The file needs a header row and at least one row of prices.');
  if (result.data.length - 1 > MAX_IMPORT_ROWS)
    throw badRequest(`At most ${MAX_IMPORT_ROWS.toLocaleString('en-US')} rows at a time; split the file.`);
  return result.data;
}

/** The first rows and a guess at which column is which, from the headers' words. */
export function previewImport(text: string): ImportPreviewDto {
  const [headers = [], ...rows] = parseCsv(text);
  const suggested: Partial<Record<ImportField, string>> = {};
  const taken = new Set<string>();
  for (const [field, spec] of Object.entries(importFields) as Array<
    [ImportField, (typeof importFields)[ImportField]]
  >) {
    for (const hint of spec.hints) {
      const header = headers.find((h) => !taken.has(h) && h.trim().toLowerCase().includes(hint));
      if (header) {
        suggested[field] = header;
        taken.add(header);
        break;
      }
    }
  }
  return { headers, rows: rows.slice(0, 10), totalRows: rows.length, suggested };
}

const unitWords: Record<LengthUnit, string> = { in: 'inches', mm: 'millimetres' };

export interface ImportedRecord {
  pricedOn: string;
  shopName: string;
  dieCents: number;
  totalCents: number;
  currency: string;
  ruleLengthIn: number;
  bends: number;
  curves: number;
  joints: number;
  punches: number;
  complexity: Complexity;
}

/**
 * Reads every row under the chosen mapping; any error in any row is reported with its row number
 * and nothing is imported (the caller writes the rows in one transaction only when there is none).
 */
export function readImport(
  text: string,
  mapping: Record<string, string>,
  defaultCurrency: string,
): { records: ImportedRecord[]; errors: ImportRowError[] } {
  const [headers = [], ...rows] = parseCsv(text);
  const missing = (Object.entries(importFields) as Array<[ImportField, { required: boolean; label: string }]>).filter(
    ([field, spec]) => spec.required && !(mapping[field] && headers.includes(mapping[field])),
  );
  if (missing.length) {
    throw badRequest(
      `Choose a column for: ${missing.map(([, s]) => s.label).join(', ')}.`,
      Object.fromEntries(missing.map(([f]) => [f, 'Choose a column'])),
    );
  }
  const column = (field: ImportField) => (mapping[field] ? headers.indexOf(mapping[field]) : -1);
  const ruleUnits = unitOfHeading(mapping.ruleLengthIn ?? '');
  const records: ImportedRecord[] = [];
  const errors: ImportRowError[] = [];
  rows.forEach((cells, i) => {
    const row = i + 2; // the header is row 1, as a spreadsheet counts
    const cell = (field: ImportField) => (column(field) >= 0 ? (cells[column(field)] ?? '').trim() : '');
    const fail = (field: ImportField, message: string) =>
      errors.push({ row, field: importFields[field].label, message });
    const count = (field: ImportField) => {
      const v = cell(field);
      if (v === '') return 0;
      if (!/^\d+$/.test(v)) {
        fail(field, `“${v}” is not a whole number`);
        return 0;
      }
      return Number(v);
    };
    const pricedOn = cell('pricedOn');
    if (!/^\d{4}-\d{2}-\d{2}$/.test(pricedOn) || Number.isNaN(Date.parse(`${pricedOn}T00:00:00Z`)))
      fail('pricedOn', `“${pricedOn}” is not a date as YYYY-MM-DD`);
    else if (!dateInRange(pricedOn))
      fail('pricedOn', `“${pricedOn}” is not a date from ${earliestDate} to ${latestDate}`);
    const shopName = cell('shopName');
    if (!shopName) fail('shopName', 'Empty');
    const currency = (cell('currency') || defaultCurrency).toUpperCase();
    if (!isCurrencyCode(currency)) fail('currency', `“${currency}” is not a currency code`);
    const dieCents = isCurrencyCode(currency) ? parseMoneyInput(cell('diePrice'), currency) : null;
    if (dieCents === null || dieCents === 0) fail('diePrice', `“${cell('diePrice')}” is not a price`);
    const totalText = cell('totalPrice');
    const totalCents = totalText && isCurrencyCode(currency) ? parseMoneyInput(totalText, currency) : dieCents;
    if (totalText && totalCents === null) fail('totalPrice', `“${totalText}” is not a price`);
    const ruleLength = Number(cell('ruleLengthIn'));
    const ruleLengthIn = inchesOf(ruleLength, ruleUnits);
    if (!(ruleLengthIn > 0) || ruleLengthIn > 100_000)
      fail('ruleLengthIn', `“${cell('ruleLengthIn')}” is not a rule length in ${unitWords[ruleUnits]}`);
    const features = {
      bends: count('bends'),
      curves: count('curves'),
      joints: count('joints'),
      punches: count('punches'),
    };
    const stated = cell('complexity').toLowerCase();
    if (stated && stated !== 'simple' && stated !== 'complex')
      fail('complexity', `“${stated}” is neither simple nor complex`);
    // Without a stated class, the dieline analysis's own rule decides (features per inch of rule).
    const complexity = stated ? (stated as Complexity) : complexityOf(features, ruleLengthIn);
    records.push({
      pricedOn,
      shopName,
      dieCents: dieCents ?? 0,
      totalCents: totalCents ?? 0,
      currency,
      ruleLengthIn,
      ...features,
      complexity,
    });
  });
  return { records, errors };
}
