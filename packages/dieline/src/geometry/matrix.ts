import { hypot, type Pt } from './vec';

/**
 * 2D affine transform [a c e; b d f; 0 0 1], the same layout as SVG's matrix(a b c d e f)
 * (W3C SVG 1.1, 7.4 "The transform attribute"): x' = a·x + c·y + e, y' = b·x + d·y + f.
 */
export interface Matrix {
  a: number;
  b: number;
  c: number;
  d: number;
  e: number;
  f: number;
}

export const IDENTITY: Matrix = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

/** m·n: n applies first, then m. */
export function multiply(m: Matrix, n: Matrix): Matrix {
  return {
    a: m.a * n.a + m.c * n.b,
    b: m.b * n.a + m.d * n.b,
    c: m.a * n.c + m.c * n.d,
    d: m.b * n.c + m.d * n.d,
    e: m.a * n.e + m.c * n.f + m.e,
    f: m.b * n.e + m.d * n.f + m.f,
  };
}

export const translate = (x: number, y: number): Matrix => ({ a: 1, b: 0, c: 0, d: 1, e: x, f: y });
export const scale = (sx: number, sy = sx): Matrix => ({ a: sx, b: 0, c: 0, d: sy, e: 0, f: 0 });
export function rotate(radians: number): Matrix {
  const c = Math.cos(radians);
  const s = Math.sin(radians);
  return { a: c, b: s, c: -s, d: c, e: 0, f: 0 };
}

export function apply(m: Matrix, p: Pt): Pt {
  return { x: m.a * p.x + m.c * p.y + m.e, y: m.b * p.x + m.d * p.y + m.f };
}

/** Applies only the linear part (for direction vectors). */
export function applyLinear(m: Matrix, v: Pt): Pt {
  return { x: m.a * v.x + m.c * v.y, y: m.b * v.x + m.d * v.y };
}

export const determinant = (m: Matrix): number => m.a * m.d - m.b * m.c;

/**
 * The uniform scale factor when m maps circles to circles (a rotation, a uniform scale and
 * maybe a mirror), else null.
 */
export function similarityScale(m: Matrix): number | null {
  const sx = hypot(m.a, m.b);
  const sy = hypot(m.c, m.d);
  const orthogonal = Math.abs(m.a * m.c + m.b * m.d) <= 1e-9 * sx * sy;
  return orthogonal && Math.abs(sx - sy) <= 1e-9 * Math.max(sx, sy) ? sx : null;
}

export function toSvgMatrix(m: Matrix): string {
  return `matrix(${m.a} ${m.b} ${m.c} ${m.d} ${m.e} ${m.f})`;
}
