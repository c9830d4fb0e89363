/** Features per inch of priced rule above which a die is complex. */
export const COMPLEXITY_FEATURES_PER_INCH = 1;

/** The complexity rule in words, as the README and the app quote it. */
export const COMPLEXITY_RULE =
  'A die is complex when its bends, curves, joints and punches together number more than ' +
  `${COMPLEXITY_FEATURES_PER_INCH} per inch of priced rule (cutting, creasing, perforating and kiss-cut ` +
  'rule together); otherwise it is simple. A drawing with no priced rule is simple.';

export const complexities = ['simple', 'complex'] as const;
export type Complexity = (typeof complexities)[number];
export const complexityLabels: Record<Complexity, string> = { simple: 'Simple', complex: 'Complex' };

export interface FeatureCounts {
  bends: number;
  curves: number;
  joints: number;
  punches: number;
}

/** The die's feature count: bends, curves, joints and punches together. */
export function featureCount(f: FeatureCounts): number {
  return f.bends + f.curves + f.joints + f.punches;
}

/** See COMPLEXITY_RULE; the threshold is this product's own choice, not a trade standard. */
export function complexityOf(f: FeatureCounts, pricedLengthIn: number): Complexity {
  if (!(pricedLengthIn > 0)) return 'simple';
  return featureCount(f) / pricedLengthIn > COMPLEXITY_FEATURES_PER_INCH ? 'complex' : 'simple';
}
