import { MM_PER_INCH, inchesToMm, mmToInches } from './units';

/** The two units a person reads lengths in. Lengths are stored and computed in inches. */
export type LengthUnit = 'in' | 'mm';

/** How one reader sees lengths: the unit and the locale of the digits ("1,234.5" or "1.234,5"). */
export interface LengthStyle {
  units: LengthUnit;
  locale?: string;
}

// Building an Intl formatter costs far more than using one: keep one per locale and digits.
const numberFormats = new Map<string, Intl.NumberFormat>();
function formatNumber(value: number, locale: string, digits: number): string {
  const key = `${locale}|${digits}`;
  let format = numberFormats.get(key);
  if (!format) {
    format = new Intl.NumberFormat(locale, { minimumFractionDigits: digits, maximumFractionDigits: digits });
    numberFormats.set(key, format);
  }
  return format.format(value);
}

/** Millimetres carry one digit fewer than inches: 0.01 in is about 0.25 mm. */
function digitsFor(units: LengthUnit, inchDigits: number): number {
  return units === 'mm' ? Math.max(0, inchDigits - 1) : inchDigits;
}

/** A length in inches as a number in the reader's unit. */
export function lengthIn(units: LengthUnit, inches: number): number {
  return units === 'mm' ? inchesToMm(inches) : inches;
}

/** A number typed in a unit, in inches (how Kerfmark stores it). */
export function inchesOf(value: number, units: LengthUnit): number {
  return units === 'mm' ? mmToInches(value) : value;
}

/** The number alone, without the unit: "26.79" or "680.4". */
export function lengthNumber(inches: number, style: LengthStyle, inchDigits = 2): string {
  return formatNumber(lengthIn(style.units, inches), style.locale ?? 'en-US', digitsFor(style.units, inchDigits));
}

/** A length for people: "26.79 in" or "680.4 mm"; "—" when there is none. */
export function formatLength(inches: number | null | undefined, style: LengthStyle, inchDigits = 2): string {
  if (inches === null || inches === undefined || !Number.isFinite(inches)) return '—';
  return `${lengthNumber(inches, style, inchDigits)} ${style.units}`;
}

/** A width × height for people, the unit once: "22.00 × 30.00 in" or "558.8 × 762.0 mm". */
export function formatSize(
  width: number | null | undefined,
  height: number | null | undefined,
  style: LengthStyle,
  inchDigits = 2,
): string {
  if (!width || !height) return '—';
  return `${lengthNumber(width, style, inchDigits)} × ${lengthNumber(height, style, inchDigits)} ${style.units}`;
}

/** An area in square inches in the reader's unit of area: square inches, or square centimetres (25.4² / 100 = 6.4516). */
export function areaIn(units: LengthUnit, squareInches: number): number {
  return units === 'mm' ? (squareInches * (MM_PER_INCH * MM_PER_INCH)) / 100 : squareInches;
}

/** The name of that unit of area, for a column heading. */
export const areaUnitName = (units: LengthUnit) => (units === 'mm' ? 'cm²' : 'sq in');

/** A limit for a message either reader understands: "120 in (3,048 mm)", "0.001 in (0.03 mm)". */
export function inchesAndMm(inches: number): string {
  const trimmed = (v: number, digits: number) =>
    new Intl.NumberFormat('en-US', { maximumFractionDigits: digits }).format(v);
  return `${trimmed(inches, 3)} in (${trimmed(inchesToMm(inches), inches < 0.1 ? 2 : 1)} mm)`;
}
