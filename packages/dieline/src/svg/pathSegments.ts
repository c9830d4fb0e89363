import svgpath from 'svgpath';
import { arc, curve, line, type Segment } from '../geometry/segment';
import { ellipsePoint, type EllipseArc, svgArcToCenter } from '../geometry/svgArc';
import { bezier } from '../geometry/bezier';
import type { Pt } from '../geometry/vec';

export interface Subpath {
  segments: Segment[];
  closed: boolean;
}

export interface PathResult {
  subpaths: Subpath[];
  /** The path data's syntax error, if any (SVG draws the path up to it). */
  error?: string;
}

/**
 * Path data under a transform list, as subpaths of lines, arcs and curves. svgpath parses the
 * data, makes it absolute, expands the shorthand commands and applies the transforms (arcs
 * stay exact elliptical arcs under any affine transform).
 */
export function pathSegments(d: string, transform: string): PathResult {
  const path = svgpath(d).abs().unshort().transform(transform).abs().unshort();
  const error = (path as unknown as { err?: string }).err || undefined;
  const subpaths: Subpath[] = [];
  let current: Segment[] = [];
  let start: Pt = { x: 0, y: 0 };
  let pending: EllipseArc | null = null;

  const flushEllipse = () => {
    if (!pending) return;
    const e = pending;
    pending = null;
    // svgpath's transformed radii carry rounding of about 1e-8; closer than 1e-6 is a circle.
    if (Math.abs(e.rx - e.ry) <= 1e-6 * Math.max(e.rx, e.ry)) {
      // A circular arc: its angles are the ellipse parameter turned by the axis rotation.
      current.push(arc(e.center, (e.rx + e.ry) / 2, e.theta1 + e.phi, e.dtheta));
    } else {
      current.push(curve((t) => ellipsePoint(e, t), e.theta1, e.theta1 + e.dtheta));
    }
  };
  const push = (s: Segment) => {
    flushEllipse();
    current.push(s);
  };
  const endSubpath = (closed: boolean) => {
    flushEllipse();
    if (current.length > 0) subpaths.push({ segments: current, closed });
    current = [];
  };

  path.iterate((seg, _i, x, y) => {
    const here = { x, y };
    switch (seg[0]) {
      case 'M':
        endSubpath(false);
        start = { x: seg[1], y: seg[2] };
        break;
      case 'L':
        push(line(here, { x: seg[1], y: seg[2] }));
        break;
      case 'H':
        push(line(here, { x: seg[1], y }));
        break;
      case 'V':
        push(line(here, { x, y: seg[1] }));
        break;
      case 'C':
        push(bezier([here, { x: seg[1], y: seg[2] }, { x: seg[3], y: seg[4] }, { x: seg[5], y: seg[6] }]));
        break;
      case 'Q':
        push(bezier([here, { x: seg[1], y: seg[2] }, { x: seg[3], y: seg[4] }]));
        break;
      case 'A': {
        const to = { x: seg[6], y: seg[7] };
        const e = svgArcToCenter(here, to, seg[1], seg[2], seg[3], seg[4] !== 0, seg[5] !== 0);
        if (!e) {
          push(line(here, to));
        } else if (pending && sameEllipse(pending, e)) {
          pending = { ...pending, dtheta: pending.dtheta + e.dtheta };
        } else {
          flushEllipse();
          pending = e;
        }
        break;
      }
      case 'Z':
      case 'z':
        if (x !== start.x || y !== start.y) push(line(here, start));
        endSubpath(true);
        break;
      default:
        break; // abs() and unshort() leave no other commands
    }
  });
  endSubpath(false);
  return { subpaths, error };
}

/** A later arc continuing the same ellipse the same way round (the two halves of an ellipse). */
function sameEllipse(a: EllipseArc, b: EllipseArc): boolean {
  const tol = 1e-9 * Math.max(a.rx, a.ry);
  const turnsSameWay =
    Math.sign(a.dtheta) === Math.sign(b.dtheta) && Math.abs(a.dtheta + b.dtheta) <= 2 * Math.PI + 1e-9;
  const end = ellipsePoint(a, a.theta1 + a.dtheta);
  const next = ellipsePoint(b, b.theta1);
  return (
    turnsSameWay &&
    Math.abs(a.rx - b.rx) <= tol &&
    Math.abs(a.ry - b.ry) <= tol &&
    Math.hypot(a.center.x - b.center.x, a.center.y - b.center.y) <= tol &&
    Math.abs(Math.sin(a.phi - b.phi)) <= 1e-9 &&
    Math.hypot(end.x - next.x, end.y - next.y) <= tol &&
    Math.abs(Math.cos(a.phi - b.phi) - 1) <= 1e-9
  );
}
