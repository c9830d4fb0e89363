import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { purchaseOrderPdf } from './purchaseOrderPdf';
import type { PurchaseOrderDoc } from './types';

const base: PurchaseOrderDoc = {
  poNumber: 'PO-2026-0042',
  issuedAt: new Date('2026-12-05T20:30:00Z'),
  timeZone: 'America/Chicago',
  buyer: {
    organisation: 'Prairie Folding Cartons',
    contact: 'Dana Whitfield',
    email: 'dana@prairie.example',
    deliveryAddress: '1200 Mill Road, Springfield IL',
    deliveryPostcode: '62701',
  },
  supplier: { organisation: 'Northside Rule & Die', postcode: '60607' },
  request: {
    id: 17,
    title: 'Cereal carton 4-up',
    jobReference: 'JOB-5521',
    needByDate: '2027-01-15',
    quantity: 2,
    ups: 4,
  },
  dieline: { fileName: 'cereal-carton.dxf', totalRuleIn: 312.46, complexity: 'complex' },
  lines: [
    { kind: 'die', description: 'Flatbed steel-rule die, 4-up', amountCents: 84500 },
    { kind: 'counter', description: 'Matrix counter', amountCents: 12000 },
    { kind: 'shipping', description: 'Ground freight', amountCents: 3500 },
  ],
  totalCents: 100000,
  currency: 'USD',
  leadDays: 7,
  promisedShipDate: '2026-12-15',
  bidRevision: 2,
  awardReason: 'Best lead time for the need-by date',
  notes: 'Call before delivery.',
};

// pdfjs-dist's own metrics for the standard fonts (the PO embeds none), read from disk.
const standardFontDataUrl = join(
  dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')),
  'standard_fonts/',
);

/** The text of every page, read back with pdfjs-dist (a general-purpose PDF library, not the writer). */
async function readBack(buf: Buffer): Promise<string[]> {
  const pdf = await getDocument({
    data: new Uint8Array(buf),
    useSystemFonts: false,
    disableFontFace: true,
    standardFontDataUrl,
  }).promise;
  const pages: string[] = [];
  for (let n = 1; n <= pdf.numPages; n++) {
    const content = await (await pdf.getPage(n)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' '));
  }
  await pdf.destroy();
  return pages;
}

describe('purchaseOrderPdf', () => {
  it('writes a PDF whose text carries the PO number, the supplier, every line and the total', async () => {
    const buf = await purchaseOrderPdf(base);
    // A PDF file starts with the "%PDF-" header (ISO 32000-1, 7.5.2).
    expect(buf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const [text = '', ...more] = await readBack(buf);
    expect(more).toHaveLength(0);
    expect(text).toContain('PO-2026-0042');
    expect(text).toContain('Northside Rule & Die');
    expect(text).toContain('Prairie Folding Cartons');
    // en-US currency format of 845.00, 120.00, 35.00 USD and their sum 1,000.00 (Intl.NumberFormat, ECMA-402).
    for (const amount of ['$845.00', '$120.00', '$35.00', '$1,000.00']) expect(text).toContain(amount);
    // 20:30 UTC is 14:30 CST in Chicago in December (IANA tz database: UTC−6 in winter).
    expect(text).toContain('Dec 5, 2026, 14:30 CST');
    expect(text).toContain('This purchase order accepts bid revision 2 as submitted.');
    expect(text).toMatch(/steel-rule dies are sharp/);
    expect(text).toContain('7 working days');
    expect(text).toContain('2027-01-15');
    expect(text).toContain('312.5 in');
  });

  it('prints a currency without minor units whole: 150000 JPY is ¥150,000', async () => {
    // JPY has no minor unit (ISO 4217 minor units 0), so 150000 "cents" are ¥150,000.
    const buf = await purchaseOrderPdf({
      ...base,
      currency: 'JPY',
      lines: [{ kind: 'die', description: 'Rotary die', amountCents: 150000 }],
      totalCents: 150000,
    });
    const text = (await readBack(buf)).join(' ');
    expect(text).toContain('¥150,000');
    expect(text).not.toContain('¥1,500');
  });

  it('runs onto more pages when there are many lines, losing none', async () => {
    const lines = Array.from({ length: 80 }, (_, i) => ({
      kind: 'other',
      description: `Insert number ${i + 1}`,
      amountCents: 1000 + i,
    }));
    const totalCents = lines.reduce((sum, line) => sum + line.amountCents, 0);
    const pages = await readBack(await purchaseOrderPdf({ ...base, lines, totalCents }));
    expect(pages.length).toBeGreaterThan(1);
    const text = pages.join(' ');
    for (let i = 0; i < lines.length; i++) {
      expect(text).toContain(`Insert number ${i + 1} `);
      expect(text).toContain(`$10.${String(i).padStart(2, '0')}`);
    }
    // 80 × $10.00 + (0 + 1 + … + 79) cents = $800.00 + $31.60 (arithmetic series, n(n−1)/2 = 3160).
    expect(text).toContain('$831.60');
    expect(pages.at(-1)).toContain(`page ${pages.length} of ${pages.length}`);
  });

  it('gives the same bytes for the same document', async () => {
    // The creation date (and so the file identifier) comes from issuedAt, not the clock (common practice for reproducible output).
    const [a, b] = await Promise.all([purchaseOrderPdf(base), purchaseOrderPdf(base)]);
    expect(a.equals(b)).toBe(true);
  });

  it('refuses lines that do not add up to the total, and a bad currency, with a clear error', async () => {
    await expect(purchaseOrderPdf({ ...base, totalCents: 99999 })).rejects.toThrow(
      'The price lines add up to 100000 but the total is 99999',
    );
    await expect(purchaseOrderPdf({ ...base, currency: 'US' })).rejects.toThrow('Not an ISO 4217 currency code: "US"');
    await expect(purchaseOrderPdf({ ...base, lines: [], totalCents: 0 })).rejects.toThrow('at least one price line');
    await expect(purchaseOrderPdf({ ...base, timeZone: 'Mars/Olympus' })).rejects.toThrow('time zone: "Mars/Olympus"');
  });

  it('prints Western European text and line ends plainly, and refuses what the standard fonts cannot show', async () => {
    // The standard fonts' WinAnsiEncoding is Windows-1252 (ISO 32000-1, Annex D): "é" and "€" are in it, "ł" is not.
    const buf = await purchaseOrderPdf({ ...base, notes: 'Livraison à l’entrepôt, 5 € de frais\r\nQuai\t2' });
    const text = (await readBack(buf)).join(' ');
    expect(text).toContain('Livraison à l’entrepôt, 5 € de frais');
    // A Windows line end and a tab print as a line break and a space, not as stray glyphs (common practice).
    expect(text).toContain('Quai 2');
    expect(text).not.toMatch(/frais\S/);
    await expect(
      purchaseOrderPdf({ ...base, supplier: { organisation: 'Zakład Wykrojników', postcode: null } }),
    ).rejects.toThrow('cannot print "ł" (in the supplier\'s organisation)');
  });
});
