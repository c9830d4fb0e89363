import type { PricedRuleType } from '../ruleType';
import { type Network, segOfEnd } from './network';

/** One continuous rule: segments linked end to end through nodes. */
export interface Chain {
  type: PricedRuleType;
  segments: number[];
  closed: boolean;
}

/** Walks the links into chains; each segment belongs to exactly one chain. */
export function buildChains(net: Network): Chain[] {
  const seen = new Uint8Array(net.segments.length);
  const chains: Chain[] = [];
  for (let s0 = 0; s0 < net.segments.length; s0++) {
    if (seen[s0]) continue;
    // Walk back from the start end to the chain's first segment (or all the way round).
    let entry = 2 * s0; // the end we entered the current segment by
    let closed = false;
    for (;;) {
      const prev = net.link[entry]!;
      if (prev < 0) break;
      if (segOfEnd(prev) === s0) {
        closed = true;
        break;
      }
      entry = prev ^ 1; // enter the previous segment by its far end
    }
    const segments: number[] = [];
    for (;;) {
      const s = segOfEnd(entry);
      if (seen[s]) break;
      seen[s] = 1;
      segments.push(s);
      const next = net.link[entry ^ 1]!;
      if (next < 0) break;
      entry = next;
    }
    chains.push({ type: net.types[s0]!, segments, closed });
  }
  return chains;
}
