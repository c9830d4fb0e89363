import type Flatbush from 'flatbush';
import type { RulePath } from '../drawing';
import { JOIN_TOLERANCE_IN } from '../limits';
import { distanceTo } from '../geometry/segment';
import type { Network } from '../topology/network';
import { segmentIndex } from '../topology/segmentIndex';

/**
 * An index of segment boxes grown by the join tolerance, built before the network (by duplicate
 * removal), and the network segment each of its ids is now (−1: dropped, or not a priced rule).
 */
export interface SharedIndex {
  index: Flatbush;
  netOf: Int32Array;
}

/**
 * Joints: points where a rule stops against another rule, each needing a notch.
 * - a node where a rule stops and any other rule end is there too (rules meeting end to end,
 *   a rule ending on another's vertex, three rules meeting): one joint per node;
 * - a rule stopping alone on the side of another rule (within 0.05 mm of it): one joint.
 * Rules of one type meeting end to end at a node are one rule with a bend there, not a joint.
 * Side contacts come from a Flatbush index of segment boxes (the one duplicate removal built,
 * when given), so this is near linear.
 */
export function countJoints(net: Network, tol = JOIN_TOLERANCE_IN, shared?: SharedIndex): number {
  let joints = 0;
  let index: Flatbush | null = shared?.index ?? null;
  const netOf = shared?.netOf ?? null;
  // The lone end being tested; one filter function for every search.
  let node = 0;
  let p = { x: 0, y: 0 };
  const touchesSide = (id: number): boolean => {
    const s = netOf ? netOf[id]! : id;
    if (s < 0 || net.nodeOfEnd[2 * s] === node || net.nodeOfEnd[2 * s + 1] === node) return false;
    return distanceTo(net.segments[s]!, p) <= tol;
  };
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
    index ??= segmentIndex(net.segments, tol);
    node = n;
    p = net.nodePos[n]!;
    if (index.collides(p.x - tol, p.y - tol, p.x + tol, p.y + tol, touchesSide)) joints++;
  }
  return joints;
}

/**
 * Which network segment each id of an index over the drawing's segments is: `paths` are the
 * paths after duplicate removal, `origin` their segments' ids in the index, and the network
 * holds the priced paths' segments in order.
 */
export function networkIds(paths: RulePath[], origin: Int32Array, indexSize: number): Int32Array {
  const netOf = new Int32Array(indexSize).fill(-1);
  let k = 0;
  let s = 0;
  for (const p of paths) {
    if (p.ruleType === 'other') k += p.segments.length;
    else for (let i = 0; i < p.segments.length; i++) netOf[origin[k++]!] = s++;
  }
  return netOf;
}
