import { PRICED_RULE_TYPES } from '@kerfmark/dieline';
import { median } from 'd3-array';
import type { NotEnough } from './notEnough';
import { estimateFromCard, type EstimateDieline, type RateCard } from './rateCard';
import { fitOls } from './regression';

/** A die the shop made and was paid for: its whole-die metrics and the die's price (its die lines). */
export interface ReceivedDie {
  dieline: EstimateDieline;
  /** The die lines of the winning bid, in minor units of the card's currency. */
  diePrice: number;
}

/** The rates the fit can suggest; the board's rate stays the card's (the fit takes it out first). */
export const CALIBRATED_RATES = ['cut', 'crease', 'perf', 'kiss', 'perBend', 'perJoint', 'perPunch', 'setUp'] as const;
export type CalibratedRate = (typeof CALIBRATED_RATES)[number];

export interface CardCalibration {
  /** Each received die: what it was paid, what the card says for the die alone, and their ratio. */
  dies: Array<{ paid: number; card: number; ratio: number }>;
  /** The median of paid ÷ card; null without dies. */
  medianRatio: number | null;
  /** The least-squares fit of the rates, or why there is none. */
  fit:
    | {
        enough: true;
        n: number;
        r2: number;
        current: Record<CalibratedRate, number>;
        /** Whole minor units; a rate the dies cannot tell (no such rule in any of them, or a negative fit) is the card's. */
        suggested: Record<CalibratedRate, number>;
        /** The rates the dies said nothing about, kept from the card. */
        kept: CalibratedRate[];
      }
    | NotEnough;
}

const currentRates = (card: RateCard): Record<CalibratedRate, number> => ({
  ...card.rulePerInch,
  perBend: card.perBend,
  perJoint: card.perJoint,
  perPunch: card.perPunch,
  setUp: card.setUp,
});

const featureOf = (d: EstimateDieline, rate: Exclude<CalibratedRate, 'setUp'>): number =>
  rate === 'perBend' ? d.bends : rate === 'perJoint' ? d.joints : rate === 'perPunch' ? d.punches : d.length[rate];

/**
 * How far the card is from what the shop was paid: each received die priced by the card (the
 * die alone: no rush, counter or rubber) against its die price, and an ordinary least-squares
 * fit (the price history's own regression) of price − board = set-up + Σ rate × feature, over
 * the features that vary among the dies. The board is taken out at the card's rate because its
 * area moves with the rule length and would blur the rule rates.
 */
export function calibrateCard(card: RateCard, received: readonly ReceivedDie[]): CardCalibration {
  const dies = received.map((r) => {
    const est = estimateFromCard(
      { ...card, rush: [], minimumDie: 0 },
      { dieline: r.dieline, counter: false, ejectionRubber: false, leadDays: 99 },
    );
    return { paid: r.diePrice, card: est.total, ratio: est.total > 0 ? r.diePrice / est.total : Number.NaN };
  });
  const ratios = dies.map((d) => d.ratio).filter(Number.isFinite);
  const current = currentRates(card);
  return { dies, medianRatio: ratios.length ? median(ratios)! : null, fit: fitRates(card, received, current) };
}

function fitRates(card: RateCard, received: readonly ReceivedDie[], current: Record<CalibratedRate, number>) {
  const candidates = [...PRICED_RULE_TYPES, 'perBend', 'perJoint', 'perPunch'] as const;
  // A feature every die has the same amount of cannot be told from the set-up.
  const used = candidates.filter((rate) => new Set(received.map((r) => featureOf(r.dieline, rate))).size > 1);
  const boardRate = card.boardPerSqIn[0]?.perSqIn ?? 0;
  const response = received.map((r) => r.diePrice - r.dieline.board.width * r.dieline.board.height * boardRate);
  const fit = fitOls(
    received.map((r) => used.map((rate) => featureOf(r.dieline, rate))),
    response,
  );
  if (!fit.enough) {
    return {
      ...fit,
      reason: `${received.length} received die${received.length === 1 ? '' : 's'} cannot fit ${used.length + 1} rates (${fit.reason}).`,
    };
  }
  const suggested = { ...current };
  const kept: CalibratedRate[] = [];
  const set = (rate: CalibratedRate, value: number) => {
    if (value >= 0) suggested[rate] = Math.round(value);
    else kept.push(rate);
  };
  set('setUp', fit.coefficients[0]!);
  used.forEach((rate, i) => set(rate, fit.coefficients[i + 1]!));
  for (const rate of candidates) if (!used.includes(rate)) kept.push(rate);
  return { enough: true as const, n: fit.n, r2: fit.r2, current, suggested, kept };
}
