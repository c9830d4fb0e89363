import { describe, expect, it } from 'vitest';
import { apply, multiply, rotate, scale, similarityScale, translate } from './matrix';

describe('matrix', () => {
  // W3C SVG 1.1 7.5: transform="translate(10 0) scale(2)" maps (1,1) to (10 + 2, 0 + 2) = (12, 2):
  // the rightmost transform applies first.
  it('applies the right-hand factor first', () => {
    const p = apply(multiply(translate(10, 0), scale(2)), { x: 1, y: 1 });
    expect(p).toEqual({ x: 12, y: 2 });
  });

  // Rotation by 90°: (1, 0) → (cos 90°, sin 90°) = (0, 1).
  it('rotates counter-clockwise for positive angles', () => {
    const p = apply(rotate(Math.PI / 2), { x: 1, y: 0 });
    expect(p.x).toBeCloseTo(0, 12);
    expect(p.y).toBeCloseTo(1, 12);
  });

  it('finds the scale of similarities only', () => {
    expect(similarityScale(multiply(rotate(0.3), scale(2)))).toBeCloseTo(2, 12);
    expect(similarityScale(scale(-3, 3))).toBeCloseTo(3, 12); // a mirror keeps circles round
    expect(similarityScale(scale(2, 1))).toBeNull();
  });
});
