import { MAX_CALIPER_IN } from './caliper';
import { checkNumber } from './checkNumber';
import { checkStockKind, type StockKind } from './stockKind';

/** Steel rule thicknesses the trade names in points, with the inches it rounds them to (common practice). */
export const RULE_THICKNESS_IN = { 2: 0.028, 3: 0.042, 4: 0.056, 6: 0.084 } as const;
export type RulePoints = keyof typeof RULE_THICKNESS_IN;

/** Cutting rule heights in use (common practice): 0.937 in (23.80 mm) and 0.918 in (23.32 mm). */
export const CUTTING_RULE_HEIGHTS_IN = [0.937, 0.918] as const;
export type CuttingRuleHeight = (typeof CUTTING_RULE_HEIGHTS_IN)[number];

/** The usual cutting rule height (common practice): 0.937 in, 23.80 mm. */
export const CUTTING_RULE_HEIGHT_IN: CuttingRuleHeight = 0.937;

/**
 * Caliper bands for the creasing rule (common practice; the trade picks from a few stock
 * thicknesses rather than computing one): paper and paperboard up to 0.024 in (24 pt, about
 * 0.6 mm) take a 2 pt rule, heavier board a 3 pt rule; corrugated up to 1/8 in (about 3.2 mm,
 * single-wall E and B flute) takes a 4 pt rule, thicker corrugated a 6 pt rule.
 */
const BANDS: Readonly<Record<StockKind, ReadonlyArray<{ upToIn: number; points: RulePoints }>>> = {
  paper: [
    { upToIn: 0.024, points: 2 },
    { upToIn: Infinity, points: 3 },
  ],
  paperboard: [
    { upToIn: 0.024, points: 2 },
    { upToIn: Infinity, points: 3 },
  ],
  corrugated: [
    { upToIn: 0.125, points: 4 },
    { upToIn: Infinity, points: 6 },
  ],
};

/** The creasing rule, in points, the trade would usually pick for this caliper and stock. */
export function creasingRuleFor(caliperIn: number, stockKind: StockKind): RulePoints {
  checkNumber('caliperIn', caliperIn, { above: 0, atMost: MAX_CALIPER_IN, unit: 'in' });
  const band = BANDS[checkStockKind(stockKind)].find((b) => caliperIn <= b.upToIn);
  if (band === undefined) throw new RangeError(`caliperIn has no creasing rule band (got ${caliperIn})`); // the last band is open-ended
  return band.points;
}
