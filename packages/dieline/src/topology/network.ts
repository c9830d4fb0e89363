import KDBush from 'kdbush';
import type { RulePath } from '../drawing';
import { JOIN_TOLERANCE_IN } from '../limits';
import type { PricedRuleType } from '../ruleType';
import { directionInto, type Segment } from '../geometry/segment';
import { angleBetween, dist, type Pt } from '../geometry/vec';

/**
 * The priced rules as a graph. Segment s has two ends, 2s (its start) and 2s + 1 (its end);
 * each end sits at a node. Consecutive segments of one path share their node exactly; the free
 * ends of open paths join a node of another rule within the join tolerance (0.05 mm).
 */
export interface Network {
  segments: Segment[];
  types: PricedRuleType[];
  /** Node of each end (index 2s or 2s + 1). */
  nodeOfEnd: Int32Array;
  nodeCount: number;
  nodePos: Pt[];
  /** Ends at node n: endsAt.slice(endStart[n], endStart[n + 1]). */
  endStart: Int32Array;
  endsAt: Int32Array;
  /** The end each end continues into as the same rule, or −1 where a rule stops. */
  link: Int32Array;
}

export const segOfEnd = (end: number) => end >> 1;

// Directions of travel at the two ends being compared, reused: turnAngle runs at every vertex.
const arriving = { x: 0, y: 0 };
const leaving = { x: 0, y: 0 };

/** Change of direction, in radians, passing from one rule end into the other at their node. */
export function turnAngle(net: Pick<Network, 'segments'>, from: number, to: number): number {
  // Arriving through an end is travelling the segment towards it; leaving through `to` is
  // travelling its segment away from it.
  directionInto(net.segments[segOfEnd(from)]!, from & 1 ? 'b' : 'a', arriving);
  if (!(from & 1)) {
    arriving.x = -arriving.x;
    arriving.y = -arriving.y;
  }
  directionInto(net.segments[segOfEnd(to)]!, to & 1 ? 'b' : 'a', leaving);
  if (to & 1) {
    leaving.x = -leaving.x;
    leaving.y = -leaving.y;
  }
  return angleBetween(arriving, leaving);
}

export function buildNetwork(paths: RulePath[], tol = JOIN_TOLERANCE_IN): Network {
  // Sizes first, so every per-segment and per-node table is one typed array.
  let segCount = 0;
  let nodeCount = 0;
  for (const p of paths) {
    const n = p.segments.length;
    segCount += n;
    if (n > 0) nodeCount += p.closed ? n : n + 1;
  }
  const segments: Segment[] = [];
  const types: PricedRuleType[] = [];
  const nodeOfEnd = new Int32Array(2 * segCount);
  const nodePos: Pt[] = [];
  const free = new Uint8Array(nodeCount);
  const pathOfNode = new Int32Array(nodeCount);

  let node = 0;
  for (let pi = 0; pi < paths.length; pi++) {
    const p = paths[pi]!;
    const n = p.segments.length;
    if (n === 0) continue;
    const first = node;
    nodePos.push(p.segments[0]!.a);
    free[node] = p.closed ? 0 : 1;
    pathOfNode[node++] = pi;
    for (let i = 0; i < n; i++) {
      const s = p.segments[i]!;
      const e = 2 * segments.length;
      segments.push(s);
      types.push(p.ruleType as PricedRuleType);
      nodeOfEnd[e] = first + i;
      if (i === n - 1 && p.closed) {
        nodeOfEnd[e + 1] = first;
      } else {
        nodeOfEnd[e + 1] = node;
        nodePos.push(s.b);
        free[node] = i === n - 1 ? 1 : 0;
        pathOfNode[node++] = pi;
      }
    }
  }

  // Join free ends: to the nearest fixed node (another path's inner vertex) within the
  // tolerance if there is one, else together. Each free end joins once, so a run of near
  // points does not collapse into one node.
  const rep = new Int32Array(nodeCount);
  for (let i = 0; i < nodeCount; i++) rep[i] = i;
  if (nodeCount > 0) {
    const index = new KDBush(nodeCount);
    for (const p of nodePos) index.add(p.x, p.y);
    index.finish();
    const joined = new Uint8Array(nodeCount);
    for (let f = 0; f < nodeCount; f++) {
      if (!free[f] || joined[f]) continue;
      // Only other paths' nodes: a path's own fine vertices must not swallow its end (a path
      // closing on itself was found when it was read).
      const own = pathOfNode[f];
      const at = nodePos[f]!;
      const near = index.within(at.x, at.y, tol);
      let target = f;
      let best = Infinity;
      for (const g of near) {
        if (pathOfNode[g] === own || free[g]) continue;
        const d = dist(nodePos[g]!, at);
        if (d < best) {
          best = d;
          target = g;
        }
      }
      joined[f] = 1;
      rep[f] = target;
      for (const g of near) {
        if (pathOfNode[g] !== own && free[g] && !joined[g]) {
          joined[g] = 1;
          rep[g] = target;
        }
      }
    }
  }
  // Renumber the nodes that remain.
  const id = new Int32Array(nodeCount).fill(-1);
  const pos: Pt[] = [];
  for (let i = 0; i < nodeCount; i++) {
    const r = rep[i]!;
    if (id[r] === -1) {
      id[r] = pos.length;
      pos.push(nodePos[r]!);
    }
  }
  const ends = new Int32Array(nodeOfEnd.length);
  for (let e = 0; e < ends.length; e++) ends[e] = id[rep[nodeOfEnd[e]!]!]!;

  const endStart = new Int32Array(pos.length + 1);
  for (let e = 0; e < ends.length; e++) endStart[ends[e]! + 1]!++;
  for (let n = 0; n < pos.length; n++) endStart[n + 1]! += endStart[n]!;
  const fill = endStart.slice(0, pos.length);
  const endsAt = new Int32Array(ends.length);
  for (let e = 0; e < ends.length; e++) endsAt[fill[ends[e]!]!++] = e;

  const net: Network = {
    segments,
    types,
    nodeOfEnd: ends,
    nodeCount: pos.length,
    nodePos: pos,
    endStart,
    endsAt,
    link: new Int32Array(ends.length).fill(-1),
  };
  linkEnds(net);
  return net;
}

/**
 * At each node, the ends of one rule type continue into each other: two ends are one rule
 * bending there; of three or more, the straightest pairs continue and the rest stop (a rule
 * ending on another's vertex).
 */
function linkEnds(net: Network): void {
  for (let n = 0; n < net.nodeCount; n++) {
    const from = net.endStart[n]!;
    const count = net.endStart[n + 1]! - from;
    if (count < 2) continue;
    if (count === 2) {
      // The usual vertex: two ends; they continue into each other if they are of one type.
      const a = net.endsAt[from]!;
      const b = net.endsAt[from + 1]!;
      if (net.types[segOfEnd(a)] === net.types[segOfEnd(b)]) {
        net.link[a] = b;
        net.link[b] = a;
      }
      continue;
    }
    const here = Array.from(net.endsAt.subarray(from, from + count));
    const byType = new Map<PricedRuleType, number[]>();
    for (const e of here) {
      const t = net.types[segOfEnd(e)]!;
      const list = byType.get(t);
      if (list) list.push(e);
      else byType.set(t, [e]);
    }
    for (const list of byType.values()) {
      const open = [...list];
      while (open.length >= 2) {
        let bi = 0;
        let bj = 1;
        let best = Infinity;
        for (let i = 0; i < open.length; i++) {
          for (let j = i + 1; j < open.length; j++) {
            const t = turnAngle(net, open[i]!, open[j]!);
            if (t < best) [best, bi, bj] = [t, i, j];
          }
        }
        const a = open[bi]!;
        const b = open[bj]!;
        net.link[a] = b;
        net.link[b] = a;
        open.splice(bj, 1);
        open.splice(bi, 1);
      }
    }
  }
}
