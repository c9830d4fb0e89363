import { describe, expect, it } from 'vitest';
import { multiply, rotate, scale, translate } from './matrix';
import { gaussKummer } from '../../fixtures/reference';
import { arc, bbox, direction, distanceTo, length, line, TAU, transformedArc } from './segment';

describe('segments', () => {
  // Geometry: arc length rθ; a full circle is 2πr.
  it('measures arcs as r·θ', () => {
    expect(length(arc({ x: 0, y: 0 }, 2, 0, Math.PI / 3))).toBeCloseTo((2 * Math.PI) / 3, 12);
    expect(length(arc({ x: 5, y: 5 }, 0.5, 1, TAU))).toBeCloseTo(Math.PI, 12);
  });

  // A 3-4-5 triangle: the hypotenuse from (0,0) to (3,4) is 5 long.
  it('measures lines', () => {
    expect(length(line({ x: 0, y: 0 }, { x: 3, y: 4 }))).toBe(5);
  });

  // The upper half of the unit circle spans x −1..1 and y 0..1 (its top at 90°).
  it('boxes arcs by the axis points they pass', () => {
    expect(bbox(arc({ x: 0, y: 0 }, 1, 0, Math.PI))).toMatchObject({ minX: -1, maxX: 1, minY: 0 });
    expect(bbox(arc({ x: 0, y: 0 }, 1, 0, Math.PI)).maxY).toBeCloseTo(1, 12);
    const quarter = bbox(arc({ x: 0, y: 0 }, 1, 0.1, 0.2));
    expect(quarter.maxX).toBeCloseTo(Math.cos(0.1), 12);
  });

  it('gives the distance to an arc from inside and outside its sweep', () => {
    const a = arc({ x: 0, y: 0 }, 1, 0, Math.PI / 2);
    expect(distanceTo(a, { x: 0, y: 2 })).toBeCloseTo(1, 12); // radially above 90°
    expect(distanceTo(a, { x: 0, y: -1 })).toBeCloseTo(Math.SQRT2, 12); // nearest is the end (1,0)
  });

  // The tangent of a counter-clockwise arc at angle 0 points along +y; clockwise along −y.
  it('gives the direction of travel on arcs', () => {
    expect(direction(arc({ x: 0, y: 0 }, 1, 0, 1), 'a').y).toBeCloseTo(1, 12);
    expect(direction(arc({ x: 0, y: 0 }, 1, 0, -1), 'a').y).toBeCloseTo(-1, 12);
  });

  it('keeps arcs exact under similarities and mirrors', () => {
    const m = multiply(translate(1, 2), multiply(rotate(0.7), scale(-2, 2)));
    const s = transformedArc(m, { x: 0, y: 0 }, 1, 0, Math.PI / 2);
    expect(s.kind).toBe('arc');
    expect(length(s)).toBeCloseTo(Math.PI, 12); // r 2 × θ π/2
    if (s.kind === 'arc') expect(s.sweep).toBeCloseTo(-Math.PI / 2, 12); // mirrored: turns the other way
  });

  // Under scale(2, 1) the unit circle becomes an ellipse with a = 2, b = 1. Its perimeter by the
  // Gauss–Kummer series π(a+b)·Σ (½ choose n)² hⁿ, h = ((a−b)/(a+b))² = 1/9, is 9.688448220547…
  it('turns arcs into measured curves under uneven scales', () => {
    const s = transformedArc(scale(2, 1), { x: 0, y: 0 }, 1, 0, TAU);
    expect(s.kind).toBe('curve');
    expect(Math.abs(length(s) / gaussKummer(2, 1) - 1)).toBeLessThan(1e-6);
  });
});
