import { describe, expect, it } from 'vitest';
import { GUIDANCE_NOTE } from './guidanceNote';
import { HEAVY_STOCK_CALIPER_IN, HEAVY_STOCK_GSM, scoringAdvice, type ScoringInput } from './scoringAdvice';

const codes = (input: ScoringInput) => scoringAdvice(input).reasons.map((r) => r.code);
const lightAlongGrain: ScoringInput = {
  stockWeightGsm: 120,
  foldAcrossGrain: false,
  heavyInkOnFold: false,
  colourBreakOnFold: false,
};

describe('scoringAdvice', () => {
  it('scores a fold across the grain', () => {
    // Common practice: folds across the grain crack and should be scored.
    const advice = scoringAdvice({ ...lightAlongGrain, foldAcrossGrain: true });
    expect(advice.verdict).toBe('score');
    expect(advice.reasons).toEqual([
      {
        code: 'across-grain',
        text: 'The fold runs across the grain, where the fibres crack unless the fold is scored first.',
      },
    ]);
  });

  it('scores heavy ink coverage or a colour break on the fold', () => {
    // Common practice: heavy ink coverage on a fold cracks too.
    expect(scoringAdvice({ ...lightAlongGrain, heavyInkOnFold: true }).verdict).toBe('score');
    expect(codes({ ...lightAlongGrain, heavyInkOnFold: true })).toEqual(['heavy-ink']);
    expect(codes({ ...lightAlongGrain, colourBreakOnFold: true })).toEqual(['colour-break']);
  });

  it('scores heavy stock, from about 170 g/m² or 8 pt', () => {
    // Common practice: stock from about 170 g/m² (about 8 pt, 0.008 in) is scored before folding.
    expect(HEAVY_STOCK_GSM).toBe(170);
    expect(HEAVY_STOCK_CALIPER_IN).toBe(0.008);
    expect(scoringAdvice({ ...lightAlongGrain, stockWeightGsm: 170 }).verdict).toBe('score');
    expect(scoringAdvice({ ...lightAlongGrain, stockWeightGsm: 169 }).verdict).toBe('not-needed');
    expect(scoringAdvice({ ...lightAlongGrain, stockWeightGsm: null, caliperIn: 0.008 }).verdict).toBe('score');
    expect(scoringAdvice({ ...lightAlongGrain, stockWeightGsm: null, caliperIn: 0.0079 }).verdict).toBe('not-needed');
    // Either figure at or over the threshold is enough.
    expect(scoringAdvice({ ...lightAlongGrain, stockWeightGsm: 150, caliperIn: 0.009 }).reasons[0]?.text).toBe(
      'The stock (150 g/m², 9 pt) is heavy: from about 170 g/m² or 8 pt a fold cracks unless it is scored first.',
    );
  });

  it('always creases board', () => {
    // Common practice: paperboard and corrugated folds are made by a creasing rule in the die.
    expect(scoringAdvice({ stockKind: 'paperboard' }).verdict).toBe('score');
    expect(codes({ stockKind: 'corrugated', foldAcrossGrain: true })).toEqual(['board', 'across-grain']);
  });

  it('gives every reason that calls for scoring', () => {
    const advice = scoringAdvice({
      stockWeightGsm: 300,
      foldAcrossGrain: true,
      heavyInkOnFold: true,
      colourBreakOnFold: true,
    });
    expect(advice.reasons.map((r) => r.code)).toEqual(['across-grain', 'heavy-stock', 'heavy-ink', 'colour-break']);
  });

  it('needs no scoring for light stock folded along the grain with no ink on the fold', () => {
    // Common practice: folds along the grain are clean.
    const advice = scoringAdvice({ ...lightAlongGrain, grain: 'long', stockKind: 'paper' });
    expect(advice.verdict).toBe('not-needed');
    expect(advice.reasons).toEqual([
      { code: 'light-stock', text: 'The stock (120 g/m²) is light enough to fold clean.' },
      { code: 'along-grain', text: 'The fold runs along the grain, which folds clean.' },
      { code: 'no-ink', text: 'There is no heavy ink and no colour break on the fold.' },
    ]);
  });

  it('recommends scoring when nothing calls for it but something needed to rule it out is missing', () => {
    expect(scoringAdvice({ stockWeightGsm: 120 }).verdict).toBe('recommended');
    expect(codes({ stockWeightGsm: 120 })).toEqual(['light-stock', 'fold-direction-not-given', 'ink-not-given']);
    expect(codes({ ...lightAlongGrain, stockWeightGsm: null })).toEqual(['along-grain', 'no-ink', 'weight-not-given']);
    expect(codes({ ...lightAlongGrain, colourBreakOnFold: null })).toContain('ink-not-given');
    const grainOnly = scoringAdvice({ grain: 'short' });
    expect(grainOnly.verdict).toBe('recommended');
    expect(grainOnly.reasons.find((r) => r.code === 'fold-direction-not-given')?.text).toBe(
      'The stock is short grain, but it is not said whether the fold runs along or across the grain: a fold across the grain needs scoring.',
    );
  });

  it('says unknown when nothing is given', () => {
    expect(scoringAdvice({}).verdict).toBe('unknown');
    expect(
      codes({ caliperIn: null, stockWeightGsm: null, grain: null, foldAcrossGrain: null, stockKind: 'paper' }),
    ).toEqual(['nothing-given']);
  });

  it('carries the guidance note on every answer', () => {
    expect(GUIDANCE_NOTE).toMatch(/common practice, guidance only/i);
    expect(GUIDANCE_NOTE).toMatch(/die maker/);
    expect(GUIDANCE_NOTE).toMatch(/press maker/);
    for (const input of [{}, lightAlongGrain, { stockWeightGsm: 300 }, { stockWeightGsm: 120 }]) {
      expect(scoringAdvice(input).note).toBe(GUIDANCE_NOTE);
    }
  });

  it('refuses bad input, naming the field', () => {
    expect(() => scoringAdvice({ stockWeightGsm: 0 })).toThrow(/stockWeightGsm must be more than 0/);
    expect(() => scoringAdvice({ stockWeightGsm: 6000 })).toThrow(/stockWeightGsm .* at most 5000 g\/m²/);
    expect(() => scoringAdvice({ caliperIn: -0.01 })).toThrow(/caliperIn must be more than 0/);
    expect(() => scoringAdvice({ caliperIn: Number.NaN })).toThrow(/caliperIn must be a number/);
    expect(() => scoringAdvice({ foldAcrossGrain: 'yes' as unknown as boolean })).toThrow(
      /foldAcrossGrain must be true, false or not given/,
    );
    expect(() => scoringAdvice({ heavyInkOnFold: 1 as unknown as boolean })).toThrow(/heavyInkOnFold/);
    expect(() => scoringAdvice({ grain: 'cross' as 'long' })).toThrow(/grain must be long or short/);
    expect(() => scoringAdvice({ stockKind: 'card' as 'paper' })).toThrow(/stockKind must be one of/);
  });
});
