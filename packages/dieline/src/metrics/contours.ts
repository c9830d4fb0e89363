import { bbox } from '../geometry/segment';
import type { Chain } from '../topology/chains';
import type { Network } from '../topology/network';

/** A closed cutting rule no larger than this each way (12.7 mm) is a punch. */
export const PUNCH_MAX_IN = 0.5;

export interface ContourCounts {
  closedContours: number;
  punches: number;
}

/**
 * Closed contours: rules of one type that close on themselves (a circle, a closed outline).
 * Punches: closed cutting-rule contours whose box is at most 0.5 in (12.7 mm) each way.
 */
export function countContours(net: Network, chains: Chain[]): ContourCounts {
  let closedContours = 0;
  let punches = 0;
  for (const c of chains) {
    if (!c.closed) continue;
    closedContours++;
    if (c.type !== 'cut') continue;
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    for (const s of c.segments) {
      const b = bbox(net.segments[s]!);
      minX = Math.min(minX, b.minX);
      minY = Math.min(minY, b.minY);
      maxX = Math.max(maxX, b.maxX);
      maxY = Math.max(maxY, b.maxY);
    }
    const eps = 1e-9;
    if (maxX - minX <= PUNCH_MAX_IN + eps && maxY - minY <= PUNCH_MAX_IN + eps) punches++;
  }
  return { closedContours, punches };
}
