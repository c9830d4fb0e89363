import { PRICED_RULE_TYPES, type PricedRuleType } from '@kerfmark/dieline';
import { formatMoney } from './money';

/**
 * A die shop's rate card. Every amount is in integer minor units of `currency` (cents for
 * USD); rates are per inch of rule, per feature or per square inch of board.
 */
export interface RateCard {
  currency: string;
  rulePerInch: Record<PricedRuleType, number>;
  perBend: number;
  perJoint: number;
  perPunch: number;
  /** Die board per square inch, by board thickness (e.g. 0.625 in and 0.75 in plywood). */
  boardPerSqIn: Array<{ thicknessIn: number; perSqIn: number }>;
  counterPerSqIn: number;
  ejectionRubberPerSqIn: number;
  setUp: number;
  minimumDie: number;
  /** Lead times under `underDays` working days multiply the die by `factor` (the tightest that applies). */
  rush: Array<{ underDays: number; factor: number }>;
}

/** What the estimate reads of a dieline: the whole die's metrics. */
export interface EstimateDieline {
  length: Record<PricedRuleType, number>;
  bends: number;
  joints: number;
  punches: number;
  board: { width: number; height: number };
}

export interface EstimateInput {
  dieline: EstimateDieline;
  counter: boolean;
  ejectionRubber: boolean;
  leadDays: number;
  /** The board to price; the card's first board row when not given. */
  boardThicknessIn?: number;
}

export type EstimateLineKind = 'die' | 'counter' | 'ejection_rubber' | 'other';

export interface EstimateLine {
  kind: EstimateLineKind;
  /** The line's working, e.g. "Cutting rule: 79.3 in × $4.10". */
  description: string;
  amount: number;
}

export interface Estimate {
  currency: string;
  lines: EstimateLine[];
  total: number;
  /** The rush factor applied to the die, 1 without rush. */
  rushFactor: number;
}

const RULE_NAMES: Record<PricedRuleType, string> = {
  cut: 'Cutting rule',
  crease: 'Creasing rule',
  perf: 'Perforating rule',
  kiss: 'Kiss-cut rule',
};

/** The rush factor for a lead time: the tightest band whose limit the lead time is under. */
export function rushFactor(
  card: Pick<RateCard, 'rush'>,
  leadDays: number,
): { factor: number; underDays: number | null } {
  const band = [...card.rush].sort((a, b) => a.underDays - b.underDays).find((r) => leadDays < r.underDays);
  return band ? { factor: band.factor, underDays: band.underDays } : { factor: 1, underDays: null };
}

/**
 * The bid lines a rate card gives for a die: rule by type, bends, joints, punches, the board
 * and the set-up make the die; below the minimum a line tops it up; a rush factor adds its
 * share of the die as a line of its own; a counter and ejection rubber, when the request wants
 * them, are priced on the board's area. Each line rounds to whole minor units once.
 */
export function estimateFromCard(card: RateCard, input: EstimateInput): Estimate {
  const money = (minor: number) => formatMoney({ cents: Math.round(minor), currency: card.currency });
  const rate = (minor: number) => formatMoney({ cents: minor, currency: card.currency });
  const lines: EstimateLine[] = [];
  const add = (kind: EstimateLineKind, description: string, exact: number) => {
    const amount = Math.round(exact);
    if (amount > 0) lines.push({ kind, description, amount });
  };
  const d = input.dieline;
  for (const t of PRICED_RULE_TYPES) {
    if (d.length[t] > 0)
      add(
        'die',
        `${RULE_NAMES[t]}: ${d.length[t].toFixed(1)} in × ${rate(card.rulePerInch[t])}`,
        d.length[t] * card.rulePerInch[t],
      );
  }
  const features: Array<[string, number, number]> = [
    ['Bends', d.bends, card.perBend],
    ['Joints to notch', d.joints, card.perJoint],
    ['Punches', d.punches, card.perPunch],
  ];
  for (const [what, count, each] of features)
    if (count > 0) add('die', `${what}: ${count} × ${rate(each)}`, count * each);
  const area = d.board.width * d.board.height;
  const size = `${d.board.width.toFixed(2)} × ${d.board.height.toFixed(2)} in = ${area.toFixed(0)} sq in`;
  const board = boardRate(card, input.boardThicknessIn);
  if (board) add('die', `Die board ${board.thicknessIn} in: ${size} × ${rate(board.perSqIn)}`, area * board.perSqIn);
  add('die', 'Set-up', card.setUp);

  const dieSoFar = lines.reduce((t, l) => t + l.amount, 0);
  if (dieSoFar < card.minimumDie)
    add('die', `Minimum die price ${money(card.minimumDie)}: the balance`, card.minimumDie - dieSoFar);
  const die = Math.max(dieSoFar, card.minimumDie);
  const rush = rushFactor(card, input.leadDays);
  if (rush.factor > 1) {
    add(
      'other',
      `Rush: ${input.leadDays} working day${input.leadDays === 1 ? '' : 's'}, under ${rush.underDays} (die × ${rush.factor})`,
      die * (rush.factor - 1),
    );
  }
  if (input.counter) add('counter', `Counter: ${size} × ${rate(card.counterPerSqIn)}`, area * card.counterPerSqIn);
  if (input.ejectionRubber)
    add(
      'ejection_rubber',
      `Ejection rubber: ${size} × ${rate(card.ejectionRubberPerSqIn)}`,
      area * card.ejectionRubberPerSqIn,
    );
  return { currency: card.currency, lines, total: lines.reduce((t, l) => t + l.amount, 0), rushFactor: rush.factor };
}

function boardRate(card: RateCard, thicknessIn: number | undefined) {
  if (thicknessIn === undefined) return card.boardPerSqIn[0] ?? null;
  return card.boardPerSqIn.find((b) => Math.abs(b.thicknessIn - thicknessIn) < 1e-9) ?? null;
}
