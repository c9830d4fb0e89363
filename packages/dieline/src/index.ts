// Dieline parsing and geometry metrics: pure, no I/O.
export * from './units';
export * from './lengthText';
export { analyseDieline, analyseDielineAsync } from './analyse';
export { MAX_UPS, PIECE_GRAINS, type LayoutReport, type PieceGrain, type UpsLayout } from './layout/stepAndRepeat';
export type { AnalyseOptions, DielineAnalysis, DielineMetrics } from './analyse';
export { DielineError } from './errors';
export type { DielineErrorCode } from './errors';
export {
  COMPLEXITY_FEATURES_PER_INCH,
  COMPLEXITY_RULE,
  complexityOf,
  complexities,
  complexityLabels,
  featureCount,
  type Complexity,
  type FeatureCounts,
} from './metrics/complexity';
export { BEND_MIN_DEGREES } from './metrics/bends';
export { PUNCH_MAX_IN } from './metrics/contours';
export { DEFAULT_MARGIN_IN, fitsPress } from './metrics/board';
export type { Press, Size } from './metrics/board';
export type { LengthByType } from './metrics/lengths';
export type { DielinePreview, PreviewPath } from './preview';
export { RULE_TYPES, PRICED_RULE_TYPES, ruleTypeFromName } from './ruleType';
export type { LayerMap, RuleType, PricedRuleType } from './ruleType';
export type { DrawingUnits, LayerInfo } from './drawing';
export { DEFAULT_LIMITS, JOIN_TOLERANCE_IN } from './limits';
export type { Limits } from './limits';
export { FORMATS, decodeInput, detectFormat } from './input';
export type { DielineFormat } from './input';
export { UNIT_NAMES } from './unitNames';
export type { UnitName } from './unitNames';
export { matchDies, SIZE_TOLERANCE_IN, LENGTH_TOLERANCE, type DieShape, type DieMatch } from './matchDies';
