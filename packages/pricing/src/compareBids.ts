import { awardReason } from './awardReason';
import { workingDaysBetween } from './schedule';

export interface BidToCompare {
  bidId: number;
  totalCents: number;
  currency: string;
  leadDays: number;
  promisedShipDate: string;
  validUntil: string;
  /** Share of the shop's past awarded jobs shipped by their promised date (0–1), null with none. */
  onTimeRate: number | null;
}

export const bestColumns = ['total', 'perInch', 'lead', 'ship', 'onTime'] as const;
export type BestColumn = (typeof bestColumns)[number];

export interface ComparedBid<B extends BidToCompare> {
  bid: B;
  overLowestCents: number;
  /** Total per inch of priced rule, in cents (rounded to whole cents); null without a length. */
  centsPerInch: number | null;
  /** Working days the promised ship date falls after the need-by date (0 when on time). */
  daysLate: number;
  expired: boolean;
  /** Whether awarding this bid needs a written reason (see awardReason). */
  needsReason: boolean;
  best: BestColumn[];
}

/**
 * Lines bids up side by side: the difference from the lowest total, the price per inch of rule,
 * lateness against the need-by date, validity, and the best bid on each column. Bids in another
 * currency than the lowest are not compared on price (no exchange rates are assumed).
 */
export function compareBids<B extends BidToCompare>(
  bids: readonly B[],
  opts: { ruleLengthIn: number | null; needByDate: string | null; today: string },
): Array<ComparedBid<B>> {
  const currencies = new Set(bids.map((b) => b.currency));
  const sameCurrency = currencies.size <= 1;
  const lowest = bids.length ? Math.min(...bids.map((b) => b.totalCents)) : 0;
  const rows = bids.map((bid) => ({
    bid,
    overLowestCents: sameCurrency ? bid.totalCents - lowest : 0,
    centsPerInch: opts.ruleLengthIn && opts.ruleLengthIn > 0 ? Math.round(bid.totalCents / opts.ruleLengthIn) : null,
    daysLate: opts.needByDate ? Math.max(0, workingDaysBetween(opts.needByDate, bid.promisedShipDate)) : 0,
    expired: bid.validUntil < opts.today,
    needsReason: awardReason(bid, bids).needsReason,
    best: [] as BestColumn[],
  }));

  const markBest = (column: BestColumn, value: (r: (typeof rows)[number]) => number | null, prefer: 'low' | 'high') => {
    const values = rows.map(value).filter((v): v is number => v !== null);
    if (values.length < 2) return;
    const target = prefer === 'low' ? Math.min(...values) : Math.max(...values);
    for (const row of rows) if (value(row) === target) row.best.push(column);
  };
  if (sameCurrency) {
    markBest('total', (r) => r.bid.totalCents, 'low');
    markBest('perInch', (r) => r.centsPerInch, 'low');
  }
  markBest('lead', (r) => r.bid.leadDays, 'low');
  markBest('ship', (r) => Date.parse(`${r.bid.promisedShipDate}T00:00:00Z`), 'low');
  markBest('onTime', (r) => r.bid.onTimeRate, 'high');
  return rows;
}
