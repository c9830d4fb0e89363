import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { gaussKummer } from '../../fixtures/reference';
import { analyseDieline } from '../analyse';
import { DielineError } from '../errors';
import { DEFAULT_LIMITS } from '../limits';
import { createRuleTypeResolver } from '../ruleType';
import { readDxf } from './readDxf';

const read = (text: string) => readDxf(text, { resolve: createRuleTypeResolver(), limits: DEFAULT_LIMITS });
const cutLength = (text: string, units?: 'mm' | 'in') => analyseDieline(text, { units }).metrics.length.cut;
const fail = (text: string) => {
  try {
    read(text);
  } catch (e) {
    if (e instanceof DielineError) return `${e.code}: ${e.message}`;
    throw e;
  }
  return 'no error';
};

describe('readDxf entities', () => {
  // 3-4-5 triangle: LINE (0,0)–(3,4) is 5 in.
  it('reads LINE', () => {
    expect(cutLength(d.dxf([d.line('CUT', 0, 0, 3, 4)], { insunits: 1 }))).toBeCloseTo(5, 12);
  });

  // ARC r = 2 from 30° to 120° (DXF reference: group 50/51 in degrees, counter-clockwise):
  // θ = 90° = π/2, arc length rθ = π. From 300° to 30° wraps through 0°: θ = 90° too.
  it('reads ARC counter-clockwise, wrapping through 0°', () => {
    expect(cutLength(d.dxf([d.arc('CUT', 0, 0, 2, 30, 120)], { insunits: 1 }))).toBeCloseTo(Math.PI, 12);
    expect(cutLength(d.dxf([d.arc('CUT', 0, 0, 2, 300, 30)], { insunits: 1 }))).toBeCloseTo(Math.PI, 12);
  });

  // CIRCLE r = 1.5: circumference 2πr = 3π.
  it('reads CIRCLE', () => {
    expect(cutLength(d.dxf([d.circle('CUT', 5, 5, 1.5)], { insunits: 1 }))).toBeCloseTo(3 * Math.PI, 12);
  });

  // LWPOLYLINE (0,0)→(2,0) with bulge 1 (tan(180°/4) = 1, a semicircle of r = 1: π), then a line
  // (2,0)→(2,3) (3): π + 3. Closed, the last vertex's bulge 0 adds the line (2,3)→(0,0) of √13.
  it('reads LWPOLYLINE with bulges, open and closed', () => {
    const v: Array<[number, number, number?]> = [
      [0, 0, 1],
      [2, 0],
      [2, 3],
    ];
    expect(cutLength(d.dxf([d.lwpolyline('CUT', v)], { insunits: 1 }))).toBeCloseTo(Math.PI + 3, 12);
    expect(cutLength(d.dxf([d.lwpolyline('CUT', v, true)], { insunits: 1 }))).toBeCloseTo(
      Math.PI + 3 + Math.sqrt(13),
      12,
    );
  });

  // POLYLINE with VERTEX entities: a closed 4 × 2 rectangle, perimeter 12; with a bulge of
  // −1 on its first edge, that edge becomes a semicircle of r = 2: 12 − 4 + 2π.
  it('reads POLYLINE with VERTEX bulges', () => {
    const rect: Array<[number, number, number?]> = [
      [0, 0],
      [4, 0],
      [4, 2],
      [0, 2],
    ];
    expect(cutLength(d.dxf([d.polyline('CUT', rect, true)], { insunits: 1 }))).toBeCloseTo(12, 12);
    rect[0] = [0, 0, -1];
    expect(cutLength(d.dxf([d.polyline('CUT', rect, true)], { insunits: 1 }))).toBeCloseTo(8 + 2 * Math.PI, 12);
  });

  // ELLIPSE centre (0,0), major axis end (3,0), ratio 1/3: a = 3, b = 1. Full: Gauss–Kummer
  // perimeter. Half (parameter 0..π): half of it by symmetry. Ratio 1 is a circle: 2π·3.
  it('reads ELLIPSE within 0.1 %', () => {
    const full = cutLength(d.dxf([d.ellipse('CUT', 0, 0, 3, 0, 1 / 3)], { insunits: 1 }));
    expect(Math.abs(full / gaussKummer(3, 1) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(full / gaussKummer(3, 1) - 1)).toBeLessThan(1e-6);
    const half = cutLength(d.dxf([d.ellipse('CUT', 0, 0, 3, 0, 1 / 3, 0, Math.PI)], { insunits: 1 }));
    expect(half / (gaussKummer(3, 1) / 2)).toBeCloseTo(1, 6);
    const m = analyseDieline(d.dxf([d.ellipse('CUT', 0, 0, 0, 3, 1)], { insunits: 1 })).metrics;
    expect(m.length.cut).toBeCloseTo(6 * Math.PI, 12);
    expect(m.minRadius).toBeCloseTo(3, 12);
  });

  // SPLINE of degree 3 on knots [0,0,0,0,1,1,1,1] is the cubic Bézier of its control points.
  // Controls on one line (0,0),(1,0),(2,0),(6,0) make a straight curve 6 long; a quarter-circle-
  // like cubic is checked against svg-path-properties in the SVG tests. Degree 1 is a polyline:
  // (0,0)→(3,4)→(3,0) is 5 + 4 = 9.
  it('reads SPLINE', () => {
    expect(
      cutLength(
        d.dxf(
          [
            d.spline(
              'CUT',
              3,
              [0, 0, 0, 0, 1, 1, 1, 1],
              [
                [0, 0],
                [1, 0],
                [2, 0],
                [6, 0],
              ],
            ),
          ],
          { insunits: 1 },
        ),
      ),
    ).toBeCloseTo(6, 6);
    expect(
      cutLength(
        d.dxf(
          [
            d.spline(
              'CUT',
              1,
              [0, 0, 1, 2, 2],
              [
                [0, 0],
                [3, 4],
                [3, 0],
              ],
            ),
          ],
          { insunits: 1 },
        ),
      ),
    ).toBeCloseTo(9, 6);
  });

  // DXF reference, Arbitrary Axis Algorithm: extrusion (0,0,−1) mirrors x. An ARC about (2,0),
  // r = 1, 0°–90° then lies about (−2,0), spanning x −3..−2 and y 0..1.
  it('mirrors entities drawn with extrusion direction (0, 0, −1)', () => {
    const mirrored: d.Pairs = [...d.arc('CUT', 2, 0, 1, 0, 90), [210, 0], [220, 0], [230, -1]];
    const a = analyseDieline(d.dxf([mirrored, d.line('CREASE', -3, 0, -3, -1)], { insunits: 1 })).metrics;
    expect(a.length.cut).toBeCloseTo(Math.PI / 2, 12);
    expect(a.bbox.width).toBeCloseTo(1, 12); // −3..−2: the arc is left of the origin
    expect(a.joints).toBe(1); // the crease at x −3 meets the arc's end (−3, 0)
  });

  it('skips entities that are not rules, saying so', () => {
    const m = analyseDieline(
      d.dxf([d.line('CUT', 0, 0, 1, 0), d.text('NOTES', 0, 0, 'Job 12'), d.text('NOTES', 0, 1, 'x')], { insunits: 1 }),
    ).metrics;
    expect(m.length.total).toBe(1);
    expect(m.warnings).toContain('Skipped 2 TEXT: not rules, so not measured.');
  });
});

describe('readDxf units', () => {
  // DXF reference, $INSUNITS: 1 inches, 4 millimetres, 5 centimetres, 6 metres. A LINE 254 long
  // is 254 in, 254 mm = 10 in (ISO 80000: 25.4 mm per inch), 254 cm = 100 in, 254 m = 10 000 in.
  it('reads $INSUNITS', () => {
    const l = (u: number) => cutLength(d.dxf([d.line('CUT', 0, 0, 254, 0)], { insunits: u }));
    expect(l(1)).toBeCloseTo(254, 9);
    expect(l(4)).toBeCloseTo(10, 12);
    expect(l(5)).toBeCloseTo(100, 12);
    expect(l(6)).toBeCloseTo(10_000, 9);
    expect(analyseDieline(d.dxf([d.line('CUT', 0, 0, 254, 0)], { insunits: 4 })).metrics.lengthMm.cut).toBeCloseTo(
      254,
      9,
    );
  });

  it('asks the user to confirm when the units are missing or 0, and reads inches', () => {
    for (const file of [d.dxf([d.line('CUT', 0, 0, 2, 0)]), d.dxf([d.line('CUT', 0, 0, 2, 0)], { insunits: 0 })]) {
      const a = analyseDieline(file);
      expect(a.metrics.length.cut).toBe(2);
      expect(a.drawingUnits.source).toBe('assumed');
      expect(a.metrics.warnings.join(' ')).toMatch(/does not say its units.*read as inches\. Please confirm/);
    }
  });

  // The units option wins: 2 read as mm is 2 / 25.4 in.
  it('lets an option override the units', () => {
    expect(cutLength(d.dxf([d.line('CUT', 0, 0, 2, 0)], { insunits: 1 }), 'mm')).toBeCloseTo(2 / 25.4, 12);
  });
});

describe('readDxf blocks', () => {
  // DXF reference (INSERT): scale about the block's base point, rotate, then move to the
  // insertion point. Block: LINE (1,0)–(2,0) with base (1,0). INSERT at (10,10), x scale 3,
  // rotation 90°: the line runs from (10,10) to (10,13), 3 long, its box 0 × 3.
  it('applies insertion point, scale and rotation', () => {
    const file = d.dxf([d.insert('CUT', 'B', 10, 10, { sx: 3, rot: 90 })], {
      insunits: 1,
      blocks: [{ name: 'B', base: [1, 0], entities: [d.line('0', 1, 0, 2, 0)] }],
    });
    const m = analyseDieline(file).metrics;
    expect(m.length.cut).toBeCloseTo(3, 12);
    expect(m.bbox.width).toBeCloseTo(0, 12);
    expect(m.bbox.height).toBeCloseTo(3, 12);
  });

  // Nested: OUTER holds INNER twice at scale 2; INNER is a circle r = 0.5 on layer 0. Inserted
  // once at scale 1.5: r = 0.5·2·1.5 = 1.5, two circles of 2π·1.5 = 3π each: 6π. An uneven scale
  // (x 2, y 1) turns a circle r = 1 into an ellipse a = 2, b = 1 (Gauss–Kummer perimeter).
  it('expands nested blocks, uneven scales and layer 0 inheritance', () => {
    const blocks = [
      { name: 'INNER', entities: [d.circle('0', 0, 0, 0.5)] },
      {
        name: 'OUTER',
        entities: [d.insert('0', 'INNER', 0, 0, { sx: 2, sy: 2 }), d.insert('0', 'INNER', 10, 0, { sx: 2, sy: 2 })],
      },
      { name: 'ONE', entities: [d.circle('0', 0, 0, 1)] },
    ];
    const nested = analyseDieline(
      d.dxf([d.insert('Cut', 'OUTER', 0, 0, { sx: 1.5, sy: 1.5 })], { insunits: 1, blocks }),
    ).metrics;
    expect(nested.length.cut).toBeCloseTo(6 * Math.PI, 12);
    expect(nested.layers).toEqual([{ name: 'Cut', ruleType: 'cut', entities: 2 }]);
    const uneven = analyseDieline(
      d.dxf([d.insert('CREASE', 'ONE', 0, 0, { sx: 2, sy: 1 })], { insunits: 1, blocks }),
    ).metrics;
    expect(uneven.length.crease / gaussKummer(2, 1)).toBeCloseTo(1, 6);
  });

  it('warns about missing and self-inserting blocks', () => {
    const file = d.dxf([d.line('CUT', 0, 0, 1, 0), d.insert('CUT', 'NOPE', 0, 0), d.insert('CUT', 'LOOP', 0, 0)], {
      insunits: 1,
      blocks: [{ name: 'LOOP', entities: [d.line('0', 0, 0, 0, 1), d.insert('0', 'LOOP', 5, 5)] }],
    });
    const m = analyseDieline(file).metrics;
    expect(m.length.cut).toBe(2);
    expect(m.warnings.join('\n')).toMatch(/block "NOPE" that the file does not define/);
    expect(m.warnings.join('\n')).toMatch(/Block "LOOP" inserts itself/);
  });
});

describe('readDxf bad input', () => {
  const good = d.dxf([d.line('CUT', 0, 0, 1, 0)], { insunits: 1 });

  it('refuses a truncated file', () => {
    expect(fail(good.slice(0, good.length - 10))).toMatch(/^TRUNCATED: The DXF file ends before its EOF marker/);
    expect(fail(good.slice(0, good.indexOf('LINE') + 4))).toMatch(/^TRUNCATED/);
  });

  it('refuses a damaged group code with its line number', () => {
    const lines = good.split('\n');
    lines[4] = 'banana';
    expect(fail(lines.join('\n'))).toMatch(
      /^MALFORMED: The DXF file is damaged: line 5 should hold a group code .* "banana"/,
    );
  });

  it('refuses a file with no ENTITIES section', () => {
    expect(fail('0\nSECTION\n2\nHEADER\n0\nENDSEC\n0\nEOF\n')).toMatch(
      /^MALFORMED: The DXF file has no ENTITIES section/,
    );
  });

  it('refuses more entities than the limit allows', () => {
    const many = d.dxf(
      Array.from({ length: 11 }, (_, i) => d.line('CUT', i, 0, i, 1)),
      { insunits: 1 },
    );
    expect(() =>
      readDxf(many, { resolve: createRuleTypeResolver(), limits: { ...DEFAULT_LIMITS, maxEntities: 10 } }),
    ).toThrow(/more than 10 entities/);
  });

  // A file of a few kilobytes can stand for millions of entities through blocks inserted in
  // blocks: 1,000 tiny lines in a block, inserted 1,000 times in a block, inserted 1,000 times
  // (a thousand million lines). The count is kept while expanding, so the default limit stops it
  // at once instead of after building them all (were it not, this test would run out of time).
  it('refuses millions of tiny entities hidden in nested blocks, at the default limit', () => {
    const inserts = (block: string) => Array.from({ length: 1000 }, (_, i) => d.insert('0', block, i * 0.001, 0));
    const file = d.dxf([d.insert('CUT', 'BIG', 0, 0)], {
      insunits: 1,
      blocks: [
        {
          name: 'DUST',
          entities: Array.from({ length: 1000 }, (_, i) => d.line('0', i * 0.001, 0, i * 0.001 + 0.0005, 0)),
        },
        { name: 'MID', entities: inserts('DUST') },
        { name: 'BIG', entities: inserts('MID') },
      ],
    });
    expect(file.length).toBeLessThan(200_000);
    expect(fail(file)).toMatch(
      /^TOO_MANY_ENTITIES: The drawing has more than 200000 entities \(after expanding blocks\)/,
    );
  });

  it('skips a broken entity with a warning and keeps the rest', () => {
    const file = d.dxf(
      [
        d.line('CUT', 0, 0, 1, 0),
        d.spline(
          'CUT',
          3,
          [0, 1],
          [
            [0, 0],
            [1, 1],
            [2, 0],
            [3, 1],
          ],
        ),
      ],
      { insunits: 1 },
    );
    const m = analyseDieline(file).metrics;
    expect(m.length.cut).toBe(1);
    expect(m.warnings.join('\n')).toMatch(/Skipped a SPLINE whose 2 knots do not fit 4 control points of degree 3/);
  });
});
