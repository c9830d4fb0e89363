import Flatbush from 'flatbush';
import type { RulePath } from '../drawing';
import { JOIN_TOLERANCE_IN } from '../limits';
import { bbox, distanceTo, length, line, midpoint, type Segment } from '../geometry/segment';
import { dist, dot, type Pt, sub } from '../geometry/vec';

export interface DuplicateResult {
  paths: RulePath[];
  /** Segments dropped or shortened because another rule of the same type already covers them. */
  removed: number;
  firstAt: Pt | null;
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
  const owner: number[] = [];
  paths.forEach((p, pi) => p.segments.forEach((s) => (segs.push(s), owner.push(pi))));
  if (segs.length === 0) return { paths, removed: 0, firstAt: null };

  const index = new Flatbush(segs.length);
  for (const s of segs) {
    const b = bbox(s);
    index.add(b.minX - tol, b.minY - tol, b.maxX + tol, b.maxY + tol);
  }
  index.finish();

  const alive = segs.map(() => true);
  // A shortened segment no longer meets its neighbour in the path: the path breaks there.
  const breakBefore = segs.map(() => false);
  const breakAfter = segs.map(() => false);
  let removed = 0;
  let firstAt: Pt | null = null;
  const note = (p: Pt) => {
    removed++;
    firstAt ??= p;
  };

  for (let i = 0; i < segs.length; i++) {
    const type = paths[owner[i]!]!.ruleType;
    const b = bbox(segs[i]!);
    const candidates = index.search(b.minX - tol, b.minY - tol, b.maxX + tol, b.maxY + tol);
    for (const j of candidates) {
      if (j >= i || !alive[j] || paths[owner[j]!]!.ruleType !== type) continue;
      const si = segs[i]!;
      const sj = segs[j]!;
      // Short segments (a finely divided curve) compare at a tenth of their length, so
      // neighbouring pieces are not taken for copies of each other.
      const t = Math.min(tol, 0.1 * Math.min(length(si), length(sj)));
      if (liesOn(si, sj, t)) {
        alive[i] = false;
        note(si.a);
        break;
      }
      if (si.kind !== 'line' || sj.kind !== 'line') continue;
      const overlap = lineOverlap(si.a, si.b, sj.a, sj.b, t);
      if (overlap === 'inside') {
        alive[i] = false;
        note(si.a);
        break;
      }
      if (overlap === 'covers') {
        alive[j] = false; // the later, longer line covers the earlier one
        note(sj.a);
        if (j > 0 && owner[j - 1] === owner[j]) breakAfter[j - 1] = true;
        if (owner[j + 1] === owner[j]) breakBefore[j + 1] = true;
      } else if (overlap) {
        segs[i] = line(overlap.a, overlap.b);
        if (overlap.movedA) breakBefore[i] = true;
        else breakAfter[i] = true;
        note(overlap.movedA ? overlap.a : overlap.b);
      }
    }
  }
  if (removed === 0) return { paths, removed, firstAt };

  const out: RulePath[] = [];
  let k = 0;
  paths.forEach((p) => {
    const intact = p.segments.every((_, n) => alive[k + n] && !breakBefore[k + n] && !breakAfter[k + n]);
    let run: Segment[] = [];
    const flush = () => {
      if (run.length > 0) out.push({ ...p, segments: run, closed: intact && p.closed });
      run = [];
    };
    for (let n = 0; n < p.segments.length; n++, k++) {
      if (!alive[k] || breakBefore[k]) flush();
      if (alive[k]) run.push(segs[k]!);
      if (breakAfter[k]) flush();
    }
    flush();
  });
  return { paths: out, removed, firstAt };
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
