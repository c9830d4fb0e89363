import type { IEntity, IPoint } from 'dxf-parser';
import { bspline } from '../geometry/bspline';
import { bulgeArc } from '../geometry/bulge';
import { apply, type Matrix, multiply, scale } from '../geometry/matrix';
import { curve, line, type Segment, TAU, transformedArc } from '../geometry/segment';
import type { Pt } from '../geometry/vec';

/** The segments of one drawing entity, or a reason it was skipped. */
export type EntityGeometry = { segments: Segment[]; closed: boolean } | { problem: string };

/** The entity fields this reader uses; dxf-parser's types mark none of them optional. */
interface Fields extends IEntity {
  vertices?: Array<IPoint & { bulge?: number; splineControlPoint?: boolean }>;
  center?: IPoint;
  radius?: number;
  startAngle?: number;
  endAngle?: number;
  extrusionDirectionZ?: number;
  extrusionDirection?: IPoint;
  shape?: boolean;
  majorAxisEndPoint?: IPoint;
  axisRatio?: number;
  controlPoints?: IPoint[];
  fitPoints?: IPoint[];
  knotValues?: number[];
  degreeOfSplineCurve?: number;
  rational?: boolean;
  closed?: boolean;
  is3dPolygonMesh?: boolean;
  isPolyfaceMesh?: boolean;
}

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function point(p: IPoint | undefined): Pt | null {
  return isPoint(p) ? { x: p.x, y: p.y } : null;
}

/** A parsed point with finite x and y, used as it is (transforms read only x and y). */
function isPoint(p: IPoint | undefined): p is IPoint {
  return p !== undefined && p !== null && finite(p.x) && finite(p.y);
}

/** Counter-clockwise sweep from start to end, in (0, 2π]; equal angles make a full turn. */
function ccwSweep(start: number, end: number): number {
  const s = (((end - start) % TAU) + TAU) % TAU;
  return s === 0 ? TAU : s;
}

/**
 * Entities whose extrusion direction is (0, 0, −1) are drawn in an object coordinate system
 * mirrored in x (DXF reference, "Arbitrary Axis Algorithm": for N = (0, 0, −1) the OCS x axis
 * is (−1, 0, 0)). Other tilted extrusions are not plane dielines and are read as if flat.
 */
function ocs(m: Matrix, e: Fields): Matrix {
  const z = e.extrusionDirectionZ ?? e.extrusionDirection?.z;
  return finite(z) && z < 0 ? multiply(m, scale(-1, 1)) : m;
}

/** Lines, arcs and curves of one non-INSERT entity under the transform m. */
export function entityGeometry(entity: IEntity, m: Matrix): EntityGeometry | null {
  const e = entity as Fields;
  switch (e.type) {
    case 'LINE': {
      const a = e.vertices?.[0];
      const b = e.vertices?.[1];
      if (!isPoint(a) || !isPoint(b)) return { problem: 'a LINE without two end points' };
      return { segments: [line(apply(m, a), apply(m, b))], closed: false };
    }
    case 'ARC':
    case 'CIRCLE': {
      const c = point(e.center);
      if (!c || !finite(e.radius) || e.radius <= 0)
        return { problem: `a ${e.type} without a centre and a positive radius` };
      let start = 0;
      let sweep = TAU;
      if (e.type === 'ARC') {
        if (!finite(e.startAngle) || !finite(e.endAngle)) return { problem: 'an ARC without start and end angles' };
        start = e.startAngle; // dxf-parser gives radians
        sweep = ccwSweep(e.startAngle, e.endAngle);
      }
      return { segments: [transformedArc(ocs(m, e), c, e.radius, start, sweep)], closed: e.type === 'CIRCLE' };
    }
    case 'LWPOLYLINE':
    case 'POLYLINE':
      return polyline(e, e.type === 'POLYLINE' ? m : ocs(m, e));
    case 'ELLIPSE':
      return ellipse(e, m);
    case 'SPLINE':
      return spline(e, m);
    default:
      return null;
  }
}

function polyline(e: Fields, m: Matrix): EntityGeometry {
  if (e.is3dPolygonMesh || e.isPolyfaceMesh) return { problem: `a ${e.type} mesh` };
  // Spline-fit POLYLINEs repeat their frame as control points; the fitted vertices are the curve.
  const all = e.vertices ?? [];
  const vertices = all.some((v) => v.splineControlPoint) ? all.filter((v) => !v.splineControlPoint) : all;
  if (!vertices.every(isPoint)) return { problem: `a ${e.type} with an invalid vertex` };
  if (vertices.length < 2) return { problem: `a ${e.type} with fewer than two vertices` };
  const closed = e.shape === true;
  // Each vertex is placed once; the lines meeting there share the point.
  const placed = vertices.map((v) => apply(m, v));
  const segments: Segment[] = [];
  const count = closed ? vertices.length : vertices.length - 1;
  for (let i = 0; i < count; i++) {
    const j = (i + 1) % vertices.length;
    const from = vertices[i]!;
    const to = vertices[j]!;
    const bulge = finite(from.bulge) ? from.bulge : 0;
    if (bulge === 0 || (from.x === to.x && from.y === to.y)) {
      segments.push(line(placed[i]!, placed[j]!));
    } else {
      const a = bulgeArc(from, to, bulge);
      segments.push(transformedArc(m, a.center, a.r, a.start, a.sweep));
    }
  }
  return { segments, closed };
}

function ellipse(e: Fields, m: Matrix): EntityGeometry {
  const c = point(e.center);
  const major = point(e.majorAxisEndPoint);
  const ratio = e.axisRatio;
  if (!c || !major || !finite(ratio) || ratio <= 0 || (major.x === 0 && major.y === 0)) {
    return { problem: 'an ELLIPSE without a centre, major axis and axis ratio' };
  }
  const t0 = finite(e.startAngle) ? e.startAngle : 0;
  const sweep = ccwSweep(t0, finite(e.endAngle) ? e.endAngle : TAU);
  const full = sweep === TAU;
  const em = ocs(m, e);
  if (Math.abs(ratio - 1) < 1e-12) {
    // A circle written as an ellipse: an exact arc. Its parameter is the angle from the major axis.
    const r = Math.hypot(major.x, major.y);
    return { segments: [transformedArc(em, c, r, Math.atan2(major.y, major.x) + t0, sweep)], closed: full };
  }
  // DXF reference (ELLIPSE): P(t) = centre + major·cos t + minor·sin t, minor = ratio × major turned 90°.
  const minor = { x: -major.y * ratio, y: major.x * ratio };
  const at = (t: number) =>
    apply(em, {
      x: c.x + major.x * Math.cos(t) + minor.x * Math.sin(t),
      y: c.y + major.y * Math.cos(t) + minor.y * Math.sin(t),
    });
  return { segments: [curve(at, t0, t0 + sweep)], closed: full };
}

function spline(e: Fields, m: Matrix): EntityGeometry {
  const control = (e.controlPoints ?? []).map(point);
  if (control.length === 0) {
    const fit = (e.fitPoints ?? []).map(point);
    if (fit.length < 2 || fit.some((p) => !p)) return { problem: 'a SPLINE without control points' };
    // Only fit points: joined by straight lines (the tangents that would shape them are not used).
    const pts = (fit as Pt[]).map((p) => apply(m, p));
    return { segments: pts.slice(1).map((p, i) => line(pts[i]!, p)), closed: e.closed === true };
  }
  if (control.some((p) => !p)) return { problem: 'a SPLINE with an invalid control point' };
  const degree = finite(e.degreeOfSplineCurve) ? e.degreeOfSplineCurve : 3;
  try {
    const s = bspline(degree, control as Pt[], e.knotValues ?? []);
    return { segments: [curve((t) => apply(m, s.at(t)), s.t0, s.t1)], closed: false };
  } catch (err) {
    return { problem: `a SPLINE whose ${(err as Error).message}` };
  }
}
