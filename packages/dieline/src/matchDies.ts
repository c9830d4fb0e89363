import type { DielineMetrics } from './analyse';

/** What a die is compared on: its finished piece, its ups, and its rules. */
export interface DieShape {
  pieceWidthIn: number | null;
  pieceHeightIn: number | null;
  ups: number;
  metrics: Pick<DielineMetrics, 'length' | 'bends' | 'curves' | 'punches' | 'bbox'> | null;
}

export interface DieMatch {
  /** 0 (nothing alike) to 1 (the same die). */
  score: number;
  sizeMatches: boolean;
  reasons: string[];
}

/** Finished sizes within 1/16 in either way match (common practice: the trade works to 1/16 in). */
export const SIZE_TOLERANCE_IN = 1 / 16;
/** Rule lengths per type within this share of each other count as the same layout. */
export const LENGTH_TOLERANCE = 0.05;

const closeness = (a: number, b: number) =>
  a === b ? 1 : 1 - Math.min(1, Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b)));

/**
 * How alike two dies are, in the way a buyer would check before ordering a new one: the finished
 * size (either orientation), the rule length of each rule type, and the shape, compared by the
 * rules' overall box and their bends, curves and punches. The score weighs size 0.4, lengths 0.4
 * and shape 0.2; a die whose size does not match scores 0.
 */
export function matchDies(wanted: DieShape, candidate: DieShape): DieMatch {
  const reasons: string[] = [];
  const sized = wanted.pieceWidthIn && wanted.pieceHeightIn && candidate.pieceWidthIn && candidate.pieceHeightIn;
  const within = (a: number, b: number) => Math.abs(a - b) <= SIZE_TOLERANCE_IN;
  const sizeMatches = sized
    ? (within(wanted.pieceWidthIn!, candidate.pieceWidthIn!) &&
        within(wanted.pieceHeightIn!, candidate.pieceHeightIn!)) ||
      (within(wanted.pieceWidthIn!, candidate.pieceHeightIn!) && within(wanted.pieceHeightIn!, candidate.pieceWidthIn!))
    : false;
  if (sized && !sizeMatches)
    return { score: 0, sizeMatches: false, reasons: ['The finished size differs by more than 1/16 in.'] };
  if (sizeMatches) reasons.push('Same finished size (within 1/16 in).');

  let lengthScore = 0;
  let shapeScore = 0;
  if (wanted.metrics && candidate.metrics) {
    const types = ['cut', 'crease', 'perf', 'kiss'] as const;
    const used = types.filter((t) => wanted.metrics!.length[t] > 0 || candidate.metrics!.length[t] > 0);
    lengthScore = used.length
      ? used.reduce((sum, t) => sum + closeness(wanted.metrics!.length[t], candidate.metrics!.length[t]), 0) /
        used.length
      : 0;
    const sameLengths = used.every(
      (t) => closeness(wanted.metrics!.length[t], candidate.metrics!.length[t]) >= 1 - LENGTH_TOLERANCE,
    );
    if (sameLengths) reasons.push('Rule lengths of every type within 5 %.');
    const a = wanted.metrics.bbox;
    const b = candidate.metrics.bbox;
    const aspect = closeness(
      Math.max(a.width, a.height) / Math.max(1e-9, Math.min(a.width, a.height)),
      Math.max(b.width, b.height) / Math.max(1e-9, Math.min(b.width, b.height)),
    );
    shapeScore =
      (aspect +
        closeness(wanted.metrics.bends, candidate.metrics.bends) +
        closeness(wanted.metrics.curves, candidate.metrics.curves) +
        closeness(wanted.metrics.punches, candidate.metrics.punches)) /
      4;
    if (shapeScore >= 0.9) reasons.push('The same kind of shape: bends, curves and punches alike.');
  }
  if (wanted.ups !== candidate.ups) reasons.push(`${candidate.ups} up where ${wanted.ups} up is wanted.`);
  const score = (sizeMatches ? 0.4 : 0) + 0.4 * lengthScore + 0.2 * shapeScore;
  return { score: Math.round(score * 1000) / 1000, sizeMatches, reasons };
}
