export interface PricedBid {
  totalCents: number;
  currency: string;
}

/**
 * Whether awarding `chosen` needs a written reason: it does when another submitted bid in the
 * same currency has a lower total (common purchasing practice: passing over the lowest price is
 * explained on the record). Totals in other currencies are not ranked, as no exchange rate is
 * assumed. Returns the lowest same-currency total, for the message.
 */
export function awardReason(
  chosen: PricedBid,
  submitted: readonly PricedBid[],
): { needsReason: boolean; lowestCents: number } {
  const lowestCents = Math.min(
    chosen.totalCents,
    ...submitted.filter((b) => b.currency === chosen.currency).map((b) => b.totalCents),
  );
  return { needsReason: chosen.totalCents > lowestCents, lowestCents };
}
