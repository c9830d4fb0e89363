import { describe, expect, it } from 'vitest';
import { convertCaliper } from './caliper';
import { creasingGuidance } from './creasingGuidance';
import { GUIDANCE_NOTE } from './guidanceNote';
import type { StockKind } from './stockKind';

const halfMm = convertCaliper(0.5, 'mm', 'in');

describe('creasingGuidance', () => {
  it('matches the worked example: 0.50 mm board, 2 pt rule, factor 1.5', () => {
    // Common practice worked example: caliper 0.50 mm, 2 pt rule 0.71 mm, factor 1.5 →
    // channel 1.5 × 0.50 + 0.71 = 1.46 mm; crease rule height 23.80 − 0.50 = 23.30 mm.
    const g = creasingGuidance({ caliperIn: halfMm, stockKind: 'paperboard', grainParallelToCrease: false });
    expect(g.rule).toEqual({ points: 2, thickness: { in: 0.028, mm: 0.71 } });
    expect(g.channelFactor).toBe(1.5);
    expect(g.channelWidth?.mm).toBe(1.46);
    expect(g.creasingRuleHeight?.mm).toBe(23.3);
    expect(g.cuttingRuleHeight).toEqual({ in: 0.937, mm: 23.8 });
    // Channel depth about the caliper (common practice).
    expect(g.channelDepth).toEqual({ in: 0.02, mm: 0.5 });
    // Arithmetic in inches: 0.937 − 0.5 / 25.4 = 0.91731 → 0.917; 1.5 × 0.019685 + 0.028 = 0.05753 → 0.058.
    expect(g.creasingRuleHeight?.in).toBe(0.917);
    expect(g.channelWidth?.in).toBe(0.058);
    expect(g.warnings).toEqual([]);
    expect(g.note).toBe(GUIDANCE_NOTE);
  });

  it('takes the lower factor when the grain runs parallel to the crease', () => {
    // Common practice: 1.3 × caliper + rule thickness, grain parallel. Arithmetic: 1.3 × 0.50 + 0.7112 = 1.3612 → 1.36 mm.
    const g = creasingGuidance({ caliperIn: halfMm, stockKind: 'paperboard', grainParallelToCrease: true });
    expect(g.channelFactor).toBe(1.3);
    expect(g.channelWidth?.mm).toBe(1.36);
  });

  it('takes the wider factor and says so when the grain is not given', () => {
    const g = creasingGuidance({ caliperIn: halfMm, stockKind: 'paperboard' });
    expect(g.channelFactor).toBe(1.5);
    expect(g.warnings).toEqual([
      {
        code: 'grain-not-given',
        text: 'The grain direction is not given, so the channel uses the wider factor (1.5); with the grain parallel to the crease it would be 1.3.',
      },
    ]);
    expect(
      creasingGuidance({ caliperIn: halfMm, stockKind: 'paperboard', grainParallelToCrease: null }).channelFactor,
    ).toBe(1.5);
  });

  it('gives paper about twice its caliper plus the rule, grain or not', () => {
    // Paper mills' published creasing guides (from memory): channel ≈ 2 × paper caliper + rule width.
    // Arithmetic for 0.008 in paper: 2 × 0.008 + 0.028 = 0.044 in = 1.1176 mm → 1.12 mm.
    for (const grainParallelToCrease of [true, false, null]) {
      const g = creasingGuidance({ caliperIn: 0.008, stockKind: 'paper', grainParallelToCrease });
      expect(g.channelFactor).toBe(2);
      expect(g.channelWidth).toEqual({ in: 0.044, mm: 1.12 });
      // One factor either way: no warning about the grain.
      expect(g.warnings).toEqual([]);
    }
  });

  it('uses a 3 pt rule for heavier board', () => {
    // Common practice: 3 pt = 0.042 in (1.07 mm). Arithmetic for 0.030 in board across the grain:
    // channel 1.5 × 0.030 + 0.042 = 0.087 in = 2.2098 mm → 2.21 mm; height 0.937 − 0.030 = 0.907 in.
    const g = creasingGuidance({ caliperIn: 0.03, stockKind: 'paperboard', grainParallelToCrease: false });
    expect(g.rule).toEqual({ points: 3, thickness: { in: 0.042, mm: 1.07 } });
    expect(g.channelWidth).toEqual({ in: 0.087, mm: 2.21 });
    expect(g.creasingRuleHeight?.in).toBe(0.907);
  });

  it('sizes corrugated on its crushed thickness, and waits for it', () => {
    // Common practice: about 1.8 to 2.0 × the crushed board thickness + rule thickness; 4 pt =
    // 0.056 in, 6 pt = 0.084 in. A 1/16 in flute crushed to 0.03 in, across: 2.0 × 0.03 + 0.056
    // = 0.116 in = 2.9464 mm → 2.95 mm; creasing rule 0.937 − 0.03 = 0.907 in; depth 0.03 in.
    const across = creasingGuidance({
      caliperIn: 0.0625,
      crushedCaliperIn: 0.03,
      stockKind: 'corrugated',
      grainParallelToCrease: false,
    });
    expect(across.rule.points).toBe(4);
    expect(across.channelFactor).toBe(2);
    expect(across.creasedThickness).toEqual({ in: 0.03, mm: 0.76 });
    expect(across.channelWidth).toEqual({ in: 0.116, mm: 2.95 });
    expect(across.creasingRuleHeight?.in).toBe(0.907);
    expect(across.channelDepth?.in).toBe(0.03);
    // Arithmetic: parallel, 1.8 × 0.03 + 0.056 = 0.11 in = 2.794 mm → 2.79 mm.
    const parallel = creasingGuidance({
      caliperIn: 0.0625,
      crushedCaliperIn: 0.03,
      stockKind: 'corrugated',
      grainParallelToCrease: true,
    });
    expect(parallel.channelFactor).toBe(1.8);
    expect(parallel.channelWidth?.mm).toBe(2.79);
    // Without the crushed thickness: the rule, but no channel or height, and a warning asking for it.
    const waiting = creasingGuidance({ caliperIn: 0.0625, stockKind: 'corrugated', grainParallelToCrease: false });
    expect(waiting.rule.points).toBe(4);
    expect(waiting.channelWidth).toBeNull();
    expect(waiting.creasingRuleHeight).toBeNull();
    expect(waiting.warnings.map((w) => w.code)).toEqual(['crushed-not-given']);
    // A crushed thickness above the caliper is no crushing.
    expect(() => creasingGuidance({ caliperIn: 0.0625, crushedCaliperIn: 0.07, stockKind: 'corrugated' })).toThrow(
      /crushedCaliperIn .* at most/,
    );
    // Arithmetic: 6 pt = 0.084 in × 25.4 = 2.1336 mm → 2.13 mm.
    expect(creasingGuidance({ caliperIn: 0.16, stockKind: 'corrugated', grainParallelToCrease: false }).rule).toEqual({
      points: 6,
      thickness: { in: 0.084, mm: 2.13 },
    });
  });

  it('takes the cutting rule height given', () => {
    // Arithmetic: 0.918 − 0.020 = 0.898 in = 22.8092 mm → 22.81 mm.
    const g = creasingGuidance({
      caliperIn: 0.02,
      stockKind: 'paperboard',
      grainParallelToCrease: true,
      ruleHeightIn: 0.918,
    });
    expect(g.creasingRuleHeight).toEqual({ in: 0.898, mm: 22.81 });
  });

  it('warns when the nearest rule is closer than about 3/32 in (2.4 mm)', () => {
    // Common practice: rules closer than about 3/32 in (2.4 mm) are hard to make. Arithmetic: 3/32 in = 0.09375 in.
    const close = creasingGuidance({
      caliperIn: 0.02,
      stockKind: 'paperboard',
      grainParallelToCrease: true,
      nearestRuleGapIn: 0.08,
    });
    expect(close.warnings).toEqual([
      {
        code: 'rules-too-close',
        text: 'The nearest rule is 2.03 mm away: rules closer than about 3/32 in (2.4 mm) are hard to make.',
      },
    ]);
    expect(
      creasingGuidance({
        caliperIn: 0.02,
        stockKind: 'paperboard',
        grainParallelToCrease: true,
        nearestRuleGapIn: 0.09375,
      }).warnings,
    ).toEqual([]);
    expect(
      creasingGuidance({
        caliperIn: 0.02,
        stockKind: 'paperboard',
        grainParallelToCrease: true,
        nearestRuleGapIn: null,
      }).warnings,
    ).toEqual([]);
  });

  it('refuses bad input, naming the field', () => {
    expect(() => creasingGuidance({ caliperIn: 0, stockKind: 'paperboard' })).toThrow(/caliperIn must be more than 0/);
    expect(() => creasingGuidance({ caliperIn: 0.6, stockKind: 'paperboard' })).toThrow(/caliperIn .* at most 0.5 in/);
    expect(() => creasingGuidance({ caliperIn: Number.NaN, stockKind: 'paperboard' })).toThrow(
      /caliperIn must be a number/,
    );
    expect(() => creasingGuidance({ caliperIn: 0.02, stockKind: 'card' as StockKind })).toThrow(
      /stockKind must be one of/,
    );
    expect(() =>
      creasingGuidance({ caliperIn: 0.02, stockKind: 'paper', grainParallelToCrease: 'yes' as unknown as boolean }),
    ).toThrow(/grainParallelToCrease/);
    expect(() => creasingGuidance({ caliperIn: 0.3, stockKind: 'corrugated', ruleHeightIn: 0.25 })).toThrow(
      /ruleHeightIn must be more than 0.3/,
    );
    expect(() => creasingGuidance({ caliperIn: 0.02, stockKind: 'paperboard', ruleHeightIn: 4 })).toThrow(
      /ruleHeightIn .* at most 3 in/,
    );
    expect(() => creasingGuidance({ caliperIn: 0.02, stockKind: 'paperboard', nearestRuleGapIn: -1 })).toThrow(
      /nearestRuleGapIn must be more than 0/,
    );
  });
});
