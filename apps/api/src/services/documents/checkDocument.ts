import { formatInZone } from '@kerfmark/contracts';
import { isCurrencyCode, sumCents } from '@kerfmark/pricing';
import type { PurchaseOrderDoc } from './types';

/** Refuses a document whose sums, currency or time zone would print wrong. */
export function checkDocument(doc: PurchaseOrderDoc): void {
  if (doc.lines.length === 0) throw new RangeError('A purchase order needs at least one price line');
  const sum = sumCents(doc.lines.map((line) => line.amountCents));
  if (sum !== doc.totalCents)
    throw new RangeError(`The price lines add up to ${sum} but the total is ${doc.totalCents} (minor units)`);
  if (!isCurrencyCode(doc.currency)) throw new RangeError(`Not an ISO 4217 currency code: "${doc.currency}"`);
  try {
    formatInZone(doc.issuedAt, doc.timeZone);
  } catch {
    throw new RangeError(`Not a valid issue date or time zone: "${doc.timeZone}"`);
  }
}

/** Text as the PDF prints it: pdfkit shows a carriage return or a tab as a stray glyph. */
export function plain(text: string): string {
  return text.replace(/\r\n?/g, '\n').replace(/\t/g, ' ');
}
