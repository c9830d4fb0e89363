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
    expect(g.channelWidth.mm).toBe(1.46);
    expect(g.creasingRuleHeight.mm).toBe(23.3);
    expect(g.cuttingRuleHeight).toEqual({ in: 0.937, mm: 23.8 });
    // Channel depth about the caliper (common practice).
    expect(g.channelDepth).toEqual({ in: 0.02, mm: 0.5 });
    // Arithmetic in inches: 0.937 − 0.5 / 25.4 = 0.91731 → 0.917; 1.5 × 0.019685 + 0.028 = 0.05753 → 0.058.
    expect(g.creasingRuleHeight.in).toBe(0.917);
    expect(g.channelWidth.in).toBe(0.058);
    expect(g.warnings).toEqual([]);
    expect(g.note).toBe(GUIDANCE_NOTE);
  });

  it('takes the lower factor when the grain runs parallel to the crease', () => {
    // Common practice: 1.3 × caliper + rule thickness, grain parallel. Arithmetic: 1.3 × 0.50 + 0.7112 = 1.3612 → 1.36 mm.
    const g = creasingGuidance({ caliperIn: halfMm, stockKind: 'paperboard', grainParallelToCrease: true });
    expect(g.channelFactor).toBe(1.3);
    expect(g.channelWidth.mm).toBe(1.36);
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

  it('treats paper like paperboard', () => {
    // Common practice gives factors for paperboard only; paper takes them. Arithmetic for 0.008 in
    // paper, grain parallel: 1.3 × 0.008 + 0.028 = 0.0384 in = 0.97536 mm → 0.98 mm; across: 1.5 × 0.008 + 0.028 = 0.04 in = 1.016 mm → 1.02 mm.
    expect(
      creasingGuidance({ caliperIn: 0.008, stockKind: 'paper', grainParallelToCrease: true }).channelWidth,
    ).toEqual({ in: 0.038, mm: 0.98 });
    expect(
      creasingGuidance({ caliperIn: 0.008, stockKind: 'paper', grainParallelToCrease: false }).channelWidth,
    ).toEqual({ in: 0.04, mm: 1.02 });
  });

  it('uses a 3 pt rule for heavier board', () => {
    // Common practice: 3 pt = 0.042 in (1.07 mm). Arithmetic for 0.030 in board across the grain:
    // channel 1.5 × 0.030 + 0.042 = 0.087 in = 2.2098 mm → 2.21 mm; height 0.937 − 0.030 = 0.907 in.
    const g = creasingGuidance({ caliperIn: 0.03, stockKind: 'paperboard', grainParallelToCrease: false });
    expect(g.rule).toEqual({ points: 3, thickness: { in: 0.042, mm: 1.07 } });
    expect(g.channelWidth).toEqual({ in: 0.087, mm: 2.21 });
    expect(g.creasingRuleHeight.in).toBe(0.907);
  });

  it('uses the corrugated factor and a heavier rule for corrugated', () => {
    // Common practice: about 1.8 to 2.0 × caliper + rule thickness for corrugated; 4 pt = 0.056 in,
    // 6 pt = 0.084 in. Arithmetic: 1/16 in flute, across: 2.0 × 0.0625 + 0.056 = 0.181 in = 4.5974 mm.
    const across = creasingGuidance({ caliperIn: 0.0625, stockKind: 'corrugated', grainParallelToCrease: false });
    expect(across.rule.points).toBe(4);
    expect(across.channelFactor).toBe(2);
    expect(across.channelWidth).toEqual({ in: 0.181, mm: 4.6 });
    // Arithmetic: parallel, 1.8 × 0.0625 + 0.056 = 0.1685 in = 4.2799 mm.
    const parallel = creasingGuidance({ caliperIn: 0.0625, stockKind: 'corrugated', grainParallelToCrease: true });
    expect(parallel.channelFactor).toBe(1.8);
    expect(parallel.channelWidth.mm).toBe(4.28);
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
