import KDBush from 'kdbush';
import type { RulePath } from '../drawing';
import { JOIN_TOLERANCE_IN } from '../limits';
import type { PricedRuleType } from '../ruleType';
import { direction, type Segment } from '../geometry/segment';
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

/** Direction of travel arriving at the node through this end. */
function arriving(segments: Segment[], end: number): Pt {
  const s = segments[segOfEnd(end)]!;
  if (end & 1) return direction(s, 'b');
  const d = direction(s, 'a');
  return { x: -d.x, y: -d.y };
}

/** Change of direction, in radians, passing from one rule end into the other at their node. */
export function turnAngle(net: Pick<Network, 'segments'>, from: number, to: number): number {
  const a = arriving(net.segments, from);
  const b = arriving(net.segments, to);
  // Leaving through `to` is arriving through it reversed.
  return angleBetween(a, { x: -b.x, y: -b.y });
}

export function buildNetwork(paths: RulePath[], tol = JOIN_TOLERANCE_IN): Network {
  const segments: Segment[] = [];
  const types: PricedRuleType[] = [];
  const nodeOfEnd: number[] = [];
  const nodePos: Pt[] = [];
  const free: boolean[] = [];
  const pathOfNode: number[] = [];

  paths.forEach((p, pi) => {
    const first = nodePos.length;
    const n = p.segments.length;
    p.segments.forEach((s, i) => {
      segments.push(s);
      types.push(p.ruleType as PricedRuleType);
      if (i === 0) {
        nodePos.push(s.a);
        free.push(!p.closed);
        pathOfNode.push(pi);
      }
      const last = i === n - 1;
      if (!(last && p.closed)) {
        nodePos.push(s.b);
        free.push(last);
        pathOfNode.push(pi);
      }
      nodeOfEnd.push(first + i, last && p.closed ? first : first + i + 1);
    });
  });

  // Join free ends: to the nearest fixed node (another path's inner vertex) within the
  // tolerance if there is one, else together. Each free end joins once, so a run of near
  // points does not collapse into one node.
  const rep = nodePos.map((_, i) => i);
  if (nodePos.length > 0) {
    const index = new KDBush(nodePos.length);
    for (const p of nodePos) index.add(p.x, p.y);
    index.finish();
    const joined = free.map(() => false);
    for (let f = 0; f < nodePos.length; f++) {
      if (!free[f] || joined[f]) continue;
      // Only other paths' nodes: a path's own fine vertices must not swallow its end (a path
      // closing on itself was found when it was read).
      const near = index.within(nodePos[f]!.x, nodePos[f]!.y, tol).filter((g) => pathOfNode[g] !== pathOfNode[f]);
      let target = f;
      let best = Infinity;
      for (const g of near) {
        const d = dist(nodePos[g]!, nodePos[f]!);
        if (!free[g] && d < best) {
          best = d;
          target = g;
        }
      }
      for (const g of [f, ...near]) {
        if (free[g] && !joined[g]) {
          joined[g] = true;
          rep[g] = target;
        }
      }
    }
  }
  // Renumber the nodes that remain.
  const id = new Int32Array(nodePos.length).fill(-1);
  const pos: Pt[] = [];
  rep.forEach((r) => {
    if (id[r] === -1) {
      id[r] = pos.length;
      pos.push(nodePos[r]!);
    }
  });
  const ends = Int32Array.from(nodeOfEnd, (n) => id[rep[n]!]!);

  const endStart = new Int32Array(pos.length + 1);
  for (const n of ends) endStart[n + 1]!++;
  for (let n = 0; n < pos.length; n++) endStart[n + 1]! += endStart[n]!;
  const fill = endStart.slice(0, pos.length);
  const endsAt = new Int32Array(ends.length);
  ends.forEach((n, e) => (endsAt[fill[n]!++] = e));

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
