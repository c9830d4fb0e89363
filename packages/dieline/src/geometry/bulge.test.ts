import { describe, expect, it } from 'vitest';
import { bulgeArc } from './bulge';

describe('bulgeArc', () => {
  // DXF reference (LWPOLYLINE group 42): bulge = tan(θ/4). A bulge of 1 is tan(180°/4) = 1, a
  // semicircle: for the chord (0,0)–(2,0) the centre is (1,0), r = 1, length πr = π.
  it('reads a bulge of 1 as a counter-clockwise semicircle', () => {
    const a = bulgeArc({ x: 0, y: 0 }, { x: 2, y: 0 }, 1);
    expect(a.center.x).toBeCloseTo(1, 12);
    expect(a.center.y).toBeCloseTo(0, 12);
    expect(a.r).toBeCloseTo(1, 12);
    expect(a.sweep).toBeCloseTo(Math.PI, 12);
    expect(a.r * Math.abs(a.sweep)).toBeCloseTo(Math.PI, 12); // arc length rθ
    // Counter-clockwise from angle π (the start point, left of the centre) through −π/2: the
    // arc passes below the chord, the right-hand side travelling from (0,0) to (2,0).
    expect(Math.cos(a.start)).toBeCloseTo(-1, 12);
  });

  // Quarter circle: θ = 90°, bulge = tan(22.5°) = √2 − 1. Chord (1,0)–(0,1) on the unit circle
  // about the origin: r = c / (2 sin 45°) = √2 / √2 = 1, centre (0,0).
  it('reads tan(22.5°) as a quarter circle', () => {
    const a = bulgeArc({ x: 1, y: 0 }, { x: 0, y: 1 }, Math.SQRT2 - 1);
    expect(a.r).toBeCloseTo(1, 12);
    expect(a.center.x).toBeCloseTo(0, 12);
    expect(a.center.y).toBeCloseTo(0, 12);
    expect(a.sweep).toBeCloseTo(Math.PI / 2, 12);
  });

  // A negative bulge turns clockwise: the same quarter the other way round has its centre at (1,1).
  it('reads a negative bulge as clockwise', () => {
    const a = bulgeArc({ x: 1, y: 0 }, { x: 0, y: 1 }, -(Math.SQRT2 - 1));
    expect(a.sweep).toBeCloseTo(-Math.PI / 2, 12);
    expect(a.center.x).toBeCloseTo(1, 12);
    expect(a.center.y).toBeCloseTo(1, 12);
  });
});
