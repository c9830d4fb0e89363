import type { InvoiceLine } from '@kerfmark/contracts';
import { sumCents, taxAtRate } from '@kerfmark/pricing';

export interface InvoiceFigures {
  subtotalCents: number;
  taxRateBp: number | null;
  taxCents: number;
  totalCents: number;
}

/** An invoice's (or a credit note's) subtotal, tax at the shop's rate, and total, in minor units. */
export function invoiceFigures(
  lines: readonly Pick<InvoiceLine, 'amountCents'>[],
  taxRateBp: number | null,
): InvoiceFigures {
  const subtotalCents = sumCents(lines.map((l) => l.amountCents));
  const taxCents = taxRateBp === null ? 0 : taxAtRate(subtotalCents, taxRateBp);
  return { subtotalCents, taxRateBp, taxCents, totalCents: subtotalCents + taxCents };
}
