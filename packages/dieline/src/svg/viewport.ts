import type { DrawingUnits } from '../drawing';
import { type Matrix, multiply, scale, translate } from '../geometry/matrix';
import { type UnitName, UNIT_INCHES } from '../unitNames';
import { parseLength, parseNumberList } from './lengths';

export interface Viewport {
  /** User units of the outermost svg element → inches. */
  matrix: Matrix;
  units: DrawingUnits;
}

/**
 * W3C SVG 1.1, 7.7–7.8 (viewBox, preserveAspectRatio): with a viewBox and a width and/or height,
 * the viewBox is fitted into width × height (aligned and met or sliced, or stretched with
 * "none"). Without a viewBox, or without a width and height, one user unit is one px, 1/96 in
 * (CSS Values and Units). A units option says what one user unit is instead.
 */
export function rootViewport(
  attrs: Record<string, unknown>,
  override: UnitName | undefined,
  warn: (m: string) => void,
): Viewport {
  if (override) {
    return {
      matrix: scale(UNIT_INCHES[override]),
      units: { name: override, inchesPerUnit: UNIT_INCHES[override], source: 'option' },
    };
  }
  const px: DrawingUnits = { name: 'px (1/96 in)', inchesPerUnit: 1 / 96, source: 'file' };
  const vb = parseNumberList(attrs.viewBox);
  const hasViewBox = vb.length === 4 && vb[2]! > 0 && vb[3]! > 0;
  if (attrs.viewBox !== undefined && !hasViewBox)
    warn('The svg viewBox is not four numbers with a positive width and height; ignored.');
  for (const key of ['width', 'height'] as const) {
    const v = attrs[key];
    if (typeof v === 'string' && v.trim() !== '' && v.trim() !== 'auto' && !parseLength(v)) {
      warn(`The svg ${key} "${v}" is not an absolute length; user units are read at 96 per inch.`);
    }
  }
  const w = parseLength(attrs.width);
  const h = parseLength(attrs.height);
  if (!hasViewBox || (!w && !h)) return { matrix: scale(1 / 96), units: px };

  const [vx, vy, vw, vh] = vb as [number, number, number, number];
  const widthIn = (w ? w.px : (h!.px * vw) / vh) / 96;
  const heightIn = (h ? h.px : (w!.px * vh) / vw) / 96;
  const sx = widthIn / vw;
  const sy = heightIn / vh;
  const par = typeof attrs.preserveAspectRatio === 'string' ? attrs.preserveAspectRatio.trim().split(/\s+/) : [];
  const align = par[0] === 'defer' ? par[1] : par[0];
  const slice = (par[0] === 'defer' ? par[2] : par[1]) === 'slice';
  let m: Matrix;
  if (align === 'none') {
    m = multiply(scale(sx, sy), translate(-vx, -vy));
  } else {
    const s = slice ? Math.max(sx, sy) : Math.min(sx, sy);
    const a = align && /^x(Min|Mid|Max)Y(Min|Mid|Max)$/.exec(align);
    const f = (k: string | undefined) => (k === 'Min' ? 0 : k === 'Max' ? 1 : 0.5);
    const tx = f(a ? a[1] : 'Mid') * (widthIn - vw * s);
    const ty = f(a ? a[2] : 'Mid') * (heightIn - vh * s);
    m = multiply(translate(tx, ty), multiply(scale(s), translate(-vx, -vy)));
  }
  const perUnit = Math.sqrt(Math.abs(m.a * m.d));
  return { matrix: m, units: { name: unitName(perUnit), inchesPerUnit: perUnit, source: 'file' } };
}

function unitName(inches: number): string {
  const near = (x: number) => Math.abs(inches - x) <= 1e-9 * x;
  if (near(1 / 96)) return 'px (1/96 in)';
  if (near(1 / 25.4)) return 'mm';
  if (near(1)) return 'in';
  if (near(1 / 72)) return 'pt';
  return `${(inches * 25.4).toPrecision(6)} mm per user unit`;
}
