import { statSync } from 'node:fs';
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
  units: 'in',
  locale: 'en-US',
  paper: 'LETTER',
  buyer: {
    organisation: 'Prairie Folding Cartons LLC',
    officeAddress: '400 Quarry Row\nSuite 12\nSpringfield IL',
    postcode: '62702',
    paymentTerms: 'Net 45 from receipt of the die',
    contact: 'Dana Whitfield',
    email: 'dana@prairie.example',
    deliveryAddress: '1200 Mill Road, Springfield IL',
    deliveryPostcode: '62701',
  },
  supplier: {
    organisation: 'Northside Rule & Die Inc.',
    officeAddress: '88 Foundry Lane\nChicago IL',
    postcode: '60607',
    email: 'orders@northside.example',
  },
  request: {
    id: 17,
    title: 'Cereal carton 4-up',
    jobReference: 'JOB-5521',
    needByDate: '2027-01-15',
    quantity: 2,
    ups: 4,
  },
  dieline: {
    fileName: 'cereal-carton.dxf',
    totalRuleIn: 312.46,
    board: { width: 22, height: 30 },
    complexity: 'complex',
  },
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

// pdfjs-dist's own metrics for the standard fonts, read from disk (the PO embeds its fonts).
const standardFontDataUrl = join(
  dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')),
  'standard_fonts/',
);

/** Each piece of text of every page with the name of the font it is set in, read back with pdfjs-dist. */
async function readPieces(buf: Buffer): Promise<Array<Array<{ text: string; font: string }>>> {
  const pdf = await getDocument({
    data: new Uint8Array(buf),
    useSystemFonts: false,
    disableFontFace: true,
    standardFontDataUrl,
  }).promise;
  const pages = [];
  for (let n = 1; n <= pdf.numPages; n++) {
    const page = await pdf.getPage(n);
    const content = await page.getTextContent();
    await page.getOperatorList(); // loads the page's fonts into commonObjs
    pages.push(
      content.items.flatMap((item) =>
        'str' in item ? [{ text: item.str, font: (page.commonObjs.get(item.fontName) as { name: string }).name }] : [],
      ),
    );
  }
  await pdf.destroy();
  return pages;
}

/** The text of every page, read back with pdfjs-dist (a general-purpose PDF library, not the writer). */
async function readBack(buf: Buffer): Promise<string[]> {
  return (await readPieces(buf)).map((pieces) => pieces.map((p) => p.text).join(' '));
}

const fontFile = (path: string) => createRequire(import.meta.url).resolve(`@expo-google-fonts/${path}`);

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
    expect(text).toContain('Fri, Jan 15, 2027');
    // The issuer's units first, the other beside: 312.46 × 25.4 = 7,936.48 mm (1 in = 25.4 mm exactly).
    expect(text).toContain('312.5 in (7,936 mm)');
    expect(text).toContain('22.00 × 30.00 in (558.8 × 762.0 mm)');
  });

  it('prints for a metric issuer in millimetres first, with British dates, on A4', async () => {
    const buf = await purchaseOrderPdf({
      ...base,
      units: 'mm',
      locale: 'en-GB',
      paper: 'A4',
      timeZone: 'Europe/Berlin',
    });
    const [text = ''] = await readBack(buf);
    expect(text).toContain('7,936 mm (312.5 in)');
    expect(text).toContain('558.8 × 762.0 mm (22.00 × 30.00 in)');
    expect(text).toContain('Fri, 15 Jan 2027');
    // 20:30 UTC is 21:30 in Berlin in December (IANA tz database: UTC+1 in winter).
    expect(text).toContain('5 Dec 2026, 21:30 CET');
    // ISO 216 A4 is 210 × 297 mm: 595.28 × 841.89 pt at 72 pt to the inch.
    const pdf = await getDocument({ data: new Uint8Array(buf), standardFontDataUrl }).promise;
    const [, , w, h] = (await pdf.getPage(1)).view;
    await pdf.destroy();
    expect(w).toBeCloseTo((210 / 25.4) * 72, 0);
    expect(h).toBeCloseTo((297 / 25.4) * 72, 0);
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

  it('prints Western European text and line ends plainly', async () => {
    const buf = await purchaseOrderPdf({ ...base, notes: 'Livraison à l’entrepôt, 5 € de frais\r\nQuai\t2' });
    const text = (await readBack(buf)).join(' ');
    expect(text).toContain('Livraison à l’entrepôt, 5 € de frais');
    // A Windows line end and a tab print as a line break and a space, not as stray glyphs (common practice).
    expect(text).toContain('Quai 2');
    expect(text).not.toMatch(/frais\S/);
  });

  it('prints the issuing printer, its office and payment terms, the supplier and the delivery address', async () => {
    const text = (await readBack(await purchaseOrderPdf(base))).join(' ');
    // Every line of each multi-line address prints as a line of its own.
    for (const line of ['Prairie Folding Cartons LLC', '400 Quarry Row', 'Suite 12', 'Springfield IL', '62702'])
      expect(text).toContain(line);
    for (const line of ['Northside Rule & Die Inc.', '88 Foundry Lane', 'Chicago IL', '60607'])
      expect(text).toContain(line);
    expect(text).toContain('orders@northside.example');
    expect(text).toContain('1200 Mill Road, Springfield IL');
    expect(text).toMatch(/Payment terms:\s+Net 45 from receipt of the die/);
  });

  it('prints names and addresses in any script as text, each in a font that has its glyphs', async () => {
    const doc: PurchaseOrderDoc = {
      ...base,
      buyer: {
        ...base.buyer,
        organisation: 'Łódź Kartonaż Sp. z o.o.',
        officeAddress: 'ul. Wymyślona 12\nŁódź',
        paymentTerms: 'Przelew 30 dni',
        deliveryAddress: 'Magazyn 3, ul. Zmyślona 7',
        deliveryPostcode: '90-002',
      },
      supplier: {
        organisation: '東京抜型製作所',
        officeAddress: '東京都架空区見本町1-2-3',
        postcode: '100-0001',
        email: null,
      },
      // Korean, Simplified Chinese, Thai, Cyrillic and Greek, in the notes.
      notes: '서울 종로구 / 上海纸箱 / กรุงเทพ / Москва / Αθήνα',
    };
    const buf = await purchaseOrderPdf(doc);
    const pieces = (await readPieces(buf)).flat();
    const fontOf = (text: string) => pieces.find((p) => p.text.includes(text))?.font;
    // A subset font's name is a six-letter tag, "+", and the font's PostScript name (ISO 32000-1, 9.6.4).
    expect(fontOf('Łódź Kartonaż Sp. z o.o.')).toMatch(/^[A-Z]{6}\+NotoSans-Regular$/);
    expect(fontOf('東京抜型製作所')).toMatch(/^[A-Z]{6}\+NotoSansJP-Regular$/);
    expect(fontOf('東京都架空区見本町1-2-3')).toMatch(/\+NotoSansJP-Regular$/);
    expect(fontOf('서울 종로구')).toMatch(/\+NotoSansKR-Regular$/);
    // "纸" (U+7EB8) is a simplified form, not in the Japanese font: the Chinese one prints it.
    expect(fontOf('纸')).toMatch(/\+NotoSansSC-Regular$/);
    expect(fontOf('กรุงเทพ')).toMatch(/\+NotoSansThai-Regular$/);
    const text = pieces.map((p) => p.text).join(' ');
    expect(text).toMatch(/Payment terms:\s+Przelew 30 dni/);
    for (const expected of ['ul. Wymyślona 12', 'Magazyn 3, ul. Zmyślona 7', '90-002', '100-0001', 'Москва', 'Αθήνα'])
      expect(text).toContain(expected);
    // pdfkit embeds only the glyphs used: the PDF is a small fraction of the Japanese font alone.
    const japaneseFont = statSync(fontFile('noto-sans-jp/400Regular/NotoSansJP_400Regular.ttf')).size;
    expect(buf.length).toBeLessThan(japaneseFont / 20);
    expect(buf.length).toBeLessThan(150_000);
  });

  it('prints a name typed with combining accents as the composed letters', async () => {
    // "o" + U+0301 COMBINING ACUTE ACCENT composes to "ó" (Unicode NFC, UAX #15).
    const buf = await purchaseOrderPdf({ ...base, buyer: { ...base.buyer, organisation: 'Lo\u0301dz\u0301 Karton' } });
    expect((await readBack(buf)).join(' ')).toContain('Lódź Karton');
  });

  it('still prints the rest of a text when no font has one of its characters', async () => {
    // U+1F4E6 PACKAGE is an emoji, in none of the embedded fonts.
    const buf = await purchaseOrderPdf({ ...base, notes: 'Packed in one crate 📦 as agreed' });
    const text = (await readBack(buf)).join(' ');
    expect(text).toContain('Packed in one crate');
    expect(text).toContain('as agreed');
  });
});
