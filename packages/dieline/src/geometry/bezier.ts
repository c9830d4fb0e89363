import { curve, line, type Segment } from './segment';
import { distToSegment, type Pt } from './vec';

/** A Bézier curve of any degree by de Casteljau; straight when its controls lie on the chord. */
export function bezier(p: Pt[]): Segment {
  const first = p[0]!;
  const last = p[p.length - 1]!;
  const size = Math.max(...p.map((q) => Math.hypot(q.x - first.x, q.y - first.y)));
  if (p.every((q) => distToSegment(q, first, last) <= 1e-9 * size)) return line(first, last);
  return curve(
    (t) => {
      let q = p;
      while (q.length > 1)
        q = q.slice(1).map((b, i) => ({ x: q[i]!.x + (b.x - q[i]!.x) * t, y: q[i]!.y + (b.y - q[i]!.y) * t }));
      return q[0]!;
    },
    0,
    1,
  );
}
