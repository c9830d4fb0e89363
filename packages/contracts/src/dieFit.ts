import type { DieKind } from './organisationProfile';
import type { PressKind } from './presses';

/** What a die needs of the shop that makes it, as far as the request knows yet. */
export interface DieNeeds {
  /** From the press the die runs on: a rotary press takes a rotary die, a platen or flatbed a flat one. */
  dieKind: DieKind | null;
  /** The measured die board, inches; null until the dieline is measured. */
  board: { width: number; height: number } | null;
  /** The press's cutting rule height, inches. */
  cuttingRuleHeightIn: number | null;
  counterWanted: boolean;
  ejectionRubberWanted: boolean;
}

/** A die shop's stated capabilities; null or empty means not stated. */
export interface ShopCapabilities {
  dieKinds: readonly DieKind[];
  maxBoardWidthIn: number | null;
  maxBoardLengthIn: number | null;
  ruleHeightsIn: readonly number[];
  makesCounters: boolean | null;
  fitsEjectionRubber: boolean | null;
}

/** A shop that has stated none of its capabilities yet: it fits every die, with each need unstated. */
export const NOTHING_STATED: ShopCapabilities = {
  dieKinds: [],
  maxBoardWidthIn: null,
  maxBoardLengthIn: null,
  ruleHeightsIn: [],
  makesCounters: null,
  fitsEjectionRubber: null,
};

export interface DieFit {
  /** False only when the shop has said it cannot do something the die needs. */
  fits: boolean;
  /** What the shop has said it cannot do, in words. */
  misses: string[];
  /** What the die needs that the shop has not stated either way. */
  unstated: string[];
}

export const dieKindOfPress = (kind: PressKind): DieKind => (kind === 'rotary' ? 'rotary' : 'flat');

// The board sizes are kept to the hundredth of an inch; a die measured to within that fits.
export const BOARD_TOLERANCE_IN = 0.005;

/** Whether a board fits within the shop's largest, either way round. */
export function boardFits(board: { width: number; height: number }, maxWidth: number, maxLength: number): boolean {
  const within = (a: number, b: number) => a <= maxWidth + BOARD_TOLERANCE_IN && b <= maxLength + BOARD_TOLERANCE_IN;
  return within(board.width, board.height) || within(board.height, board.width);
}

const inches = (v: number) => `${Number(v.toFixed(2))} in`;

/**
 * Whether a shop can make a die, by what each has said. A need the shop has not stated counts
 * as possible (and is listed), so a shop that has not filled its profile is never left out.
 */
export function dieFit(needs: DieNeeds, shop: ShopCapabilities): DieFit {
  const misses: string[] = [];
  const unstated: string[] = [];
  if (needs.dieKind) {
    if (!shop.dieKinds.length) unstated.push(`${needs.dieKind} dies`);
    else if (!shop.dieKinds.includes(needs.dieKind)) misses.push(`makes no ${needs.dieKind} dies`);
  }
  if (needs.board && needs.board.width > 0 && needs.board.height > 0) {
    const { maxBoardWidthIn: w, maxBoardLengthIn: l } = shop;
    if (w === null || l === null) unstated.push('largest die board');
    else if (!boardFits(needs.board, w, l))
      misses.push(
        `board ${inches(needs.board.width)} × ${inches(needs.board.height)} is over its largest, ${inches(w)} × ${inches(l)}`,
      );
  }
  if (needs.cuttingRuleHeightIn !== null) {
    const height = needs.cuttingRuleHeightIn;
    if (!shop.ruleHeightsIn.length) unstated.push('rule heights');
    else if (!shop.ruleHeightsIn.some((h) => Math.abs(h - height) < 0.0005))
      misses.push(`does not make dies with ${height} in cutting rule`);
  }
  if (needs.counterWanted) {
    if (shop.makesCounters === null) unstated.push('counters');
    else if (!shop.makesCounters) misses.push('makes no counters');
  }
  if (needs.ejectionRubberWanted) {
    if (shop.fitsEjectionRubber === null) unstated.push('ejection rubber');
    else if (!shop.fitsEjectionRubber) misses.push('fits no ejection rubber');
  }
  return { fits: misses.length === 0, misses, unstated };
}
