import { hypot, type Pt } from './vec';

export interface ArcParams {
  center: Pt;
  r: number;
  start: number;
  sweep: number;
}

/**
 * The arc of a polyline vertex's bulge from p1 to p2. DXF reference (LWPOLYLINE group 42):
 * bulge = tan(θ/4), θ the included angle, positive counter-clockwise; a bulge of 1 is a
 * semicircle. Radius r = c / (2·sin(θ/2)) for chord c; the centre sits off the chord's midpoint
 * by (c/2)·cot(θ/2) = (c/2)·(1 − b²)/(2b), to the left of the chord for a positive bulge.
 */
export function bulgeArc(p1: Pt, p2: Pt, bulge: number): ArcParams {
  const dx = p2.x - p1.x;
  const dy = p2.y - p1.y;
  const c = hypot(dx, dy);
  const sweep = 4 * Math.atan(bulge);
  const r = c / (2 * Math.abs(Math.sin(sweep / 2)));
  const offset = ((c / 2) * (1 - bulge * bulge)) / (2 * bulge);
  const center = { x: (p1.x + p2.x) / 2 - (dy / c) * offset, y: (p1.y + p2.y) / 2 + (dx / c) * offset };
  return { center, r, start: Math.atan2(p1.y - center.y, p1.x - center.x), sweep };
}
