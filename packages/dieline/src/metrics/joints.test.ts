import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';

const m = (...entities: d.Pairs[]) => analyseDieline(d.dxf(entities, { insunits: 4 })).metrics;

describe('joints (all sizes in mm)', () => {
  // A T: a crease from (50,0) up to (50,40) ends on the side of the cut line (0,40)–(100,40).
  it('counts a rule ending on the side of another as 1 joint', () => {
    expect(m(d.line('CUT', 0, 40, 100, 40), d.line('CREASE', 50, 0, 50, 40)).joints).toBe(1);
  });

  // Two chains of different types meeting end to end: 1 joint.
  it('counts two rules meeting end to end as 1 joint', () => {
    expect(m(d.line('CUT', 0, 0, 50, 0), d.line('PERF', 50, 0, 100, 0)).joints).toBe(1);
  });

  // One type meeting end to end is one rule (a bend at most), not a joint.
  it('counts no joint where one rule continues', () => {
    const r = m(d.line('CUT', 0, 0, 50, 0), d.line('CUT', 50, 0, 50, 50));
    expect(r.joints).toBe(0);
    expect(r.bends).toBe(1);
  });

  // A crease ending 0.1 mm short of the cut does not touch it; 0.04 mm short it does.
  it('needs the end within 0.05 mm of the other rule', () => {
    expect(m(d.line('CUT', 0, 40, 100, 40), d.line('CREASE', 50, 0, 50, 39.9)).joints).toBe(0);
    expect(m(d.line('CUT', 0, 40, 100, 40), d.line('CREASE', 50, 0, 50, 39.96)).joints).toBe(1);
  });

  // A crease ending on a corner of a closed cut rectangle: the cut runs on (a bend), the crease
  // stops there: 1 joint. Three cut lines meeting at one point: 1 joint.
  it('counts a rule ending on another rule’s vertex, and three rules meeting, once each', () => {
    const r = m(
      d.lwpolyline(
        'CUT',
        [
          [0, 0],
          [100, 0],
          [100, 50],
          [0, 50],
        ],
        true,
      ),
      d.line('CREASE', 100, 50, 150, 100),
    );
    expect(r.joints).toBe(1);
    expect(r.bends).toBe(4);
    expect(m(d.line('CUT', 0, 0, 10, 0), d.line('CUT', 0, 0, -10, 5), d.line('CUT', 0, 0, -10, -5)).joints).toBe(1);
  });

  // A box with a crease across it from side to side: 2 joints, one at each end.
  it('counts a rule spanning a box as 2 joints', () => {
    expect(
      m(
        d.lwpolyline(
          'CUT',
          [
            [0, 0],
            [100, 0],
            [100, 50],
            [0, 50],
          ],
          true,
        ),
        d.line('CREASE', 50, 0, 50, 50),
      ).joints,
    ).toBe(2);
  });

  // Rules of no rule type are not priced and make no joints.
  it('ignores rules that are not priced', () => {
    expect(m(d.line('CUT', 0, 40, 100, 40), d.line('DIMENSIONS', 50, 0, 50, 40)).joints).toBe(0);
  });
});
