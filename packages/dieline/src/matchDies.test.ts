import { describe, expect, it } from 'vitest';
import { matchDies, type DieShape } from './matchDies';

const metrics = (cut: number, crease: number, bends: number, w = 8, h = 5) => ({
  length: { cut, crease, perf: 0, kiss: 0, other: 0, total: cut + crease },
  bends,
  curves: 1,
  punches: 1,
  bbox: { width: w, height: h },
});
const die = (over: Partial<DieShape> = {}): DieShape => ({
  pieceWidthIn: 8,
  pieceHeightIn: 5,
  ups: 1,
  metrics: metrics(26, 8, 4),
  ...over,
});

describe('matchDies', () => {
  it('scores the same die 1', () => {
    expect(matchDies(die(), die()).score).toBe(1);
  });

  it('matches a die turned a quarter turn, and within 1/16 in (common practice)', () => {
    expect(matchDies(die(), die({ pieceWidthIn: 5, pieceHeightIn: 8 })).sizeMatches).toBe(true);
    expect(matchDies(die(), die({ pieceWidthIn: 8 + 1 / 32 })).sizeMatches).toBe(true);
    expect(matchDies(die(), die({ pieceWidthIn: 8.125 })).score).toBe(0);
  });

  it('ranks a die with other rule lengths below one with the same', () => {
    const same = matchDies(die(), die());
    const longer = matchDies(die(), die({ metrics: metrics(40, 8, 4) }));
    expect(longer.score).toBeLessThan(same.score);
    expect(longer.reasons.join(' ')).not.toContain('within 5 %');
  });

  it('says when the ups differ', () => {
    expect(matchDies(die(), die({ ups: 2 })).reasons).toContain('2 up where 1 up is wanted.');
  });
});
