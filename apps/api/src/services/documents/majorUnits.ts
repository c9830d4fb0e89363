/**
 * Integer minor units ("cents") as a decimal number of major units, e.g. 84500 USD → 845,
 * 150000 JPY → 150000. The digits come from Intl (ISO 4217 minor units); the value is built as
 * a decimal string and read once by Number, so no arithmetic on money can drift.
 */
export function majorUnits(cents: number, currency: string): number {
  if (!Number.isSafeInteger(cents)) throw new RangeError(`Not a whole number of minor units: ${cents}`);
  let digits: number;
  try {
    digits =
      new Intl.NumberFormat('en-US', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    throw new RangeError(`Not an ISO 4217 currency code: "${currency}"`);
  }
  if (digits === 0) return cents;
  const padded = String(Math.abs(cents)).padStart(digits + 1, '0');
  const sign = cents < 0 ? '-' : '';
  return Number(`${sign}${padded.slice(0, -digits)}.${padded.slice(-digits)}`);
}
