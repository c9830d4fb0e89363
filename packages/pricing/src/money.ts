/** Money is integer cents with an ISO 4217 currency code; never floating-point. */
export interface Money {
  cents: number;
  currency: string;
}

/** Adds amounts in cents, refusing anything that is not a safe whole number of cents. */
export function sumCents(amounts: readonly number[]): number {
  let total = 0;
  for (const amount of amounts) {
    if (!Number.isSafeInteger(amount)) throw new RangeError(`Not a whole number of cents: ${amount}`);
    total += amount;
  }
  if (!Number.isSafeInteger(total)) throw new RangeError('Total is too large');
  return total;
}

/** Formats cents for people, e.g. 123456 USD → "$1,234.56" in en-US. */
export function formatMoney({ cents, currency }: Money, locale = 'en-US'): string {
  const format = new Intl.NumberFormat(locale, { style: 'currency', currency });
  // "Cents" are the currency's minor units: two for USD, none for JPY (ISO 4217).
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(cents / 10 ** digits);
}

/**
 * Reads an amount as people type it ("1,234.5", "845") into whole minor units, by digits
 * alone: no binary fraction is ever formed. Returns null for anything that is not an amount.
 */
export function parseMoneyInput(text: string, minorDigits = 2): number | null {
  const cleaned = text
    .trim()
    .replace(/[,\s]/g, '')
    .replace(/^[$€£¥]/, '');
  const match = /^(\d+)(?:\.(\d*))?$/.exec(cleaned);
  if (!match) return null;
  const fraction = match[2] ?? '';
  if (fraction.length > minorDigits) return null;
  const cents = BigInt(match[1]!) * 10n ** BigInt(minorDigits) + BigInt(fraction.padEnd(minorDigits, '0') || '0');
  return cents <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(cents) : null;
}
