import { MM_PER_INCH } from './units';

/** Drawing units a user may name to override what a file says. */
export const UNIT_NAMES = ['in', 'mm', 'cm', 'm', 'ft', 'px'] as const;
export type UnitName = (typeof UNIT_NAMES)[number];

/** Inches per unit: ISO 80000-3 (1 in = 25.4 mm) and CSS Values and Units (96 px = 1 in). */
export const UNIT_INCHES: Readonly<Record<UnitName, number>> = {
  in: 1,
  mm: 1 / MM_PER_INCH,
  cm: 10 / MM_PER_INCH,
  m: 1000 / MM_PER_INCH,
  ft: 12,
  px: 1 / 96,
};

export function isUnitName(v: unknown): v is UnitName {
  return typeof v === 'string' && (UNIT_NAMES as readonly string[]).includes(v);
}
