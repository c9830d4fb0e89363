import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';

const m = (...entities: d.Pairs[]) => analyseDieline(d.dxf(entities, { insunits: 1 })).metrics;
const deg = (a: number) => (a * Math.PI) / 180;

describe('bends', () => {
  // A rectangle has four corners, the closing vertex included.
  it('counts 4 bends on a closed rectangle', () => {
    expect(
      m(
        d.lwpolyline(
          'CUT',
          [
            [0, 0],
            [3, 0],
            [3, 2],
            [0, 2],
          ],
          true,
        ),
      ).bends,
    ).toBe(4);
  });

  // The same rectangle left open at (0,0): 3 bends (its two ends are not a vertex).
  it('counts no bend at the free ends of an open rule', () => {
    expect(
      m(
        d.lwpolyline('CUT', [
          [0, 0],
          [3, 0],
          [3, 2],
          [0, 2],
          [0, 0.5],
        ]),
      ).bends,
    ).toBe(3);
  });

  // A line running on tangent into an arc: (0,0)→(2,0), then a bulge-1 semicircle to (2,2)
  // whose tangent at (2,0) is along +x: no bend. A line meeting the arc at 90° would be a bend.
  it('counts no bend where a line runs smoothly into an arc', () => {
    expect(
      m(
        d.lwpolyline('CUT', [
          [0, 0],
          [2, 0, 1],
          [2, 2],
        ]),
      ).bends,
    ).toBe(0);
    expect(m(d.line('CUT', 2, -3, 2, 0), d.arc('CUT', 2, 1, 1, 270, 90)).bends).toBe(1);
  });

  // Over 1 degree is a bend: a polyline turning by 0.5° is not, by 2° is.
  it('needs a change of direction over 1 degree', () => {
    const turn = (a: number) =>
      m(
        d.lwpolyline('CUT', [
          [0, 0],
          [5, 0],
          [5 + 5 * Math.cos(deg(a)), 5 * Math.sin(deg(a))],
        ]),
      ).bends;
    expect(turn(0.5)).toBe(0);
    expect(turn(2)).toBe(1);
  });

  // Bends are within one rule type: a cut line continuing as a crease is a joint, not a bend.
  it('counts bends only within one rule type', () => {
    const r = m(d.line('CUT', 0, 0, 2, 0), d.line('CREASE', 2, 0, 2, 2));
    expect(r.bends).toBe(0);
    expect(r.joints).toBe(1);
  });
});
