import type { DielineMetrics } from './requestDtos';

/**
 * The rule a die is priced on: every rule type but 'other' (drawing lines on layers that name no
 * rule type are reported, never priced). Takes either `metrics.length` (inches) or `metrics.lengthMm`.
 */
export function pricedLength(length: DielineMetrics['length']): number {
  return length.total - length.other;
}
