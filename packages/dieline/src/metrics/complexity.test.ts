import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';
import { COMPLEXITY_FEATURES_PER_INCH, COMPLEXITY_RULE, complexityOf } from './complexity';

describe('complexity', () => {
  it('states its rule with the threshold', () => {
    expect(COMPLEXITY_RULE).toContain(`more than ${COMPLEXITY_FEATURES_PER_INCH} per inch of priced rule`);
  });

  // Threshold 1 feature per inch: 10 features on 10 in is simple, 11 is complex.
  it('compares features per inch with the threshold', () => {
    expect(complexityOf({ bends: 4, curves: 4, joints: 1, punches: 1 }, 10)).toBe('simple');
    expect(complexityOf({ bends: 5, curves: 4, joints: 1, punches: 1 }, 10)).toBe('complex');
    expect(complexityOf({ bends: 0, curves: 0, joints: 0, punches: 0 }, 0)).toBe('simple');
  });

  // A 10 × 10 in square: 4 bends on 40 in (0.1 per inch), simple. A zigzag of 20 teeth 0.5 in
  // wide: 40 segments of √(0.25² + 0.5²) ≈ 0.559 in, 39 bends on 22.4 in (1.7 per inch), complex.
  it('calls a square simple and a zigzag complex', () => {
    const square = analyseDieline(
      d.dxf(
        [
          d.lwpolyline(
            'CUT',
            [
              [0, 0],
              [10, 0],
              [10, 10],
              [0, 10],
            ],
            true,
          ),
        ],
        { insunits: 1 },
      ),
    );
    expect(square.metrics.complexity).toBe('simple');
    const zig: Array<[number, number]> = Array.from({ length: 41 }, (_, i) => [i * 0.25, i % 2 === 0 ? 0 : 0.5]);
    const zigzag = analyseDieline(d.dxf([d.lwpolyline('CUT', zig)], { insunits: 1 })).metrics;
    expect(zigzag.bends).toBe(39);
    expect(zigzag.complexity).toBe('complex');
  });
});
