import { type Network, turnAngle } from '../topology/network';

/** A change of direction over this (1 degree) where one rule continues is a bend. */
export const BEND_MIN_DEGREES = 1;

/**
 * Bends: each node where one rule continues from one segment into the next and its direction
 * changes by more than 1 degree. A smooth join (a line running on tangent into an arc) is no
 * bend; the closing vertex of a closed rule counts like any other, so a rectangle has 4.
 */
export function countBends(net: Network): number {
  const min = (BEND_MIN_DEGREES * Math.PI) / 180;
  let bends = 0;
  for (let e = 0; e < net.link.length; e++) {
    const other = net.link[e]!;
    if (other > e && turnAngle(net, e, other) > min) bends++;
  }
  return bends;
}
