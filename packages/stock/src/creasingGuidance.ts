import { MAX_CALIPER_IN, MM_PER_INCH } from './caliper';
import { checkNumber } from './checkNumber';
import { GUIDANCE_NOTE } from './guidanceNote';
import { creasingRuleFor, CUTTING_RULE_HEIGHT_IN, RULE_THICKNESS_IN, type RulePoints } from './steelRule';
import { checkStockKind, type StockKind } from './stockKind';

export interface CreasingInput {
  caliperIn: number;
  stockKind: StockKind;
  /** Whether the grain (for corrugated, the flutes) runs parallel to the crease; not given when unknown. */
  grainParallelToCrease?: boolean | null;
  /** Cutting rule height in the die; 0.937 in unless given. */
  ruleHeightIn?: number;
  /** Distance from this creasing rule to the nearest other rule, when the layout is known. */
  nearestRuleGapIn?: number | null;
}

/** A length in inches (to 0.001 in) and millimetres (to 0.01 mm). */
export interface Length {
  in: number;
  mm: number;
}

export type CreasingWarningCode = 'grain-not-given' | 'rules-too-close';

export interface CreasingGuidance {
  stockKind: StockKind;
  caliper: Length;
  rule: { points: RulePoints; thickness: Length };
  cuttingRuleHeight: Length;
  /** Cutting rule height less the caliper; a little lower still with a metal-based counter. */
  creasingRuleHeight: Length;
  /** The factor on the caliper in channel width = factor × caliper + rule thickness. */
  channelFactor: number;
  channelWidth: Length;
  channelDepth: Length;
  warnings: Array<{ code: CreasingWarningCode; text: string }>;
  note: string;
}

/**
 * Channel factors (common practice): paperboard 1.3 to 1.5, the lower when the grain runs
 * parallel to the crease; corrugated about 1.8 to 2.0, read the same way for the flutes.
 * Paper takes paperboard's. Unknown grain takes the higher, wider factor.
 */
const CHANNEL_FACTOR: Readonly<Record<StockKind, { parallel: number; across: number }>> = {
  paper: { parallel: 1.3, across: 1.5 },
  paperboard: { parallel: 1.3, across: 1.5 },
  corrugated: { parallel: 1.8, across: 2.0 },
};

/** Rules closer than about 3/32 in (2.4 mm) are hard to make (common practice). */
export const MIN_RULE_GAP_IN = 3 / 32;

/** Longest gap we accept between rules; a sanity limit of our own. */
const MAX_RULE_GAP_IN = 100;
const MAX_RULE_HEIGHT_IN = 3;

/**
 * Suggested creasing rule and counter channel for a stock: the rule thickness from the
 * trade's bands, creasing rule height = cutting rule height − caliper, channel width =
 * factor × caliper + rule thickness, channel depth ≈ caliper. Guidance, carried in `note`.
 */
export function creasingGuidance(input: CreasingInput): CreasingGuidance {
  const caliperIn = checkNumber('caliperIn', input.caliperIn, { above: 0, atMost: MAX_CALIPER_IN, unit: 'in' });
  const stockKind = checkStockKind(input.stockKind);
  const parallel = input.grainParallelToCrease ?? null;
  if (parallel !== null && typeof parallel !== 'boolean') {
    throw new RangeError(`grainParallelToCrease must be true, false or not given (got ${String(parallel)})`);
  }
  const ruleHeightIn = checkNumber('ruleHeightIn', input.ruleHeightIn ?? CUTTING_RULE_HEIGHT_IN, {
    above: caliperIn,
    atMost: MAX_RULE_HEIGHT_IN,
    unit: 'in',
  });
  const gapIn =
    input.nearestRuleGapIn == null
      ? null
      : checkNumber('nearestRuleGapIn', input.nearestRuleGapIn, { above: 0, atMost: MAX_RULE_GAP_IN, unit: 'in' });

  const points = creasingRuleFor(caliperIn, stockKind);
  const thicknessIn = RULE_THICKNESS_IN[points];
  const factors = CHANNEL_FACTOR[stockKind];
  const channelFactor = parallel === true ? factors.parallel : factors.across;

  const warnings: CreasingGuidance['warnings'] = [];
  if (parallel === null) {
    warnings.push({
      code: 'grain-not-given',
      text: `The grain direction is not given, so the channel uses the wider factor (${factors.across}); with the grain parallel to the crease it would be ${factors.parallel}.`,
    });
  }
  if (gapIn !== null && gapIn < MIN_RULE_GAP_IN) {
    warnings.push({
      code: 'rules-too-close',
      text: `The nearest rule is ${lengthOf(gapIn).mm} mm away: rules closer than about 3/32 in (2.4 mm) are hard to make.`,
    });
  }

  return {
    stockKind,
    caliper: lengthOf(caliperIn),
    rule: { points, thickness: lengthOf(thicknessIn) },
    cuttingRuleHeight: lengthOf(ruleHeightIn),
    creasingRuleHeight: lengthOf(ruleHeightIn - caliperIn),
    channelFactor,
    channelWidth: lengthOf(channelFactor * caliperIn + thicknessIn),
    channelDepth: lengthOf(caliperIn),
    warnings,
    note: GUIDANCE_NOTE,
  };
}

/** Rounds once, at the end, so the millimetres are not rounded from rounded inches. */
function lengthOf(inches: number): Length {
  return { in: Number(inches.toFixed(3)), mm: Number((inches * MM_PER_INCH).toFixed(2)) };
}
