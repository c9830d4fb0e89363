import { describe, expect, it } from 'vitest';
import { ellipsePoint, svgArcToCenter } from './svgArc';

describe('svgArcToCenter', () => {
  // W3C SVG 1.1 F.6.5: "M 0 0 A 1 1 0 0 1 2 0" is a half circle about (1, 0); with sweep-flag 1
  // the angle increases from π to 2π, so it passes through (1, −1), the top in SVG's y-down frame.
  it('finds the centre and sweep of a half circle', () => {
    const e = svgArcToCenter({ x: 0, y: 0 }, { x: 2, y: 0 }, 1, 1, 0, false, true)!;
    expect(e.center.x).toBeCloseTo(1, 12);
    expect(e.center.y).toBeCloseTo(0, 12);
    expect(e.dtheta).toBeCloseTo(Math.PI, 12);
    const mid = ellipsePoint(e, e.theta1 + e.dtheta / 2);
    expect(mid.y).toBeCloseTo(-1, 12);
  });

  // F.6.6: radii too small to reach are scaled up until they just do: radius 0.5 for a chord of
  // 4 becomes 2, a half circle.
  it('scales up radii that are too small', () => {
    const e = svgArcToCenter({ x: 0, y: 0 }, { x: 4, y: 0 }, 0.5, 0.5, 0, false, false)!;
    expect(e.rx).toBeCloseTo(2, 12);
    expect(Math.abs(e.dtheta)).toBeCloseTo(Math.PI, 9);
  });

  // Large-arc flag 1 on a chord shorter than the diameter takes the long way: for radius 1 and
  // chord √2 the two arcs are 90° and 270°.
  it('takes the large arc when asked', () => {
    const e = svgArcToCenter({ x: 1, y: 0 }, { x: 0, y: 1 }, 1, 1, 0, true, true)!;
    expect(Math.abs(e.dtheta)).toBeCloseTo((3 * Math.PI) / 2, 12);
  });

  // F.6.2: a zero radius makes the arc a straight line; equal endpoints draw nothing.
  it('returns null for straight or empty arcs', () => {
    expect(svgArcToCenter({ x: 0, y: 0 }, { x: 1, y: 0 }, 0, 1, 0, false, true)).toBeNull();
    expect(svgArcToCenter({ x: 1, y: 1 }, { x: 1, y: 1 }, 1, 1, 0, false, true)).toBeNull();
  });
});
