import type { Complexity } from '@kerfmark/dieline';
/** One received die as the price statistics see it. */
export interface PriceObservation {
  /** The die's price in whole cents (minor units of `currency`). */
  dieCents: number;
  /** ISO 4217 code, e.g. 'USD'. */
  currency: string;
  /** Total rule length of the dieline in inches. */
  ruleLengthIn: number;
  /** Bends + curves + joints + punches. */
  features: number;
  complexity: Complexity;
  /** 'YYYY-MM-DD' */
  pricedOn: string;
}

/** Thrown when records of different currencies are handed to one statistic (no exchange rates are assumed). */
export class MixedCurrencyError extends Error {
  constructor(readonly currencies: string[]) {
    super(`Records mix currencies (${currencies.join(', ')}): give one currency at a time`);
    this.name = 'MixedCurrencyError';
  }
}

// A calendar date that exists: the round trip rejects 2026-02-30, which Date.parse would roll over.
function isDate(s: string): boolean {
  const ms = Date.parse(`${s}T00:00:00Z`);
  return /^\d{4}-\d{2}-\d{2}$/.test(s) && !Number.isNaN(ms) && new Date(ms).toISOString().slice(0, 10) === s;
}

/**
 * Checks every record and returns their one currency (null when there are none). Throws a
 * RangeError naming the first bad record, or a MixedCurrencyError.
 */
export function checkObservations(records: readonly PriceObservation[]): string | null {
  if (!Array.isArray(records)) throw new TypeError('Expected an array of price records');
  const currencies = new Set<string>();
  const goodDates = new Set<string>(); // many dies share a date; check each date once
  records.forEach((r, i) => {
    const bad = (what: string, value: unknown) => new RangeError(`Record ${i}: ${what} (got ${JSON.stringify(value)})`);
    if (typeof r !== 'object' || r === null) throw bad('not a price record', r);
    if (!Number.isSafeInteger(r.dieCents) || r.dieCents <= 0)
      throw bad('dieCents must be a whole number of cents above 0', r.dieCents);
    if (typeof r.currency !== 'string' || !/^[A-Z]{3}$/.test(r.currency))
      throw bad('currency must be an ISO 4217 code such as USD', r.currency);
    if (typeof r.ruleLengthIn !== 'number' || !Number.isFinite(r.ruleLengthIn) || r.ruleLengthIn <= 0)
      throw bad('ruleLengthIn must be a length in inches above 0', r.ruleLengthIn);
    if (!Number.isSafeInteger(r.features) || r.features < 0)
      throw bad('features must be a whole count of 0 or more', r.features);
    if (r.complexity !== 'simple' && r.complexity !== 'complex')
      throw bad("complexity must be 'simple' or 'complex'", r.complexity);
    if (!goodDates.has(r.pricedOn)) {
      if (typeof r.pricedOn !== 'string' || !isDate(r.pricedOn))
        throw bad('pricedOn must be a date YYYY-MM-DD', r.pricedOn);
      goodDates.add(r.pricedOn);
    }
    currencies.add(r.currency);
  });
  if (currencies.size > 1) throw new MixedCurrencyError([...currencies].sort());
  return currencies.values().next().value ?? null;
}
