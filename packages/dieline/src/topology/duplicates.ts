import type Flatbush from 'flatbush';
import type { RulePath } from '../drawing';
import { JOIN_TOLERANCE_IN } from '../limits';
import type { RuleType } from '../ruleType';
import { bbox, distanceTo, length, line, midpoint, type Segment } from '../geometry/segment';
import { dist, dot, type Pt, sub } from '../geometry/vec';
import { segmentIndex } from './segmentIndex';

export interface DuplicateResult {
  paths: RulePath[];
  /** Segments dropped or shortened because another rule of the same type already covers them. */
  removed: number;
  firstAt: Pt | null;
  /**
   * The index of the segments as they came in (see segmentIndex; null without segments), kept
   * for the joints: a shortened segment lies inside its old box, so it is still found.
   */
  index: Flatbush | null;
  /** For each segment of `paths`, in order, its id in `index`. */
  origin: Int32Array;
}

/**
 * Rules drawn twice are counted once. A segment lying on an earlier segment of the same rule
 * type (same ends, same midpoint, same length within the join tolerance) is dropped; a straight
 * line overlapping another line along their common direction keeps only the part not covered.
 * Paths are split where a segment was dropped or shortened. Candidates come from a Flatbush
 * index of segment boxes, so the pass is near linear in the number of segments.
 */
export function removeDuplicates(paths: RulePath[], tol = JOIN_TOLERANCE_IN): DuplicateResult {
  const segs: Segment[] = [];
  const types: RuleType[] = [];
  for (const p of paths) {
    for (const s of p.segments) {
      segs.push(s);
      types.push(p.ruleType);
    }
  }
  const n = segs.length;
  // Segment k is the first of its path, or the last: the path does not run on across it.
  const pathStart = new Uint8Array(n + 1);
  for (let p = 0, k = 0; p < paths.length; k += paths[p]!.segments.length, p++) pathStart[k] = 1;
  pathStart[n] = 1;
  if (n === 0) return { paths, removed: 0, firstAt: null, index: null, origin: new Int32Array(0) };

  const index = segmentIndex(segs, tol);
  const alive = new Uint8Array(n).fill(1);
  // A shortened segment no longer meets its neighbour in the path: the path breaks there.
  const breakBefore = new Uint8Array(n);
  const breakAfter = new Uint8Array(n);
  let removed = 0;
  let firstAt: Pt | null = null;

  // Only earlier live segments of the same type; what one candidate does changes no other's
  // standing, so they are filtered while searching, in the index's order.
  let i = 0;
  const isCandidate = (j: number) => j < i && alive[j] === 1 && types[j] === types[i];
  for (; i < n; i++) {
    const b = bbox(segs[i]!);
    const candidates = index.search(b.minX - tol, b.minY - tol, b.maxX + tol, b.maxY + tol, isCandidate);
    for (const j of candidates) {
      const si = segs[i]!;
      const sj = segs[j]!;
      // Short segments (a finely divided curve) compare at a tenth of their length, so
      // neighbouring pieces are not taken for copies of each other.
      const t = Math.min(tol, 0.1 * Math.min(length(si), length(sj)));
      if (liesOn(si, sj, t)) {
        alive[i] = 0;
        removed++;
        firstAt ??= si.a;
        break;
      }
      if (si.kind !== 'line' || sj.kind !== 'line') continue;
      const overlap = lineOverlap(si.a, si.b, sj.a, sj.b, t);
      if (overlap === 'inside') {
        alive[i] = 0;
        removed++;
        firstAt ??= si.a;
        break;
      }
      if (overlap === 'covers') {
        alive[j] = 0; // the later, longer line covers the earlier one
        removed++;
        firstAt ??= sj.a;
        if (!pathStart[j]) breakAfter[j - 1] = 1;
        if (!pathStart[j + 1]) breakBefore[j + 1] = 1;
      } else if (overlap) {
        segs[i] = line(overlap.a, overlap.b);
        if (overlap.movedA) breakBefore[i] = 1;
        else breakAfter[i] = 1;
        removed++;
        firstAt ??= overlap.movedA ? overlap.a : overlap.b;
      }
    }
  }
  if (removed === 0) return { paths, removed, firstAt, index, origin: identity(n) };

  const out: RulePath[] = [];
  const origin = new Int32Array(n);
  let kept = 0;
  let k = 0;
  for (const p of paths) {
    const end = k + p.segments.length;
    let intact = true;
    for (let m = k; m < end; m++) if (!alive[m] || breakBefore[m] || breakAfter[m]) intact = false;
    let run: Segment[] = [];
    const flush = () => {
      if (run.length > 0) out.push({ ...p, segments: run, closed: intact && p.closed });
      run = [];
    };
    for (; k < end; k++) {
      if (!alive[k] || breakBefore[k]) flush();
      if (alive[k]) {
        run.push(segs[k]!);
        origin[kept++] = k;
      }
      if (breakAfter[k]) flush();
    }
    flush();
  }
  return { paths: out, removed, firstAt, index, origin: origin.subarray(0, kept) };
}

function identity(n: number): Int32Array {
  const ids = new Int32Array(n);
  for (let k = 0; k < n; k++) ids[k] = k;
  return ids;
}

/** s lies on t: its ends and midpoint are on t, and the lengths agree. */
function liesOn(s: Segment, t: Segment, tol: number): boolean {
  return (
    Math.abs(length(s) - length(t)) <= 2 * tol &&
    distanceTo(t, s.a) <= tol &&
    distanceTo(t, s.b) <= tol &&
    distanceTo(t, midpoint(s)) <= tol &&
    distanceTo(s, midpoint(t)) <= tol
  );
}

type Overlap = 'inside' | 'covers' | { a: Pt; b: Pt; movedA: boolean } | null;

/**
 * How line a–b overlaps an earlier collinear line c–d: null when they do not overlap (touching
 * end to end is no overlap); 'inside' when c–d contains a–b; 'covers' when a–b contains c–d;
 * otherwise the part of a–b outside c–d.
 */
function lineOverlap(a: Pt, b: Pt, c: Pt, d: Pt, tol: number): Overlap {
  const len = dist(c, d);
  const u = { x: (d.x - c.x) / len, y: (d.y - c.y) / len };
  const off = (p: Pt) => Math.abs((p.x - c.x) * u.y - (p.y - c.y) * u.x);
  if (off(a) > tol || off(b) > tol) return null;
  const ta = dot(sub(a, c), u);
  const tb = dot(sub(b, c), u);
  const lo = Math.max(Math.min(ta, tb), 0);
  const hi = Math.min(Math.max(ta, tb), len);
  if (hi - lo <= tol) return null;
  if (Math.min(ta, tb) >= -tol && Math.max(ta, tb) <= len + tol) return 'inside';
  if (Math.min(ta, tb) <= tol && Math.max(ta, tb) >= len - tol) return 'covers';
  // One end of a–b is inside c–d: move it to the end of c–d that lies inside a–b.
  const aInside = ta >= -tol && ta <= len + tol;
  const inner = aInside ? tb : ta;
  const target = inner > len ? d : c;
  return aInside ? { a: target, b, movedA: true } : { a, b: target, movedA: false };
}
