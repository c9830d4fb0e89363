import { cross, dist, type Pt, sub, unit } from './vec';

/** A plane curve given by a point function over a parameter range. */
export type PointAt = (t: number) => Pt;

export interface FlatCurve {
  points: Pt[];
  length: number;
  /** Smallest radius of curvature found along the curve (Infinity for a straight curve). */
  minRadius: number;
  /** Unit direction of travel at the start and at the end. */
  startDir: Pt;
  endDir: Pt;
}

const MIN_DEPTH = 4; // at least 16 pieces, so a curve that doubles back is not taken for a chord
const MAX_DEPTH = 18;
const RELATIVE_TOLERANCE = 1e-5;

/**
 * Adaptive flattening: halve each piece until the two half-chords are longer than the chord by
 * less than a tolerance relative to the curve's size. The polyline length error falls with the
 * square of the piece size, so one Richardson step L2 + (L2 − L1)/3 per piece gives a length far
 * inside 0.1 %.
 */
export function flattenCurve(p: PointAt, t0: number, t1: number): FlatCurve {
  const size = roughSize(p, t0, t1);
  const tol = Math.max(size * RELATIVE_TOLERANCE, 1e-12);
  const points: Pt[] = [p(t0)];
  const params: number[] = [t0];
  let length = 0;
  // Iterative depth-first halving, left piece first, so the points come out in order.
  const stack: Array<[number, number, Pt, Pt, number]> = [[t0, t1, p(t0), p(t1), 0]];
  while (stack.length > 0) {
    const [a, b, pa, pb, depth] = stack.pop()!;
    const m = (a + b) / 2;
    const pm = p(m);
    const chord = dist(pa, pb);
    const halves = dist(pa, pm) + dist(pm, pb);
    if ((depth >= MIN_DEPTH && halves - chord <= tol) || depth >= MAX_DEPTH) {
      length += halves + (halves - chord) / 3;
      points.push(pm, pb);
      params.push(m, b);
    } else {
      stack.push([m, b, pm, pb, depth + 1], [a, m, pa, pm, depth + 1]);
    }
  }
  return {
    points,
    length,
    // Radii a million times the curve's size are rounding noise on a straight curve.
    minRadius: ((r) => (r > 1e6 * size ? Infinity : r))(smallestRadius(p, params, t0, t1)),
    startDir: direction(p, t0, t1, 1),
    endDir: direction(p, t1, t0, -1),
  };
}

function roughSize(p: PointAt, t0: number, t1: number): number {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i <= 16; i++) {
    const q = p(t0 + ((t1 - t0) * i) / 16);
    minX = Math.min(minX, q.x);
    minY = Math.min(minY, q.y);
    maxX = Math.max(maxX, q.x);
    maxY = Math.max(maxY, q.y);
  }
  return Math.hypot(maxX - minX, maxY - minY);
}

/** Direction of travel at t, stepping towards `towards`; `sign` turns a backward step forward. */
function direction(p: PointAt, t: number, towards: number, sign: 1 | -1): Pt {
  const here = p(t);
  for (const f of [1e-7, 1e-5, 1e-3, 1e-1, 1]) {
    const v = sub(p(t + (towards - t) * f), here);
    if (Math.hypot(v.x, v.y) > 0) return unit({ x: sign * v.x, y: sign * v.y });
  }
  return { x: 0, y: 0 };
}

/** Radius of curvature |p'|³ / |p' × p''| by central differences (one-sided at the ends). */
function radiusAt(p: PointAt, t: number, t0: number, t1: number): number {
  const span = Math.abs(t1 - t0);
  const h = span * 1e-4;
  const lo = Math.min(t0, t1);
  const hi = Math.max(t0, t1);
  const c = Math.min(Math.max(t, lo + h), hi - h);
  const pm = p(c - h);
  const p0 = p(c);
  const pp = p(c + h);
  const d1 = { x: (pp.x - pm.x) / (2 * h), y: (pp.y - pm.y) / (2 * h) };
  const d2 = { x: (pp.x - 2 * p0.x + pm.x) / (h * h), y: (pp.y - 2 * p0.y + pm.y) / (h * h) };
  const k = Math.abs(cross(d1, d2));
  const speed = Math.hypot(d1.x, d1.y);
  if (k === 0 || speed === 0) return speed === 0 ? 0 : Infinity;
  return (speed * speed * speed) / k;
}

/** Samples the radius at every flattening parameter, then refines around the smallest. */
function smallestRadius(p: PointAt, params: number[], t0: number, t1: number): number {
  let best = Infinity;
  let bestIndex = 0;
  params.forEach((t, i) => {
    const r = radiusAt(p, t, t0, t1);
    if (r < best) {
      best = r;
      bestIndex = i;
    }
  });
  // Golden-section search between the neighbours of the best sample.
  let a = params[Math.max(0, bestIndex - 1)]!;
  let b = params[Math.min(params.length - 1, bestIndex + 1)]!;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 40 && Math.abs(b - a) > 1e-12 * Math.abs(t1 - t0); i++) {
    const x1 = b - g * (b - a);
    const x2 = a + g * (b - a);
    if (radiusAt(p, x1, t0, t1) < radiusAt(p, x2, t0, t1)) b = x2;
    else a = x1;
  }
  return Math.min(best, radiusAt(p, (a + b) / 2, t0, t1));
}
