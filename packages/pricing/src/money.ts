/**
 * Money is an integer count of the currency's minor units ("cents") with an ISO 4217 code; never
 * floating-point. This module is the one place that knows how many minor units a currency has:
 * everything that shows, reads or exports an amount goes through it.
 */
export interface Money {
  cents: number;
  currency: string;
}

const digitsCache = new Map<string, number>();

/**
 * The currency's minor-unit digits, from Intl (which carries the ISO 4217 minor units): two for
 * USD, none for JPY, three for BHD. Throws a RangeError for a code that is not a currency.
 */
export function minorDigits(currency: string): number {
  const cached = digitsCache.get(currency);
  if (cached !== undefined) return cached;
  let digits: number;
  try {
    digits =
      new Intl.NumberFormat('en-US', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    throw new RangeError(`Not an ISO 4217 currency code: "${currency}"`);
  }
  digitsCache.set(currency, digits);
  return digits;
}

let knownCodes: Set<string> | null = null;

/** Whether a code is a current ISO 4217 currency, as the runtime's Intl data lists them. */
export function isCurrencyCode(code: string): boolean {
  knownCodes ??= new Set(Intl.supportedValuesOf('currency'));
  return knownCodes.has(code);
}

function assertWholeCents(cents: number): void {
  if (!Number.isSafeInteger(cents)) throw new RangeError(`Not a whole number of minor units: ${cents}`);
}

/**
 * Minor units as a plain decimal string of major units, built digit by digit so nothing drifts:
 * 84500 USD → "845.00", 1500 JPY → "1500", -5 BHD → "-0.005". For CSV cells and form inputs.
 */
export function toMajorString(cents: number, currency: string): string {
  assertWholeCents(cents);
  const digits = minorDigits(currency);
  const sign = cents < 0 ? '-' : '';
  const padded = String(Math.abs(cents)).padStart(digits + 1, '0');
  return digits === 0 ? `${sign}${padded}` : `${sign}${padded.slice(0, -digits)}.${padded.slice(-digits)}`;
}

/** Minor units as a number of major units (84500 USD → 845), read once from the decimal string. */
export function majorUnits(cents: number, currency: string): number {
  return Number(toMajorString(cents, currency));
}

/** Adds amounts in minor units, refusing anything that is not a safe whole number. */
export function sumCents(amounts: readonly number[]): number {
  let total = 0;
  for (const amount of amounts) {
    assertWholeCents(amount);
    total += amount;
  }
  if (!Number.isSafeInteger(total)) throw new RangeError('Total is too large');
  return total;
}

/** Formats an amount for people, e.g. 123456 USD → "$1,234.56" in en-US. */
export function formatMoney({ cents, currency }: Money, locale = 'en-US'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(cents / 10 ** minorDigits(currency));
}

/**
 * Reads an amount as people type it ("1,234.5", "845") into whole minor units of the currency,
 * by digits alone: no binary fraction is ever formed. Null for anything that is not an amount,
 * or finer than the currency's minor unit.
 */
export function parseMoneyInput(text: string, currency: string): number | null {
  const digits = minorDigits(currency);
  const cleaned = text
    .trim()
    .replace(/[,\s]/g, '')
    .replace(/^[$€£¥]/, '');
  const match = /^(\d+)(?:\.(\d*))?$/.exec(cleaned);
  if (!match) return null;
  const fraction = match[2] ?? '';
  if (fraction.length > digits) return null;
  const cents = BigInt(match[1]!) * 10n ** BigInt(digits) + BigInt(fraction.padEnd(digits, '0') || '0');
  return cents <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(cents) : null;
}
