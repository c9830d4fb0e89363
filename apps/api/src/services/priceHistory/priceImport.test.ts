import { describe, expect, it } from 'vitest';
import { previewImport, readImport } from './priceImport';

const csv = `Date,Supplier,Die price,Total,Rule length (in),Bends,Punches
2026-03-02,North Rule,"1,185.00",1325.00,143.3,44,2
2026-04-10,Lake Dies,420,455.5,61.2,12,0
`;

describe('price history import', () => {
  it('guesses the mapping from the headers and previews the rows', () => {
    const preview = previewImport(csv);
    expect(preview.totalRows).toBe(2);
    expect(preview.suggested).toMatchObject({
      pricedOn: 'Date',
      shopName: 'Supplier',
      diePrice: 'Die price',
      totalPrice: 'Total',
      ruleLengthIn: 'Rule length (in)',
      bends: 'Bends',
      punches: 'Punches',
    });
  });

  it('reads prices into whole cents and classes each die by the analysis rule', () => {
    const { records, errors } = readImport(csv, previewImport(csv).suggested as Record<string, string>, 'USD');
    expect(errors).toEqual([]);
    expect(records[0]).toMatchObject({
      dieCents: 118_500,
      totalCents: 132_500,
      currency: 'USD',
      bends: 44,
      punches: 2,
      complexity: 'simple',
    });
    expect(records[1]).toMatchObject({ dieCents: 42_000, totalCents: 45_550 });
  });

  it('reports every bad row with its number, as a spreadsheet counts rows', () => {
    const bad = `${csv}31/12/2026,,abc,,-4,2.5,\n`;
    const { errors } = readImport(bad, previewImport(bad).suggested as Record<string, string>, 'USD');
    expect(errors.map((e) => [e.row, e.field])).toEqual([
      [4, 'Date'],
      [4, 'Die shop'],
      [4, 'Die price'],
      [4, 'Rule length (in or mm)'],
      [4, 'Bends'],
    ]);
  });

  // PostgreSQL has no year 0000; the dates taken run from 1900-01-01 to 2200-12-31.
  it('reports a date outside the range taken as a bad row, not a database error', () => {
    const far = `${csv}0000-01-01,Acme Dies,100.00,110.00,20,4,0\n2201-01-01,Acme Dies,100.00,110.00,20,4,0\n`;
    const { errors } = readImport(far, previewImport(far).suggested as Record<string, string>, 'USD');
    expect(errors.map((e) => [e.row, e.field])).toEqual([
      [4, 'Date'],
      [5, 'Date'],
    ]);
    expect(errors[0]!.message).toMatch(/from 1900-01-01 to 2200-12-31/);
  });

  it('refuses a mapping without the required columns, and a file that is not CSV', () => {
    expect(() => readImport(csv, { pricedOn: 'Date' }, 'USD')).toThrow(
      /Choose a column for: Die shop, Die price, Rule length/,
    );
    expect(() => previewImport('only a header\n')).toThrow(/at least one row/);
    expect(() => previewImport('a,b\n"unclosed,1\n')).toThrow(/not readable CSV/);
  });
});
