import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';

const m = (...entities: d.Pairs[]) => analyseDieline(d.dxf(entities, { insunits: 1 })).metrics;

describe('closed contours and punches', () => {
  // Punch: a closed cutting rule no larger than 0.5 in (12.7 mm) each way. A 0.25 in circle
  // (r 0.125) is one; a 1 in circle (r 0.5) is not; a 0.5 in square just is.
  it('counts small closed cuts as punches', () => {
    const r = m(
      d.circle('CUT', 0, 0, 0.125),
      d.circle('CUT', 5, 0, 0.5),
      d.lwpolyline(
        'CUT',
        [
          [10, 0],
          [10.5, 0],
          [10.5, 0.5],
          [10, 0.5],
        ],
        true,
      ),
    );
    expect(r.closedContours).toBe(3);
    expect(r.punches).toBe(2);
  });

  // A 0.5 in square in millimetres: 12.7 mm each way is a punch, 12.8 mm is not.
  it('puts the limit at 12.7 mm', () => {
    const sq = (s: number) =>
      analyseDieline(
        d.dxf(
          [
            d.lwpolyline(
              'CUT',
              [
                [0, 0],
                [s, 0],
                [s, s],
                [0, s],
              ],
              true,
            ),
          ],
          { insunits: 4 },
        ),
      ).metrics.punches;
    expect(sq(12.7)).toBe(1);
    expect(sq(12.8)).toBe(0);
  });

  it('counts closed rules of other types as contours but not punches', () => {
    const r = m(d.circle('KISS', 0, 0, 0.1), d.circle('CREASE', 2, 0, 0.1), d.circle('NOTES', 4, 0, 0.1));
    expect(r.closedContours).toBe(2);
    expect(r.punches).toBe(0);
  });

  it('does not count an open rule as a contour', () => {
    expect(m(d.arc('CUT', 0, 0, 0.1, 0, 350)).closedContours).toBe(0);
  });
});
