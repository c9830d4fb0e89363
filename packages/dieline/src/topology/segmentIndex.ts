import Flatbush from 'flatbush';
import { bbox, type Segment } from '../geometry/segment';

/**
 * A Flatbush index of the segments' boxes, each grown by `tol` on every side, so a search
 * within `tol` of a point or box finds every segment that may be that near. Item ids are the
 * segments' positions in the list.
 */
export function segmentIndex(segments: readonly Segment[], tol: number): Flatbush {
  const index = new Flatbush(Math.max(1, segments.length));
  for (const s of segments) {
    const b = bbox(s);
    index.add(b.minX - tol, b.minY - tol, b.maxX + tol, b.maxY + tol);
  }
  if (segments.length === 0) index.add(0, 0, 0, 0);
  index.finish();
  return index;
}
