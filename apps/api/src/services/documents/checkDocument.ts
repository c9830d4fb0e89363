import { formatInZone } from '@kerfmark/contracts';
import { isCurrencyCode, sumCents } from '@kerfmark/pricing';
import type { PurchaseOrderDoc } from './types';
import { unprintableCharacter } from './unprintableCharacter';

/** Refuses a document whose sums, currency, time zone or characters would print wrong. */
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
  const texts: Array<[string, string | null]> = [
    ['PO number', doc.poNumber],
    ["buyer's organisation", doc.buyer.organisation],
    ["buyer's contact", doc.buyer.contact],
    ["buyer's e-mail", doc.buyer.email],
    ['delivery address', doc.buyer.deliveryAddress],
    ['delivery postcode', doc.buyer.deliveryPostcode],
    ["supplier's organisation", doc.supplier.organisation],
    ["supplier's postcode", doc.supplier.postcode],
    ['request title', doc.request.title],
    ['job reference', doc.request.jobReference],
    ['dieline file name', doc.dieline?.fileName ?? null],
    ['award reason', doc.awardReason],
    ['notes', doc.notes],
    ...doc.lines.map((line, i): [string, string] => [`price line ${i + 1}`, `${line.kind} ${line.description}`]),
  ];
  for (const [where, text] of texts) {
    const bad = text === null ? undefined : unprintableCharacter(plain(text));
    // Refuse rather than print garbage: the standard PDF fonts cover Western European letters only.
    if (bad)
      throw new RangeError(
        `The purchase order cannot print ${JSON.stringify(bad)} (in the ${where}): use Western European letters`,
      );
  }
}

/** Text as the standard fonts print it: pdfkit shows a carriage return or a tab as a stray glyph. */
export function plain(text: string): string {
  return text.replace(/\r\n?/g, '\n').replace(/\t/g, ' ');
}
