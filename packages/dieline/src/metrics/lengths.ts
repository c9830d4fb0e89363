import type { RulePath } from '../drawing';
import { length, type Segment } from '../geometry/segment';
import { RULE_TYPES, type RuleType } from '../ruleType';
import { inchesToMm } from '../units';

export type LengthByType = Record<RuleType | 'total', number>;

/** Rule length per rule type and in total (lines exactly, arcs as rθ, other curves measured). */
export function lengthsByType(paths: RulePath[]): LengthByType {
  const out = Object.fromEntries([...RULE_TYPES, 'total'].map((k) => [k, 0])) as LengthByType;
  for (const p of paths) {
    for (const s of p.segments) {
      const l = length(s);
      out[p.ruleType] += l;
      out.total += l;
    }
  }
  return out;
}

export function toMm(l: LengthByType): LengthByType {
  return Object.fromEntries(Object.entries(l).map(([k, v]) => [k, inchesToMm(v)])) as LengthByType;
}

export interface CurveCounts {
  curves: number;
  /** Smallest radius among arcs and the curvature of other curves; null without curves. */
  minRadius: number | null;
}

/**
 * Curves: each arc, circle, ellipse, spline or Bézier segment counts once. minRadius: the
 * smallest arc radius; for ellipses, splines and Béziers, the smallest radius of curvature
 * along them.
 */
export function countCurves(segments: Segment[]): CurveCounts {
  let curves = 0;
  let min = Infinity;
  for (const s of segments) {
    if (s.kind === 'line') continue;
    curves++;
    min = Math.min(min, s.kind === 'arc' ? s.r : s.minRadius);
  }
  return { curves, minRadius: Number.isFinite(min) ? min : null };
}
