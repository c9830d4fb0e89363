import { parseLength, parseNumberList } from './lengths';

export const SHAPES = ['path', 'line', 'polyline', 'polygon', 'rect', 'circle', 'ellipse'] as const;
export type ShapeName = (typeof SHAPES)[number];

export function isShape(name: string): name is ShapeName {
  return (SHAPES as readonly string[]).includes(name);
}

/**
 * Path data for a basic shape, in its own user units, following W3C SVG 1.1 chapter 9 (Basic
 * Shapes): each shape is the path that chapter gives it. A string starting "!" is a problem
 * (a negative or unreadable size); an empty string draws nothing (a zero size).
 */
export function shapePathData(name: ShapeName, attrs: Record<string, unknown>): string {
  const len = (key: string, fallback: number | null = 0): number | null => {
    const v = attrs[key];
    if (v === undefined || v === '') return fallback;
    const l = parseLength(v);
    return l ? l.px : null;
  };
  switch (name) {
    case 'path':
      return typeof attrs.d === 'string' ? attrs.d : '';
    case 'line': {
      const [x1, y1, x2, y2] = [len('x1'), len('y1'), len('x2'), len('y2')];
      if (x1 === null || y1 === null || x2 === null || y2 === null) return '!a line with an unreadable coordinate';
      return `M${x1} ${y1}L${x2} ${y2}`;
    }
    case 'polyline':
    case 'polygon': {
      const n = parseNumberList(attrs.points);
      // An odd count is an error; SVG draws the pairs before it.
      const pairs: string[] = [];
      for (let i = 0; i + 1 < n.length; i += 2) pairs.push(`${n[i]} ${n[i + 1]}`);
      if (pairs.length < 2) return '';
      return `M${pairs.join('L')}${name === 'polygon' ? 'Z' : ''}`;
    }
    case 'rect': {
      const [x, y, w, h] = [len('x'), len('y'), len('width'), len('height')];
      let rx = len('rx', null);
      let ry = len('ry', null);
      if (x === null || y === null || w === null || h === null) return '!a rect with an unreadable size';
      if (w < 0 || h < 0) return '!a rect with a negative size';
      if (w === 0 || h === 0) return '';
      // SVG 1.1 9.2: a missing rx or ry takes the other's value; each is at most half the side.
      if (rx === null) rx = ry ?? 0;
      if (ry === null) ry = rx;
      rx = Math.min(Math.abs(rx), w / 2);
      ry = Math.min(Math.abs(ry), h / 2);
      if (rx === 0 || ry === 0) return `M${x} ${y}H${x + w}V${y + h}H${x}Z`;
      const a = (dx: number, dy: number) => `A${rx} ${ry} 0 0 1 ${dx} ${dy}`;
      return (
        `M${x + rx} ${y}H${x + w - rx}${a(x + w, y + ry)}V${y + h - ry}${a(x + w - rx, y + h)}` +
        `H${x + rx}${a(x, y + h - ry)}V${y + ry}${a(x + rx, y)}Z`
      );
    }
    case 'circle':
    case 'ellipse': {
      const cx = len('cx');
      const cy = len('cy');
      let rx = name === 'circle' ? len('r') : len('rx', null);
      let ry = name === 'circle' ? rx : len('ry', null);
      if (name === 'ellipse') {
        // SVG 2: an auto (missing) radius takes the other's value.
        if (rx === null) rx = ry;
        if (ry === null) ry = rx;
      }
      if (cx === null || cy === null || rx === null || ry === null)
        return `!a ${name} with an unreadable centre or radius`;
      if (rx < 0 || ry < 0) return `!a ${name} with a negative radius`;
      if (rx === 0 || ry === 0) return '';
      // Two half turns; the reader joins them into one closed curve.
      return `M${cx + rx} ${cy}A${rx} ${ry} 0 0 1 ${cx - rx} ${cy}A${rx} ${ry} 0 0 1 ${cx + rx} ${cy}Z`;
    }
  }
}
