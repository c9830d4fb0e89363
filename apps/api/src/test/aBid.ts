import type { ParsedBid } from '../services/bids/bidTerms';

/** A plain bid: one die line, a week's lead time, a price that holds for 60 days. */
export function aBid(overrides: Partial<ParsedBid> = {}): ParsedBid {
  return {
    lines: [{ kind: 'die', description: '', amountCents: 48_000 }],
    currency: 'USD',
    leadDays: 5,
    validUntil: new Date(Date.now() + 60 * 86_400_000).toISOString().slice(0, 10),
    ...overrides,
  };
}
