import { describe, expect, it } from 'vitest';
import { creasingRuleFor, CUTTING_RULE_HEIGHT_IN, RULE_THICKNESS_IN } from './steelRule';
import type { StockKind } from './stockKind';

describe('steel rule table', () => {
  it('holds the thicknesses the trade rounds its rules to', () => {
    // Common practice: 2 pt = 0.028 in, 3 pt = 0.042 in, 4 pt = 0.056 in, 6 pt = 0.084 in.
    expect(RULE_THICKNESS_IN).toEqual({ 2: 0.028, 3: 0.042, 4: 0.056, 6: 0.084 });
    // Common practice: the usual cutting rule is 0.937 in high.
    expect(CUTTING_RULE_HEIGHT_IN).toBe(0.937);
  });
});

describe('creasingRuleFor', () => {
  it('picks 2 pt for thin paperboard and 3 pt for heavier, by our bands', () => {
    // Common practice: a 2 pt creasing rule for folding carton board (the worked example, 0.50 mm
    // board with a 2 pt rule); our band edge 0.024 in (24 pt), 3 pt above it.
    expect(creasingRuleFor(0.5 / 25.4, 'paperboard')).toBe(2);
    expect(creasingRuleFor(0.024, 'paperboard')).toBe(2);
    expect(creasingRuleFor(0.0241, 'paperboard')).toBe(3);
    expect(creasingRuleFor(0.008, 'paper')).toBe(2);
  });

  it('picks 4 pt for single-wall corrugated and 6 pt for thicker, by our bands', () => {
    // Common practice: heavier rule for corrugated; our band edge 1/8 in.
    expect(creasingRuleFor(0.0625, 'corrugated')).toBe(4);
    expect(creasingRuleFor(0.125, 'corrugated')).toBe(4);
    expect(creasingRuleFor(0.16, 'corrugated')).toBe(6);
  });

  it('refuses a bad caliper or stock kind', () => {
    expect(() => creasingRuleFor(0, 'paperboard')).toThrow(/caliperIn must be more than 0/);
    expect(() => creasingRuleFor(0.6, 'corrugated')).toThrow(/caliperIn must be more than 0 and at most 0.5 in/);
    expect(() => creasingRuleFor(0.02, 'card' as StockKind)).toThrow(
      /stockKind must be one of paper, paperboard, corrugated/,
    );
  });
});
