import type { Pt } from './vec';

/**
 * A B-spline (NURBS when weights are given) as a point function, evaluated with de Boor's
 * algorithm over the knot domain [knots[p], knots[n]] for n control points of degree p.
 * Throws when the knot vector does not fit (it must hold n + p + 1 non-decreasing values).
 */
export function bspline(degree: number, control: Pt[], knots: number[], weights?: number[]) {
  const n = control.length;
  const p = degree;
  if (!Number.isInteger(p) || p < 1) throw new Error(`degree ${degree} is not a positive whole number`);
  if (n < p + 1) throw new Error(`${n} control points are too few for degree ${p}`);
  if (knots.length !== n + p + 1)
    throw new Error(`${knots.length} knots do not fit ${n} control points of degree ${p} (need ${n + p + 1})`);
  for (let i = 1; i < knots.length; i++) if (knots[i]! < knots[i - 1]!) throw new Error('knots are not in order');
  const w = weights && weights.length === n ? weights : control.map(() => 1);
  const t0 = knots[p]!;
  const t1 = knots[n]!;
  if (!(t1 > t0)) throw new Error('the knot domain is empty');

  const at = (t: number): Pt => {
    const u = Math.min(Math.max(t, t0), t1);
    // The knot span k with knots[k] ≤ u < knots[k+1], kept inside [p, n − 1].
    let k = p;
    while (k < n - 1 && u >= knots[k + 1]!) k++;
    const d: Array<[number, number, number]> = [];
    for (let j = 0; j <= p; j++) {
      const c = control[j + k - p]!;
      const wj = w[j + k - p]!;
      d.push([c.x * wj, c.y * wj, wj]);
    }
    for (let r = 1; r <= p; r++) {
      for (let j = p; j >= r; j--) {
        const lo = knots[j + k - p]!;
        const hi = knots[j + 1 + k - r]!;
        const alpha = hi === lo ? 0 : (u - lo) / (hi - lo);
        const a = d[j - 1]!;
        const b = d[j]!;
        d[j] = [
          (1 - alpha) * a[0] + alpha * b[0],
          (1 - alpha) * a[1] + alpha * b[1],
          (1 - alpha) * a[2] + alpha * b[2],
        ];
      }
    }
    const [x, y, h] = d[p]!;
    return { x: x / h, y: y / h };
  };
  return { at, t0, t1 };
}
