import type { RulePath } from './drawing';
import type { Box, Segment } from './geometry/segment';
import { distToSegment, type Pt } from './geometry/vec';
import type { RuleType } from './ruleType';

/** One rule path as SVG path data, in inches. */
export interface PreviewPath {
  ruleType: RuleType;
  layer: string;
  d: string;
}

/**
 * The rules to draw, in inches, y pointing down, the drawing's top-left corner at (0, 0): put
 * the paths in `<svg viewBox="0 0 {width} {height}">`. Arcs stay arcs; other curves are
 * simplified to within 0.001 in.
 */
export interface DielinePreview {
  width: number;
  height: number;
  paths: PreviewPath[];
}

const SIMPLIFY_IN = 0.001;
const round = (v: number) => Math.round(v * 1e4) / 1e4;

/**
 * `${round(v)}`, written from the integer count of ten-thousandths, about 3 times faster than
 * formatting the float. Below 1e11 in no shorter decimal than those four places reads back as the
 * same double (a different one would be 1e-4 away, more than the spacing of doubles there), so
 * the number's own shortest form is this one; larger values take the float's own route.
 */
export function coordinateText(v: number): string {
  const n = Math.round(v * 1e4);
  if (!(Math.abs(n) < 1e15)) return `${n / 1e4}`;
  if (n === 0) return '0';
  const whole = Math.floor(Math.abs(n) / 1e4);
  let frac = Math.abs(n) - whole * 1e4;
  let text = `${whole}`;
  if (frac !== 0) {
    let places = 4;
    while (frac % 10 === 0) {
      frac /= 10;
      places--;
    }
    text += `.${`${frac}`.padStart(places, '0')}`;
  }
  return n < 0 ? `-${text}` : text;
}

export function buildPreview(paths: RulePath[], box: Box | null, yUp: boolean): DielinePreview {
  if (!box) return { width: 0, height: 0, paths: [] };
  // Into the preview frame: x from the left edge, y down from the top edge.
  const xy = (p: Pt) => `${coordinateText(p.x - box.minX)} ${coordinateText(yUp ? box.maxY - p.y : p.y - box.minY)}`;
  const out: PreviewPath[] = paths.map((p) => {
    let d = `M${xy(p.segments[0]!.a)}`;
    for (const s of p.segments) d += segmentData(s, xy, yUp);
    if (p.closed) d += 'Z';
    return { ruleType: p.ruleType, layer: p.layer, d };
  });
  return { width: round(box.maxX - box.minX), height: round(box.maxY - box.minY), paths: out };
}

function segmentData(s: Segment, xy: (p: Pt) => string, yUp: boolean): string {
  switch (s.kind) {
    case 'line':
      return `L${xy(s.b)}`;
    case 'arc': {
      // Flipping y turns the arc the other way round.
      const sweepFlag = s.sweep > 0 !== yUp ? 1 : 0;
      const r = coordinateText(s.r);
      if (Math.abs(s.sweep) >= 2 * Math.PI - 1e-9) {
        // A full circle is two half arcs: one SVG arc cannot end where it starts.
        const half = { x: 2 * s.center.x - s.a.x, y: 2 * s.center.y - s.a.y };
        return `A${r} ${r} 0 0 ${sweepFlag} ${xy(half)}A${r} ${r} 0 0 ${sweepFlag} ${xy(s.b)}`;
      }
      return `A${r} ${r} 0 ${Math.abs(s.sweep) > Math.PI ? 1 : 0} ${sweepFlag} ${xy(s.b)}`;
    }
    case 'curve':
      return simplify(s.points, SIMPLIFY_IN)
        .slice(1)
        .map((p) => `L${xy(p)}`)
        .join('');
  }
}

/** Douglas–Peucker: the fewest points within `tol` of the polyline. */
function simplify(points: Pt[], tol: number): Pt[] {
  const keep = new Uint8Array(points.length);
  keep[0] = 1;
  keep[points.length - 1] = 1;
  const stack: Array<[number, number]> = [[0, points.length - 1]];
  while (stack.length > 0) {
    const [i, j] = stack.pop()!;
    let worst = -1;
    let at = -1;
    for (let k = i + 1; k < j; k++) {
      const d = distToSegment(points[k]!, points[i]!, points[j]!);
      if (d > worst) [worst, at] = [d, k];
    }
    if (worst > tol) {
      keep[at] = 1;
      stack.push([i, at], [at, j]);
    }
  }
  return points.filter((_, k) => keep[k]);
}
