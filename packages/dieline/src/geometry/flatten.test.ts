import { describe, expect, it } from 'vitest';
import { flattenCurve } from './flatten';
import { gaussKummer } from '../../fixtures/reference';

const ellipse = (a: number, b: number) => (t: number) => ({ x: a * Math.cos(t), y: b * Math.sin(t) });

describe('flattenCurve', () => {
  // Geometry: circumference 2πr for r = 3.
  it('measures a circle within 0.1 % (in fact to 1e-9)', () => {
    const f = flattenCurve(ellipse(3, 3), 0, 2 * Math.PI);
    expect(Math.abs(f.length / (6 * Math.PI) - 1)).toBeLessThan(1e-9);
    expect(f.minRadius).toBeCloseTo(3, 6);
  });

  // Ellipse a = 5, b = 1 (strongly eccentric): perimeter from the Gauss–Kummer series; smallest
  // radius of curvature b²/a = 0.2 at the ends of the major axis (geometry).
  it('measures an eccentric ellipse and its tightest curvature', () => {
    const f = flattenCurve(ellipse(5, 1), 0, 2 * Math.PI);
    expect(Math.abs(f.length / gaussKummer(5, 1) - 1)).toBeLessThan(1e-6);
    expect(f.minRadius).toBeCloseTo(0.2, 5);
  });

  // A straight line as a curve: length of (0,0)–(3,4) is 5, no curvature.
  it('treats a straight curve as straight', () => {
    const f = flattenCurve((t) => ({ x: 3 * t, y: 4 * t }), 0, 1);
    expect(f.length).toBeCloseTo(5, 12);
    expect(f.minRadius).toBe(Infinity);
    expect(f.startDir.x).toBeCloseTo(0.6, 9);
    expect(f.endDir.y).toBeCloseTo(0.8, 9);
  });
});
