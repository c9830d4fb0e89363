import { curve, line, type Segment } from './segment';
import { distToSegment, type Pt } from './vec';

/** A Bézier curve of any degree by de Casteljau; straight when its controls lie on the chord. */
export function bezier(p: Pt[]): Segment {
  const first = p[0]!;
  const last = p[p.length - 1]!;
  const size = Math.max(...p.map((q) => Math.hypot(q.x - first.x, q.y - first.y)));
  if (p.every((q) => distToSegment(q, first, last) <= 1e-9 * size)) return line(first, last);
  return curve(pointAt(p), 0, 1);
}

/** The curve's point function: the Bernstein form for cubics (the common case), else de Casteljau. */
function pointAt(p: Pt[]): (t: number) => Pt {
  if (p.length === 4) {
    const [a, b, c, d] = p as [Pt, Pt, Pt, Pt];
    return (t) => {
      const u = 1 - t;
      const k0 = u * u * u;
      const k1 = 3 * u * u * t;
      const k2 = 3 * u * t * t;
      const k3 = t * t * t;
      return { x: k0 * a.x + k1 * b.x + k2 * c.x + k3 * d.x, y: k0 * a.y + k1 * b.y + k2 * c.y + k3 * d.y };
    };
  }
  return (t) => {
    let q = p;
    while (q.length > 1)
      q = q.slice(1).map((b, i) => ({ x: q[i]!.x + (b.x - q[i]!.x) * t, y: q[i]!.y + (b.y - q[i]!.y) * t }));
    return q[0]!;
  };
}
