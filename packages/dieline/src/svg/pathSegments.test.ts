import { svgPathProperties } from 'svg-path-properties';
import { describe, expect, it } from 'vitest';
import { length } from '../geometry/segment';
import { pathSegments } from './pathSegments';

const total = (d: string, transform = '') =>
  pathSegments(d, transform).subpaths.reduce((sum, sp) => sum + sp.segments.reduce((s, seg) => s + length(seg), 0), 0);

describe('pathSegments cross-checked with svg-path-properties', () => {
  // svg-path-properties (a general-purpose npm SVG path-length library) is the independent
  // reference: our lengths must agree within 0.1 % (in fact far closer).
  const paths = [
    'M10 80 C 40 10, 65 10, 95 80 S 150 150, 180 80',
    'M10 80 Q 52.5 10, 95 80 T 180 80',
    'M 6 10 A 6 4 10 1 0 14 10',
    'M 0 0 A 50 25 -30 0 1 100 40 L 120 90 A 10 10 0 1 1 90 100 Z',
    'm 20 20 c 10 -30 40 -30 50 0 s 40 30 50 0 q 20 40 -10 60 t -40 10 a 15 25 45 1 0 -30 -30 z',
    'M0 0 C 0 0 100 0 100 100', // control point on the start point
  ];
  for (const d of paths) {
    it(`measures ${d}`, () => {
      const reference = new svgPathProperties(d).getTotalLength();
      expect(Math.abs(total(d) / reference - 1)).toBeLessThan(1e-3);
    });
  }

  // A quarter circle as a cubic Bézier with k = 0.5523: about r·π/2·(1 + 2.7e-4); compare with
  // the library, and an exact arc A50 50 0 0 1 gives exactly rθ = 25π.
  it('measures arcs exactly', () => {
    expect(total('M 0 50 A 50 50 0 0 1 50 0')).toBeCloseTo(25 * Math.PI, 12);
    const d = 'M 0 50 C 0 22.385 22.385 0 50 0';
    expect(Math.abs(total(d) / new svgPathProperties(d).getTotalLength() - 1)).toBeLessThan(1e-4);
  });

  // Transforms: scale(2) doubles lengths (geometry); the library measures the untransformed path.
  it('applies transforms before measuring', () => {
    const d = 'M10 80 C 40 10, 65 10, 95 80 S 150 150, 180 80';
    expect(total(d, 'rotate(33) scale(2)') / (2 * new svgPathProperties(d).getTotalLength())).toBeCloseTo(1, 4);
  });

  it('treats a cubic with its controls on the chord as a line', () => {
    const sp = pathSegments('M0 0 C 10 0 20 0 30 0', '').subpaths[0]!;
    expect(sp.segments[0]!.kind).toBe('line');
  });
});
