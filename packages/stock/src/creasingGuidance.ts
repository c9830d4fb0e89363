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
  /** Cutting rule height in the die (the press's setting); 0.937 in unless given. */
  ruleHeightIn?: number;
  /**
   * Corrugated only: the board's crushed (compacted) thickness under the creasing rule, which
   * sizes the channel and the creasing rule's height; the full caliper (the flute) would not.
   */
  crushedCaliperIn?: number | null;
  /** Distance from this creasing rule to the nearest other rule, when the layout is known. */
  nearestRuleGapIn?: number | null;
}

/** A length in inches (to 0.001 in) and millimetres (to 0.01 mm). */
export interface Length {
  in: number;
  mm: number;
}

export type CreasingWarningCode = 'grain-not-given' | 'rules-too-close' | 'crushed-not-given';

export interface CreasingGuidance {
  stockKind: StockKind;
  caliper: Length;
  rule: { points: RulePoints; thickness: Length };
  cuttingRuleHeight: Length;
  /**
   * The thickness the creasing rule and channel are sized on: the caliper, or for corrugated the
   * crushed thickness; null for corrugated whose crushed thickness is not given.
   */
  creasedThickness: Length | null;
  /** Cutting rule height less the creased thickness; a little lower still with a metal-based counter. */
  creasingRuleHeight: Length | null;
  /** The factor on the thickness in channel width = factor × thickness + rule thickness. */
  channelFactor: number;
  channelWidth: Length | null;
  channelDepth: Length | null;
  warnings: Array<{ code: CreasingWarningCode; text: string }>;
  note: string;
}

/**
 * Channel factors: paperboard 1.3 to 1.5, the lower when the grain runs parallel to the crease
 * (common practice); corrugated about 1.8 to 2.0 on the crushed thickness, read the same way for
 * the flutes (common practice); paper about 2 × caliper + rule width either way (paper mills'
 * published creasing guides, from memory). Unknown grain takes the higher, wider factor.
 */
const CHANNEL_FACTOR: Readonly<Record<StockKind, { parallel: number; across: number }>> = {
  paper: { parallel: 2, across: 2 },
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
 * trade's bands, creasing rule height = cutting rule height − thickness, channel width =
 * factor × thickness + rule thickness, channel depth ≈ thickness, where the thickness is the
 * caliper, or corrugated's crushed thickness. Guidance, carried in `note`.
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

  const crushedIn =
    input.crushedCaliperIn == null
      ? null
      : checkNumber('crushedCaliperIn', input.crushedCaliperIn, { above: 0, atMost: caliperIn, unit: 'in' });
  // Paper and paperboard crease on their caliper; corrugated on its crushed thickness only.
  const creasedIn = stockKind === 'corrugated' ? crushedIn : caliperIn;

  const points = creasingRuleFor(caliperIn, stockKind);
  const thicknessIn = RULE_THICKNESS_IN[points];
  const factors = CHANNEL_FACTOR[stockKind];
  const channelFactor = parallel === true ? factors.parallel : factors.across;

  const warnings: CreasingGuidance['warnings'] = [];
  if (parallel === null && factors.parallel !== factors.across) {
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

  if (creasedIn === null) {
    warnings.push({
      code: 'crushed-not-given',
      text: 'Give the crushed board thickness (the board pressed flat under the creasing rule): corrugated creases on it, not on the full caliper, so the channel and the creasing rule height wait for it.',
    });
  }

  return {
    stockKind,
    caliper: lengthOf(caliperIn),
    rule: { points, thickness: lengthOf(thicknessIn) },
    cuttingRuleHeight: lengthOf(ruleHeightIn),
    creasedThickness: creasedIn === null ? null : lengthOf(creasedIn),
    creasingRuleHeight: creasedIn === null ? null : lengthOf(ruleHeightIn - creasedIn),
    channelFactor,
    channelWidth: creasedIn === null ? null : lengthOf(channelFactor * creasedIn + thicknessIn),
    channelDepth: creasedIn === null ? null : lengthOf(creasedIn),
    warnings,
    note: GUIDANCE_NOTE,
  };
}

/** Rounds once, at the end, so the millimetres are not rounded from rounded inches. */
function lengthOf(inches: number): Length {
  return { in: Number(inches.toFixed(3)), mm: Number((inches * MM_PER_INCH).toFixed(2)) };
}
