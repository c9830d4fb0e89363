export interface Pt {
  x: number;
  y: number;
}

export const pt = (x: number, y: number): Pt => ({ x, y });
export const sub = (a: Pt, b: Pt): Pt => ({ x: a.x - b.x, y: a.y - b.y });
/**
 * √(x² + y²), bit for bit what Math.hypot(x, y) gives on V8 (its math.tq: scale by the larger
 * magnitude, then a Kahan sum, whose correction after the first of two terms is always 0),
 * without the array Math.hypot allocates on every call, which made it the analysis's hottest
 * allocation. Checked against Math.hypot in vec.test.ts.
 */
export function hypot(x: number, y: number): number {
  const ax = Math.abs(x);
  const ay = Math.abs(y);
  if (ax === Infinity || ay === Infinity) return Infinity;
  if (Number.isNaN(ax) || Number.isNaN(ay)) return NaN;
  const max = ax > ay ? ax : ay;
  if (max === 0) return 0;
  const nx = ax / max;
  const ny = ay / max;
  return Math.sqrt(nx * nx + ny * ny) * max;
}

export const dist = (a: Pt, b: Pt): number => hypot(a.x - b.x, a.y - b.y);
export const dot = (a: Pt, b: Pt): number => a.x * b.x + a.y * b.y;
export const cross = (a: Pt, b: Pt): number => a.x * b.y - a.y * b.x;

export function unit(v: Pt): Pt {
  const l = hypot(v.x, v.y);
  return l === 0 ? { x: 0, y: 0 } : { x: v.x / l, y: v.y / l };
}

/** Unsigned angle in radians between two direction vectors, 0..π. */
export function angleBetween(a: Pt, b: Pt): number {
  return Math.abs(Math.atan2(cross(a, b), dot(a, b)));
}

/** Distance from p to the segment a–b (in plain numbers: it runs for every candidate pair). */
export function distToSegment(p: Pt, a: Pt, b: Pt): number {
  const abx = b.x - a.x;
  const aby = b.y - a.y;
  const l2 = abx * abx + aby * aby;
  if (l2 === 0) return dist(p, a);
  const t = Math.max(0, Math.min(1, ((p.x - a.x) * abx + (p.y - a.y) * aby) / l2));
  return hypot(p.x - (a.x + t * abx), p.y - (a.y + t * aby));
}
