import { MAX_STOCK_WEIGHT_GSM } from './basisWeight';
import { MAX_CALIPER_IN } from './caliper';
import { checkNumber } from './checkNumber';
import { GUIDANCE_NOTE } from './guidanceNote';
import { checkStockKind, type StockKind } from './stockKind';

export interface ScoringInput {
  caliperIn?: number | null;
  stockWeightGsm?: number | null;
  /** The sheet's grain: long grain runs with the sheet's long side. */
  grain?: 'long' | 'short' | null;
  foldAcrossGrain?: boolean | null;
  heavyInkOnFold?: boolean | null;
  colourBreakOnFold?: boolean | null;
  stockKind?: StockKind;
}

export type ScoringVerdict = 'score' | 'recommended' | 'not-needed' | 'unknown';

export type ScoringReasonCode =
  | 'across-grain'
  | 'heavy-stock'
  | 'heavy-ink'
  | 'colour-break'
  | 'board'
  | 'light-stock'
  | 'along-grain'
  | 'no-ink'
  | 'weight-not-given'
  | 'fold-direction-not-given'
  | 'ink-not-given'
  | 'nothing-given';

export interface ScoringAdvice {
  verdict: ScoringVerdict;
  reasons: Array<{ code: ScoringReasonCode; text: string }>;
  note: string;
}

/**
 * Stock from about this weight or caliper folds badly unscored (common practice: print
 * finishers score from about 170 g/m², about 8 pt board).
 */
export const HEAVY_STOCK_GSM = 170;
export const HEAVY_STOCK_CALIPER_IN = 0.008;

/**
 * Whether the folds need scoring (creasing) before folding.
 * - score: the fold runs across the grain, heavy ink or a colour break sits on the fold, the
 *   stock is heavy, or the stock is board (board is always creased in the die);
 * - not-needed: light stock folded along the grain, with neither heavy ink nor a colour break
 *   on the fold, all of it stated;
 * - recommended: nothing calls for scoring, but something needed to rule it out is not stated;
 * - unknown: nothing is stated.
 */
export function scoringAdvice(input: ScoringInput): ScoringAdvice {
  const caliperIn = optionalNumber('caliperIn', input.caliperIn, MAX_CALIPER_IN, 'in');
  const gsm = optionalNumber('stockWeightGsm', input.stockWeightGsm, MAX_STOCK_WEIGHT_GSM, 'g/m²');
  const acrossGrain = optionalBoolean('foldAcrossGrain', input.foldAcrossGrain);
  const heavyInk = optionalBoolean('heavyInkOnFold', input.heavyInkOnFold);
  const colourBreak = optionalBoolean('colourBreakOnFold', input.colourBreakOnFold);
  const grain = input.grain ?? null;
  if (grain !== null && grain !== 'long' && grain !== 'short')
    throw new RangeError(`grain must be long or short (got ${String(grain)})`);
  const kind = input.stockKind === undefined ? null : checkStockKind(input.stockKind);

  const heavy = (gsm !== null && gsm >= HEAVY_STOCK_GSM) || (caliperIn !== null && caliperIn >= HEAVY_STOCK_CALIPER_IN);
  const weightKnown = gsm !== null || caliperIn !== null;
  const stated = [
    gsm !== null ? `${gsm} g/m²` : '',
    caliperIn !== null ? `${Number((caliperIn * 1000).toFixed(1))} pt` : '',
  ]
    .filter(Boolean)
    .join(', ');

  const needs: ScoringAdvice['reasons'] = [];
  if (kind === 'paperboard' || kind === 'corrugated') {
    needs.push({
      code: 'board',
      text: `${kind === 'corrugated' ? 'Corrugated board' : 'Paperboard'} is creased for every fold: the die needs a creasing rule there.`,
    });
  }
  if (acrossGrain === true)
    needs.push({
      code: 'across-grain',
      text: 'The fold runs across the grain, where the fibres crack unless the fold is scored first.',
    });
  if (heavy) {
    needs.push({
      code: 'heavy-stock',
      text: `The stock (${stated}) is heavy: from about ${HEAVY_STOCK_GSM} g/m² or 8 pt a fold cracks unless it is scored first.`,
    });
  }
  if (heavyInk === true)
    needs.push({
      code: 'heavy-ink',
      text: 'Heavy ink coverage on the fold cracks and shows white unless the fold is scored first.',
    });
  if (colourBreak === true)
    needs.push({
      code: 'colour-break',
      text: 'A colour break on the fold shows any crack and any drift of the fold: scoring keeps the fold clean and in place.',
    });
  if (needs.length > 0) return { verdict: 'score', reasons: needs, note: GUIDANCE_NOTE };

  const nothingStated =
    !weightKnown && acrossGrain === null && heavyInk === null && colourBreak === null && grain === null;
  if (nothingStated) {
    return {
      verdict: 'unknown',
      reasons: [
        {
          code: 'nothing-given',
          text: 'Nothing is known yet about the stock or the fold: give the stock weight or caliper, the grain and the ink on the fold.',
        },
      ],
      note: GUIDANCE_NOTE,
    };
  }

  const known: ScoringAdvice['reasons'] = [];
  const missing: ScoringAdvice['reasons'] = [];
  if (weightKnown) known.push({ code: 'light-stock', text: `The stock (${stated}) is light enough to fold clean.` });
  else
    missing.push({
      code: 'weight-not-given',
      text: 'The stock weight or caliper is not given: heavy stock needs scoring.',
    });
  if (acrossGrain === false)
    known.push({ code: 'along-grain', text: 'The fold runs along the grain, which folds clean.' });
  else {
    const text =
      grain === null
        ? 'It is not said whether the fold runs along or across the grain: a fold across the grain needs scoring.'
        : `The stock is ${grain} grain, but it is not said whether the fold runs along or across the grain: a fold across the grain needs scoring.`;
    missing.push({ code: 'fold-direction-not-given', text });
  }
  if (heavyInk === false && colourBreak === false)
    known.push({ code: 'no-ink', text: 'There is no heavy ink and no colour break on the fold.' });
  else
    missing.push({
      code: 'ink-not-given',
      text: 'It is not said whether heavy ink or a colour break sits on the fold: either needs scoring.',
    });

  return {
    verdict: missing.length === 0 ? 'not-needed' : 'recommended',
    reasons: [...known, ...missing],
    note: GUIDANCE_NOTE,
  };
}

function optionalNumber(field: string, value: unknown, atMost: number, unit: string): number | null {
  if (value === null || value === undefined) return null;
  return checkNumber(field, value, { above: 0, atMost, unit });
}

function optionalBoolean(field: string, value: unknown): boolean | null {
  if (value === null || value === undefined) return null;
  if (typeof value !== 'boolean')
    throw new RangeError(`${field} must be true, false or not given (got ${String(value)})`);
  return value;
}
