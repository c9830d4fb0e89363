import { checkNumber } from './checkNumber';

/** International inch (1959; ISO 80000-3): exactly 25.4 mm. */
export const MM_PER_INCH = 25.4;

/**
 * Caliper units. `pt` is the North American board caliper point, a thousandth of an inch
 * (24 pt board is 0.024 in thick). It is neither the typographic point (1/72 in) nor the
 * printer's point that steel rule thickness is named in (a "2 pt" rule is about 0.028 in).
 */
export type CaliperUnit = 'pt' | 'in' | 'mm' | 'um';

/** Past this no sheet goes under a steel-rule die; a sanity limit of our own, not a trade figure. */
export const MAX_CALIPER_IN = 0.5;

const PER_INCH: Readonly<Record<CaliperUnit, number>> = {
  pt: 1000,
  in: 1,
  mm: MM_PER_INCH,
  um: MM_PER_INCH * 1000,
};

/** Converts a caliper between points, inches, millimetres and microns (µm). */
export function convertCaliper(value: number, from: CaliperUnit, to: CaliperUnit): number {
  if (!Object.hasOwn(PER_INCH, from)) throw new RangeError(`from must be one of pt, in, mm, um (got ${String(from)})`);
  if (!Object.hasOwn(PER_INCH, to)) throw new RangeError(`to must be one of pt, in, mm, um (got ${String(to)})`);
  const fromPerIn = PER_INCH[from];
  const toPerIn = PER_INCH[to];
  checkNumber('caliper', value, { above: 0, atMost: MAX_CALIPER_IN * fromPerIn, unit: from });
  if (from === to) return value;
  return (value / fromPerIn) * toPerIn;
}
