import { describe, expect, it } from 'vitest';
import { bspline } from './bspline';

describe('bspline', () => {
  // A clamped B-spline of degree 2 on knots [0,0,0,1,1,1] is the quadratic Bézier curve of its
  // control points: B(t) = (1−t)²P0 + 2t(1−t)P1 + t²P2 (the Bernstein form).
  it('equals the Bézier curve of a single clamped span', () => {
    const P = [
      { x: 0, y: 0 },
      { x: 1, y: 2 },
      { x: 2, y: 0 },
    ];
    const s = bspline(2, P, [0, 0, 0, 1, 1, 1]);
    for (const t of [0, 0.25, 0.5, 0.9, 1]) {
      const p = s.at(t);
      expect(p.x).toBeCloseTo(2 * t * (1 - t) * 1 + t * t * 2, 12);
      expect(p.y).toBeCloseTo(2 * t * (1 - t) * 2, 12);
    }
  });

  // Degree 1 is the polyline through its control points; at the inner knot 1 it is at P1.
  it('passes through the control points at degree 1', () => {
    const s = bspline(
      1,
      [
        { x: 0, y: 0 },
        { x: 1, y: 1 },
        { x: 2, y: 0 },
      ],
      [0, 0, 1, 2, 2],
    );
    expect(s.at(1)).toEqual({ x: 1, y: 1 });
    expect(s.at(1.5)).toEqual({ x: 1.5, y: 0.5 });
  });

  // A rational quadratic with weights 1, √2/2, 1 on a right-angled corner is an exact quarter
  // circle (the standard NURBS conic): every point is at distance 1 from the centre.
  it('uses weights when given', () => {
    const s = bspline(
      2,
      [
        { x: 1, y: 0 },
        { x: 1, y: 1 },
        { x: 0, y: 1 },
      ],
      [0, 0, 0, 1, 1, 1],
      [1, Math.SQRT1_2, 1],
    );
    for (const t of [0.1, 0.5, 0.8]) expect(Math.hypot(s.at(t).x, s.at(t).y)).toBeCloseTo(1, 12);
  });

  it('refuses knot vectors that do not fit', () => {
    expect(() =>
      bspline(
        3,
        [
          { x: 0, y: 0 },
          { x: 1, y: 1 },
          { x: 2, y: 0 },
          { x: 3, y: 1 },
        ],
        [0, 0, 0, 1, 1, 1],
      ),
    ).toThrow(/knots/);
    expect(() =>
      bspline(
        2,
        [
          { x: 0, y: 0 },
          { x: 1, y: 1 },
          { x: 2, y: 0 },
        ],
        [0, 0, 1, 0.5, 1, 1],
      ),
    ).toThrow(/order/);
  });
});
