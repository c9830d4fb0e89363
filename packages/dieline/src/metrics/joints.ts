import Flatbush from 'flatbush';
import { JOIN_TOLERANCE_IN } from '../limits';
import { bbox, distanceTo } from '../geometry/segment';
import type { Network } from '../topology/network';

/**
 * Joints: points where a rule stops against another rule, each needing a notch.
 * - a node where a rule stops and any other rule end is there too (rules meeting end to end,
 *   a rule ending on another's vertex, three rules meeting): one joint per node;
 * - a rule stopping alone on the side of another rule (within 0.05 mm of it): one joint.
 * Rules of one type meeting end to end at a node are one rule with a bend there, not a joint.
 * Side contacts come from a Flatbush index of segment boxes, so this is near linear.
 */
export function countJoints(net: Network, tol = JOIN_TOLERANCE_IN): number {
  let joints = 0;
  let index: Flatbush | null = null;
  for (let n = 0; n < net.nodeCount; n++) {
    const from = net.endStart[n]!;
    const to = net.endStart[n + 1]!;
    let stops = 0;
    for (let i = from; i < to; i++) if (net.link[net.endsAt[i]!]! < 0) stops++;
    if (stops === 0) continue;
    if (to - from >= 2) {
      joints++;
      continue;
    }
    // A lone rule end: does it touch the side of a rule that does not meet it at this node?
    index ??= segmentIndex(net, tol);
    const p = net.nodePos[n]!;
    const touches = index.search(p.x - tol, p.y - tol, p.x + tol, p.y + tol, (s) => {
      if (net.nodeOfEnd[2 * s] === n || net.nodeOfEnd[2 * s + 1] === n) return false;
      return distanceTo(net.segments[s]!, p) <= tol;
    });
    if (touches.length > 0) joints++;
  }
  return joints;
}

function segmentIndex(net: Network, tol: number): Flatbush {
  const index = new Flatbush(Math.max(1, net.segments.length));
  for (const s of net.segments) {
    const b = bbox(s);
    index.add(b.minX - tol, b.minY - tol, b.maxX + tol, b.maxY + tol);
  }
  if (net.segments.length === 0) index.add(0, 0, 0, 0);
  index.finish();
  return index;
}
