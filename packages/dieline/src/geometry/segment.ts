import { flattenCurve, type PointAt } from './flatten';
import { apply, type Matrix, similarityScale, determinant } from './matrix';
import { dist, distToSegment, type Pt } from './vec';

/** Every segment may carry its box once computed (see bbox); made with it unset, so one shape. */
interface Boxed {
  box?: Box;
}

export interface LineSeg extends Boxed {
  kind: 'line';
  a: Pt;
  b: Pt;
}

/** A circular arc: centre, radius, start angle and signed sweep in radians (|sweep| ≤ 2π). */
export interface ArcSeg extends Boxed {
  kind: 'arc';
  a: Pt;
  b: Pt;
  center: Pt;
  r: number;
  start: number;
  sweep: number;
}

/** Any other curve (ellipse, spline, Bézier), kept as its flattening with measured properties. */
export interface CurveSeg extends Boxed {
  kind: 'curve';
  a: Pt;
  b: Pt;
  points: Pt[];
  length: number;
  minRadius: number;
  startDir: Pt;
  endDir: Pt;
}

export type Segment = LineSeg | ArcSeg | CurveSeg;

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export const TAU = 2 * Math.PI;

export function line(a: Pt, b: Pt): LineSeg {
  return { kind: 'line', a, b, box: undefined };
}

const onCircle = (c: Pt, r: number, angle: number): Pt => ({
  x: c.x + r * Math.cos(angle),
  y: c.y + r * Math.sin(angle),
});

export function arc(center: Pt, r: number, start: number, sweep: number): ArcSeg {
  // A sweep within a hair of a full turn is a full circle.
  const s = Math.abs(sweep) >= TAU - 1e-9 ? Math.sign(sweep) * TAU : sweep;
  const a = onCircle(center, r, start);
  // A full circle ends where it starts, exactly, so its two ends meet.
  const b = Math.abs(s) === TAU ? a : onCircle(center, r, start + s);
  return { kind: 'arc', a, b, center, r, start, sweep: s, box: undefined };
}

export function curve(p: PointAt, t0: number, t1: number): CurveSeg {
  const f = flattenCurve(p, t0, t1);
  const a = f.points[0]!;
  const b = f.points[f.points.length - 1]!;
  return {
    kind: 'curve',
    a,
    b,
    points: f.points,
    length: f.length,
    minRadius: f.minRadius,
    startDir: f.startDir,
    endDir: f.endDir,
    box: undefined,
  };
}

/** A circular arc drawn under an affine transform: an arc again under a similarity, else a curve. */
export function transformedArc(m: Matrix, center: Pt, r: number, start: number, sweep: number): Segment {
  const k = similarityScale(m);
  if (k !== null) {
    const c = apply(m, center);
    // The start point on the circle, placed (as apply(m, onCircle(...)), in plain numbers).
    const x = center.x + r * Math.cos(start);
    const y = center.y + r * Math.sin(start);
    const px = m.a * x + m.c * y + m.e;
    const py = m.b * x + m.d * y + m.f;
    const mirrored = determinant(m) < 0;
    return arc(c, r * k, Math.atan2(py - c.y, px - c.x), mirrored ? -sweep : sweep);
  }
  return curve((t) => apply(m, onCircle(center, r, t)), start, start + sweep);
}

export function length(s: Segment): number {
  switch (s.kind) {
    case 'line':
      return dist(s.a, s.b);
    case 'arc':
      return s.r * Math.abs(s.sweep); // arc length rθ
    case 'curve':
      return s.length;
  }
}

/** Unit direction of travel at the start (end = 'a') or at the end (end = 'b'). */
export function direction(s: Segment, end: 'a' | 'b'): Pt {
  return directionInto(s, end, { x: 0, y: 0 });
}

/** direction(), written into `out` (for loops over every vertex that need no new object). */
export function directionInto(s: Segment, end: 'a' | 'b', out: Pt): Pt {
  switch (s.kind) {
    case 'line': {
      const l = dist(s.a, s.b);
      out.x = l === 0 ? 0 : (s.b.x - s.a.x) / l;
      out.y = l === 0 ? 0 : (s.b.y - s.a.y) / l;
      return out;
    }
    case 'arc': {
      const angle = end === 'a' ? s.start : s.start + s.sweep;
      const sign = Math.sign(s.sweep);
      out.x = -Math.sin(angle) * sign;
      out.y = Math.cos(angle) * sign;
      return out;
    }
    case 'curve': {
      const d = end === 'a' ? s.startDir : s.endDir;
      out.x = d.x;
      out.y = d.y;
      return out;
    }
  }
}

/** Is `angle` inside the arc's sweep? */
export function arcContains(s: ArcSeg, angle: number): boolean {
  if (Math.abs(s.sweep) >= TAU) return true;
  const lo = s.sweep >= 0 ? s.start : s.start + s.sweep;
  const off = (((angle - lo) % TAU) + TAU) % TAU;
  return off <= Math.abs(s.sweep);
}

/** The segment's bounding box (arcs include the axis points they pass). Computed once. */
export function bbox(s: Segment): Box {
  return (s.box ??= computeBox(s));
}

const AXIS_X = [1, 0, -1, 0];
const AXIS_Y = [0, 1, 0, -1];

function computeBox(s: Segment): Box {
  if (s.kind === 'curve') {
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    for (const p of s.points) {
      if (p.x < minX) minX = p.x;
      if (p.y < minY) minY = p.y;
      if (p.x > maxX) maxX = p.x;
      if (p.y > maxY) maxY = p.y;
    }
    return { minX, minY, maxX, maxY };
  }
  const { a, b } = s;
  let minX = b.x < a.x ? b.x : a.x;
  let minY = b.y < a.y ? b.y : a.y;
  let maxX = b.x > a.x ? b.x : a.x;
  let maxY = b.y > a.y ? b.y : a.y;
  if (s.kind === 'arc') {
    // The extremes of a circle are at 0, 90, 180 and 270 degrees; add those the arc passes.
    for (let k = 0; k < 4; k++) {
      if (!arcContains(s, (k * Math.PI) / 2)) continue;
      const x = s.center.x + s.r * AXIS_X[k]!;
      const y = s.center.y + s.r * AXIS_Y[k]!;
      minX = Math.min(minX, x);
      minY = Math.min(minY, y);
      maxX = Math.max(maxX, x);
      maxY = Math.max(maxY, y);
    }
  }
  return { minX, minY, maxX, maxY };
}

/** Shortest distance from p to the segment. */
export function distanceTo(s: Segment, p: Pt): number {
  switch (s.kind) {
    case 'line':
      return distToSegment(p, s.a, s.b);
    case 'arc': {
      const angle = Math.atan2(p.y - s.center.y, p.x - s.center.x);
      if (arcContains(s, angle)) return Math.abs(dist(p, s.center) - s.r);
      return Math.min(dist(p, s.a), dist(p, s.b));
    }
    case 'curve': {
      let best = Infinity;
      for (let i = 1; i < s.points.length; i++) best = Math.min(best, distToSegment(p, s.points[i - 1]!, s.points[i]!));
      return best;
    }
  }
}

/** A point halfway along the segment (by parameter for arcs, by vertex for curves). */
export function midpoint(s: Segment): Pt {
  switch (s.kind) {
    case 'line':
      return { x: (s.a.x + s.b.x) / 2, y: (s.a.y + s.b.y) / 2 };
    case 'arc':
      return onCircle(s.center, s.r, s.start + s.sweep / 2);
    case 'curve':
      return s.points[Math.floor(s.points.length / 2)]!;
  }
}
