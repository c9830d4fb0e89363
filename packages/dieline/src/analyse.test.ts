import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import * as d from '../fixtures/dxf';
import { analyseDieline } from './analyse';
import { DielineError } from './errors';

const err = (fn: () => unknown) => {
  try {
    fn();
  } catch (e) {
    if (e instanceof DielineError) return `${e.code}: ${e.message}`;
    throw e;
  }
  return 'no error';
};

const boxMm = () => new Uint8Array(readFileSync(new URL('../fixtures/box-mm.dxf', import.meta.url)));

describe('analyseDieline', () => {
  it('returns exactly the fields of the metrics contract', () => {
    const m = analyseDieline(boxMm(), { fileName: 'box-mm.dxf' }).metrics;
    expect(Object.keys(m).sort()).toEqual(
      [
        'units',
        'length',
        'lengthMm',
        'curves',
        'minRadius',
        'bends',
        'joints',
        'closedContours',
        'punches',
        'bbox',
        'board',
        'complexity',
        'warnings',
        'fitsPress',
        'layers',
      ].sort(),
    );
    expect(Object.keys(m.length)).toEqual(['cut', 'crease', 'perf', 'kiss', 'other', 'total']);
    expect(Object.keys(m.lengthMm)).toEqual(['cut', 'crease', 'perf', 'kiss', 'other', 'total']);
    expect(m.units).toBe('in');
  });

  // The fixture (mm, $INSUNITS 4): a 100 × 50 mm cut box (300 mm), a 50 mm crease across it, a
  // cut circle r = 3 mm (2π·3 mm). Inches by 1 in = 25.4 mm (ISO 80000).
  it('measures the box fixture', () => {
    const a = analyseDieline(boxMm());
    const m = a.metrics;
    expect(a.format).toBe('dxf');
    expect(a.drawingUnits).toEqual({ name: 'mm', inchesPerUnit: 1 / 25.4, source: 'file' });
    expect(m.lengthMm.cut).toBeCloseTo(300 + 6 * Math.PI, 9);
    expect(m.length.cut).toBeCloseTo((300 + 6 * Math.PI) / 25.4, 12);
    expect(m.lengthMm.crease).toBeCloseTo(50, 9);
    expect(m.lengthMm.total).toBeCloseTo(350 + 6 * Math.PI, 9);
    expect(m.curves).toBe(1);
    expect(m.minRadius).toBeCloseTo(3 / 25.4, 12);
    expect(m.bends).toBe(4);
    expect(m.joints).toBe(2);
    expect(m.closedContours).toBe(2);
    expect(m.punches).toBe(1);
    expect(m.bbox.width).toBeCloseTo(100 / 25.4, 12);
    expect(m.bbox.height).toBeCloseTo(50 / 25.4, 12);
    expect(m.board.width).toBeCloseTo(100 / 25.4 + 2, 12);
    // 8 features on 13.9 in of rule: 0.58 per inch, under 1: simple.
    expect(m.complexity).toBe('simple');
    expect(m.warnings).toEqual([]);
  });

  // The inch fixture: a 4 × 2 in box of four lines (12 in), a 2 in score across it, a punch
  // r = 0.125 in (2π·0.125) and a hole r = 0.5 in (2π·0.5, no punch: 1 in across).
  it('measures the inch fixture', () => {
    const m = analyseDieline(new Uint8Array(readFileSync(new URL('../fixtures/box-in.dxf', import.meta.url)))).metrics;
    expect(m.length.cut).toBeCloseTo(12 + 2 * Math.PI * 0.625, 12);
    expect(m.length.crease).toBe(2);
    expect(m.lengthMm.crease).toBeCloseTo(50.8, 12); // 2 × 25.4 mm
    expect([m.bends, m.joints, m.closedContours, m.punches, m.curves]).toEqual([4, 2, 3, 1, 2]);
    expect(m.minRadius).toBe(0.125);
    expect(m.board).toEqual({ width: 6, height: 4 });
  });

  it('reads text and bytes alike', () => {
    const text = new TextDecoder().decode(boxMm());
    expect(analyseDieline(text).metrics).toEqual(analyseDieline(boxMm()).metrics);
  });

  it('remaps layers', () => {
    const m = analyseDieline(boxMm(), { layerMap: { crease: 'perf' } }).metrics;
    expect(m.lengthMm.perf).toBeCloseTo(50, 9);
    expect(m.length.crease).toBe(0);
    expect(m.layers).toContainEqual({ name: 'CREASE', ruleType: 'perf', entities: 1 });
  });

  it('reports unpriced layers and drops zero-length segments', () => {
    const m = analyseDieline(
      d.dxf([d.line('CUT', 0, 0, 1, 0), d.line('CUT', 3, 3, 3, 3), d.line('Dims', 0, 5, 9, 5)], { insunits: 1 }),
    ).metrics;
    expect(m.length).toMatchObject({ cut: 1, other: 9, total: 10 });
    expect(m.bbox).toEqual({ width: 1, height: 0 });
    expect(m.warnings).toContain('Dropped 1 zero-length segment.');
    expect(m.warnings.join(' ')).toMatch(/Not priced \(no rule type\): "Dims"/);
  });

  it('leaves PDF to the asynchronous reader', () => {
    expect(err(() => analyseDieline('%PDF-1.4\n%âãÏÓ\n1 0 obj'))).toMatch(/^UNSUPPORTED_FORMAT: .*analyseDielineAsync/);
  });

  it('refuses a drawing with nothing to measure', () => {
    expect(err(() => analyseDieline(d.dxf([d.text('A', 0, 0, 'x')], { insunits: 1 })))).toMatch(/^NO_GEOMETRY/);
  });

  it('refuses oversized input and bad options', () => {
    expect(err(() => analyseDieline(boxMm(), { limits: { maxBytes: 100 } }))).toMatch(/^TOO_LARGE/);
    expect(err(() => analyseDieline(boxMm(), { marginIn: -1 }))).toMatch(/^BAD_OPTION: The board margin/);
    expect(err(() => analyseDieline(boxMm(), { press: { widthIn: 0, lengthIn: 30 } }))).toMatch(
      /^BAD_OPTION: The press/,
    );
    expect(err(() => analyseDieline(boxMm(), { layerMap: { CUT: 'cutting' as never } }))).toMatch(
      /^BAD_OPTION: Layer "CUT"/,
    );
    expect(err(() => analyseDieline(boxMm(), { units: 'yd' as never }))).toMatch(/^BAD_OPTION: Unknown units/);
  });

  it('refuses a file past the segment limit', () => {
    const file = d.dxf(
      [
        d.lwpolyline(
          'CUT',
          Array.from({ length: 30 }, (_, i): [number, number] => [i, i % 2]),
        ),
      ],
      { insunits: 1 },
    );
    expect(err(() => analyseDieline(file, { limits: { maxSegments: 20 } }))).toMatch(
      /^TOO_MANY_ENTITIES: .*more than 20 lines, arcs and curves/,
    );
  });
});
