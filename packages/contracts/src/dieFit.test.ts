import { describe, expect, it } from 'vitest';
import { boardFits, dieFit, dieKindOfPress, NOTHING_STATED, type DieNeeds, type ShopCapabilities } from './dieFit';

const needs = (over: Partial<DieNeeds> = {}): DieNeeds => ({
  dieKind: 'flat',
  board: { width: 24, height: 30 },
  cuttingRuleHeightIn: 0.937,
  counterWanted: true,
  ejectionRubberWanted: true,
  ...over,
});
const shop = (over: Partial<ShopCapabilities> = {}): ShopCapabilities => ({
  dieKinds: ['flat'],
  maxBoardWidthIn: 28,
  maxBoardLengthIn: 40,
  ruleHeightsIn: [0.937],
  makesCounters: true,
  fitsEjectionRubber: true,
  ...over,
});

describe('dieFit', () => {
  it('fits a shop that states every need', () => {
    expect(dieFit(needs(), shop())).toEqual({ fits: true, misses: [], unstated: [] });
  });

  it('names each need the shop says it cannot meet', () => {
    const fit = dieFit(
      needs({ dieKind: 'rotary', cuttingRuleHeightIn: 0.918 }),
      shop({ makesCounters: false, fitsEjectionRubber: false }),
    );
    expect(fit.fits).toBe(false);
    expect(fit.misses).toEqual([
      'makes no rotary dies',
      'does not make dies with 0.918 in cutting rule',
      'makes no counters',
      'fits no ejection rubber',
    ]);
  });

  it('never leaves out a shop for what it has not stated, and lists it', () => {
    const fit = dieFit(needs(), NOTHING_STATED);
    expect(fit.fits).toBe(true);
    expect(fit.unstated).toEqual(['flat dies', 'largest die board', 'rule heights', 'counters', 'ejection rubber']);
  });

  it('asks nothing the request does not need', () => {
    const none = needs({
      dieKind: null,
      board: null,
      cuttingRuleHeightIn: null,
      counterWanted: false,
      ejectionRubberWanted: false,
    });
    expect(
      dieFit(
        none,
        shop({ dieKinds: ['rotary'], makesCounters: false, fitsEjectionRubber: false, ruleHeightsIn: [0.918] }),
      ),
    ).toEqual({
      fits: true,
      misses: [],
      unstated: [],
    });
    // A dieline with no priced rule measures a 0 × 0 board: nothing to check yet.
    expect(
      dieFit(needs({ board: { width: 0, height: 0 } }), shop({ maxBoardWidthIn: 1, maxBoardLengthIn: 1 })).fits,
    ).toBe(true);
  });

  it('checks the board either way round, to the hundredth of an inch', () => {
    // 30 × 24 on a 28 × 40 board: turned, it fits.
    expect(dieFit(needs({ board: { width: 30, height: 24 } }), shop()).fits).toBe(true);
    expect(boardFits({ width: 28.004, height: 40 }, 28, 40)).toBe(true);
    expect(boardFits({ width: 28.01, height: 40 }, 28, 40)).toBe(false);
    expect(dieFit(needs({ board: { width: 30, height: 41 } }), shop()).misses).toEqual([
      'board 30 in × 41 in is over its largest, 28 in × 40 in',
    ]);
  });

  it('takes the die kind from the press (common practice: rotary presses run rotary dies)', () => {
    expect(dieKindOfPress('rotary')).toBe('rotary');
    expect(dieKindOfPress('platen')).toBe('flat');
    expect(dieKindOfPress('flatbed')).toBe('flat');
  });
});
