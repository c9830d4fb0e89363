import { bidLineLabels, formatCalendarDate, formatInZone } from '@kerfmark/contracts';
import { complexityLabels, formatLength, formatSize, type LengthStyle } from '@kerfmark/dieline';
import { formatMoney } from '@kerfmark/pricing';
import PDFDocument from 'pdfkit';
import type { PurchaseOrderDoc } from './types';
import { checkDocument, plain } from './checkDocument';
import { fontFaces } from './fontFaces';
import { fontRuns } from './fontRuns';
import { useFace } from './useFace';
import { writeText, type WriteOptions } from './writeText';

const INK = '#1a1a1a';
const MUTED = '#666666';
const RULE = '#bbbbbb';
const MARGIN = 50;
const SAFETY_LINE = 'Safety: steel-rule dies are sharp. Pack rule edges protected; handle with gloves.';

type Pdf = PDFKit.PDFDocument;

/**
 * The purchase order an award issues, as a PDF: who buys, who makes, what, for how much and by
 * when. Deterministic: the same document gives the same bytes (the creation date is issuedAt).
 * Names and addresses print in any script the embedded Noto Sans fonts cover (see `fontFaces`).
 */
export async function purchaseOrderPdf(doc: PurchaseOrderDoc): Promise<Buffer> {
  checkDocument(doc);
  const money = (cents: number) => formatMoney({ cents, currency: doc.currency });
  const pdf = new PDFDocument({
    size: doc.paper,
    margin: MARGIN,
    bufferPages: true, // so every page can carry "page n of m" at the end
    info: {
      Title: `Purchase order ${doc.poNumber}`,
      Author: 'Kerfmark',
      Creator: 'Kerfmark',
      Producer: 'Kerfmark',
      CreationDate: doc.issuedAt,
    },
  });
  const bytes = collect(pdf);
  const left = pdf.page.margins.left;
  const width = pdf.page.width - left - pdf.page.margins.right;

  // Wordmark and title.
  pdf.fillColor(INK).fontSize(22);
  writeText(pdf, 'Kerfmark', { weight: 'bold', x: left, y: MARGIN });
  pdf.fontSize(18);
  writeText(pdf, 'Purchase order', { weight: 'bold', x: left, y: MARGIN + 2, width, align: 'right' });
  pdf.fontSize(10).moveDown(0.3);
  writeText(pdf, `PO number ${doc.poNumber}`, { width, align: 'right' });
  writeText(pdf, `Issued ${formatInZone(doc.issuedAt, doc.timeZone, doc.locale)}`, { width, align: 'right' });
  pdf.moveDown(1.5);

  // Buyer, supplier and delivery side by side.
  const gap = 16;
  const column = (width - 2 * gap) / 3;
  const top = pdf.y;
  const { buyer, supplier } = doc;
  const bottoms = [
    block(pdf, left, top, column, 'Buyer', [
      buyer.organisation,
      buyer.officeAddress,
      buyer.postcode,
      buyer.contact,
      buyer.email,
    ]),
    block(pdf, left + column + gap, top, column, 'Supplier', [
      supplier.organisation,
      supplier.officeAddress,
      supplier.postcode,
      supplier.email,
    ]),
    block(
      pdf,
      left + 2 * (column + gap),
      top,
      column,
      'Deliver to',
      doc.buyer.deliveryAddress
        ? [doc.buyer.deliveryAddress, doc.buyer.deliveryPostcode]
        : ['To be confirmed by the buyer'],
    ),
  ];
  pdf.x = left;
  pdf.y = Math.max(...bottoms) + 12;

  section(pdf, 'Request', width);
  field(pdf, 'Title', doc.request.title);
  if (doc.request.jobReference) field(pdf, 'Job reference', doc.request.jobReference);
  field(pdf, 'Quantity of dies', String(doc.request.quantity));
  field(pdf, 'Ups', String(doc.request.ups));
  field(
    pdf,
    'Need-by date',
    doc.request.needByDate ? formatCalendarDate(doc.request.needByDate, doc.locale) : 'None given',
  );

  section(pdf, 'Dieline', width);
  if (doc.dieline) {
    field(pdf, 'File', doc.dieline.fileName);
    field(
      pdf,
      'Total rule length',
      bothUnits(doc, (style) => formatLength(doc.dieline!.totalRuleIn, style, 1)),
    );
    const board = doc.dieline.board;
    if (board)
      field(
        pdf,
        'Board',
        bothUnits(doc, (style) => formatSize(board.width, board.height, style)),
      );
    field(pdf, 'Complexity', complexityLabels[doc.dieline.complexity]);
  } else {
    writeText(pdf, 'No dieline attached.');
  }

  section(pdf, 'Price lines', width);
  priceTable(pdf, doc, money, left, width);

  section(pdf, 'Terms', width);
  if (doc.buyer.paymentTerms) field(pdf, 'Payment terms', doc.buyer.paymentTerms);
  field(pdf, 'Currency', doc.currency);
  field(pdf, 'Lead time', `${doc.leadDays} working ${doc.leadDays === 1 ? 'day' : 'days'}`);
  field(pdf, 'Promised ship date', formatCalendarDate(doc.promisedShipDate, doc.locale));
  field(pdf, 'Bid revision', String(doc.bidRevision));
  if (doc.awardReason) field(pdf, 'Award reason', doc.awardReason);
  if (doc.notes) field(pdf, 'Notes', doc.notes);
  pdf.moveDown(0.5);
  writeText(pdf, `This purchase order accepts bid revision ${doc.bidRevision} as submitted.`);
  pdf.moveDown(0.5);
  writeText(pdf, SAFETY_LINE, { weight: 'bold' });

  pageFooters(pdf, doc.poNumber, left, width);
  pdf.end();
  return bytes;
}

/** A length in the issuer's units with the other unit beside, so either side reads it: "312.5 in (7,937 mm)". */
function bothUnits(doc: PurchaseOrderDoc, text: (style: LengthStyle) => string): string {
  const other = doc.units === 'mm' ? 'in' : 'mm';
  return `${text({ units: doc.units, locale: doc.locale })} (${text({ units: other, locale: doc.locale })})`;
}

function collect(pdf: Pdf): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    pdf.on('data', (chunk: Buffer) => chunks.push(chunk));
    pdf.on('end', () => resolve(Buffer.concat(chunks)));
    pdf.on('error', reject);
  });
}

/** A small labelled block of lines at (x, y); returns where it ends. */
function block(pdf: Pdf, x: number, y: number, width: number, heading: string, lines: Array<string | null>): number {
  pdf.fontSize(9).fillColor(MUTED);
  writeText(pdf, heading.toUpperCase(), { weight: 'bold', x, y, width });
  pdf.fontSize(10).fillColor(INK);
  for (const line of lines) if (line) writeText(pdf, plain(line), { x, y: pdf.y, width });
  return pdf.y;
}

function section(pdf: Pdf, title: string, width: number): void {
  // Keep a heading with at least a few lines of what follows it.
  if (pdf.y + 60 > pdf.page.maxY()) pdf.addPage();
  const x = pdf.page.margins.left;
  pdf.moveDown(0.8);
  pdf.fontSize(11).fillColor(INK);
  writeText(pdf, title, { weight: 'bold', x, y: pdf.y, width });
  pdf
    .moveTo(x, pdf.y + 1)
    .lineTo(x + width, pdf.y + 1)
    .lineWidth(0.5)
    .strokeColor(RULE)
    .stroke();
  pdf.moveDown(0.4).fontSize(10);
}

function field(pdf: Pdf, label: string, value: string): void {
  writeText(pdf, `${label}: `, { weight: 'bold', continued: true });
  writeText(pdf, plain(value));
}

/** The height text takes at a width: the tallest of the heights in each font it prints in. */
function heightOf(pdf: Pdf, text: string, options: WriteOptions): number {
  const faces = new Set(fontRuns(text || ' ', fontFaces(options.weight ?? 'regular')).map((run) => run.face));
  return Math.max(...[...faces].map((face) => useFace(pdf, face).heightOfString(text || ' ', options)));
}

/** The price lines with amounts right-aligned and the total in bold; repeats its header on a new page. */
function priceTable(
  pdf: Pdf,
  doc: PurchaseOrderDoc,
  money: (cents: number) => string,
  left: number,
  width: number,
): void {
  const kindWidth = 130;
  const amountWidth = 100;
  const descX = left + kindWidth + 10;
  const descWidth = width - kindWidth - amountWidth - 20;
  const amountX = left + width - amountWidth;
  const header = () => {
    pdf.fontSize(9).fillColor(MUTED);
    const y = pdf.y;
    writeText(pdf, 'Item', { weight: 'bold', x: left, y, width: kindWidth });
    writeText(pdf, 'Description', { weight: 'bold', x: descX, y, width: descWidth });
    writeText(pdf, `Amount (${doc.currency})`, { weight: 'bold', x: amountX, y, width: amountWidth, align: 'right' });
    pdf.y = y + 14;
    pdf.fontSize(10).fillColor(INK);
  };
  const row = (kind: string, text: string, amount: string, weight: WriteOptions['weight'] = 'regular') => {
    const description = plain(text);
    const height =
      Math.max(
        heightOf(pdf, description, { width: descWidth, weight }),
        heightOf(pdf, kind, { width: kindWidth, weight }),
      ) + 6;
    if (pdf.y + height > pdf.page.maxY()) {
      pdf.addPage();
      header();
    }
    const y = pdf.y;
    writeText(pdf, kind, { weight, x: left, y, width: kindWidth });
    if (description) writeText(pdf, description, { weight, x: descX, y, width: descWidth });
    writeText(pdf, amount, { weight, x: amountX, y, width: amountWidth, align: 'right' });
    pdf.y = y + height;
  };

  header();
  for (const line of doc.lines) {
    row(
      plain(bidLineLabels[line.kind as keyof typeof bidLineLabels] ?? line.kind),
      line.description,
      money(line.amountCents),
    );
  }
  if (pdf.y + 24 > pdf.page.maxY()) {
    pdf.addPage();
    header();
  }
  pdf
    .moveTo(left, pdf.y)
    .lineTo(left + width, pdf.y)
    .lineWidth(0.5)
    .strokeColor(RULE)
    .stroke();
  pdf.y += 4;
  row('Total', '', money(doc.totalCents), 'bold');
  pdf.x = left;
}

/** "PO number · page n of m" under the bottom margin of every page. */
function pageFooters(pdf: Pdf, poNumber: string, left: number, width: number): void {
  const { start, count } = pdf.bufferedPageRange();
  for (let i = start; i < start + count; i++) {
    pdf.switchToPage(i);
    const bottom = pdf.page.margins.bottom;
    // Writing below the margin would make pdfkit start a new page; lift the margin meanwhile.
    pdf.page.margins.bottom = 0;
    pdf.fontSize(8).fillColor(MUTED);
    writeText(pdf, `${poNumber} · page ${i - start + 1} of ${count}`, {
      x: left,
      y: pdf.page.height - bottom + 16,
      width,
      align: 'right',
      lineBreak: false,
    });
    pdf.page.margins.bottom = bottom;
  }
}
