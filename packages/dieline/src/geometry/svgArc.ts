import type { Pt } from './vec';

export interface EllipseArc {
  center: Pt;
  rx: number;
  ry: number;
  /** x-axis rotation in radians */
  phi: number;
  theta1: number;
  dtheta: number;
}

/**
 * SVG elliptical arc from endpoint to centre parameters: W3C SVG 1.1 Appendix F.6.5 (SVG 2
 * Appendix B.2.4), with the out-of-range radii scaled up as F.6.6 says. Null when the arc is
 * a straight line (a zero radius) or has no length (equal endpoints).
 */
export function svgArcToCenter(
  p1: Pt,
  p2: Pt,
  rxIn: number,
  ryIn: number,
  phiDeg: number,
  largeArc: boolean,
  sweepFlag: boolean,
): EllipseArc | null {
  if (p1.x === p2.x && p1.y === p2.y) return null;
  let rx = Math.abs(rxIn);
  let ry = Math.abs(ryIn);
  if (rx === 0 || ry === 0) return null;
  const phi = (phiDeg * Math.PI) / 180;
  const cos = Math.cos(phi);
  const sin = Math.sin(phi);
  const hx = (p1.x - p2.x) / 2;
  const hy = (p1.y - p2.y) / 2;
  const x1 = cos * hx + sin * hy;
  const y1 = -sin * hx + cos * hy;
  const lambda = (x1 * x1) / (rx * rx) + (y1 * y1) / (ry * ry);
  if (lambda > 1) {
    rx *= Math.sqrt(lambda);
    ry *= Math.sqrt(lambda);
  }
  const num = rx * rx * ry * ry - rx * rx * y1 * y1 - ry * ry * x1 * x1;
  const den = rx * rx * y1 * y1 + ry * ry * x1 * x1;
  // For a half turn num is 0 up to rounding, whose square root (about 1e-8) would move the
  // centre off the chord: ratios that small are taken as 0.
  const ratio = num / den;
  const root = (largeArc === sweepFlag ? -1 : 1) * (ratio < 1e-12 ? 0 : Math.sqrt(ratio));
  const cx1 = (root * rx * y1) / ry;
  const cy1 = (-root * ry * x1) / rx;
  const center = { x: cos * cx1 - sin * cy1 + (p1.x + p2.x) / 2, y: sin * cx1 + cos * cy1 + (p1.y + p2.y) / 2 };
  const angle = (ux: number, uy: number, vx: number, vy: number) => Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
  const ux = (x1 - cx1) / rx;
  const uy = (y1 - cy1) / ry;
  const vx = (-x1 - cx1) / rx;
  const vy = (-y1 - cy1) / ry;
  const theta1 = angle(1, 0, ux, uy);
  let dtheta = angle(ux, uy, vx, vy);
  if (!sweepFlag && dtheta > 0) dtheta -= 2 * Math.PI;
  if (sweepFlag && dtheta < 0) dtheta += 2 * Math.PI;
  return { center, rx, ry, phi, theta1, dtheta };
}

export function ellipsePoint(e: EllipseArc, theta: number): Pt {
  const cos = Math.cos(e.phi);
  const sin = Math.sin(e.phi);
  const x = e.rx * Math.cos(theta);
  const y = e.ry * Math.sin(theta);
  return { x: e.center.x + cos * x - sin * y, y: e.center.y + sin * x + cos * y };
}
