import { describe, expect, it } from 'vitest';
import * as d from '../fixtures/dxf';
import { analyseDieline } from './analyse';
import { coordinateText } from './preview';

describe('preview', () => {
  // DXF y points up; the preview's y points down from the top edge. A line from (0,0) to (2,1)
  // in a drawing whose box is 2 × 1 runs from (0,1) to (2,0) in the preview.
  it('flips DXF drawings into a y-down frame at the origin', () => {
    const p = analyseDieline(d.dxf([d.line('CUT', 10, 10, 12, 11)], { insunits: 1 })).preview;
    expect(p).toEqual({ width: 2, height: 1, paths: [{ ruleType: 'cut', layer: 'CUT', d: 'M0 1L2 0' }] });
  });

  // A counter-clockwise DXF arc drawn in a y-down frame turns the other way: sweep-flag 0. A
  // full circle is two half arcs (one SVG arc cannot end where it starts).
  it('keeps arcs as arcs, and circles as two halves', () => {
    const p = analyseDieline(d.dxf([d.arc('CUT', 0, 0, 1, 0, 90), d.circle('KISS', 5, 0, 1)], { insunits: 1 })).preview;
    expect(p.paths[0]!.d).toBe('M1 1A1 1 0 0 0 0 0');
    expect(p.paths[1]!.d).toBe('M6 1A1 1 0 0 0 4 1A1 1 0 0 0 6 1Z'); // starts at (6, 0), box top y 1
  });

  // SVG keeps its y-down frame: M0 0 H96 at 96 per inch is M0 0L1 0; other rules are included.
  it('keeps SVG the right way up and includes unpriced rules', () => {
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"><path id="cut" d="M0 0 H96 V48"/><path d="M0 48 H10"/></svg>';
    const p = analyseDieline(svg).preview;
    expect(p.paths.map((x) => [x.ruleType, x.d])).toEqual([
      ['cut', 'M0 0L1 0L1 0.5'],
      ['other', 'M0 0.5L0.1042 0.5'],
    ]);
  });

  // Curves are simplified: an ellipse (a = 2, b = 1 in) needs far fewer than its flattening points.
  it('simplifies curves', () => {
    const p = analyseDieline(d.dxf([d.ellipse('CUT', 0, 0, 2, 0, 0.5)], { insunits: 1 })).preview;
    const points = p.paths[0]!.d.split('L').length;
    expect(points).toBeGreaterThan(20);
    expect(points).toBeLessThan(200);
  });
});

describe('coordinateText', () => {
  // The reference is the engine's own number formatting of the rounded value: the same text.
  it('writes exactly what formatting the rounded number writes', () => {
    const viaFloat = (v: number) => `${Math.round(v * 1e4) / 1e4}`;
    const values = [
      0,
      -0,
      1,
      -1,
      0.5,
      0.00005,
      -0.00005,
      0.00004,
      1.23456,
      -7.000049,
      2.5e-5,
      12345.6789,
      1e10 + 0.1234,
    ];
    values.push(1e11 + 0.5, 3e14, -9.87e15, 1e21, Number.MAX_VALUE, NaN, Infinity, -Infinity);
    let seed = 3;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    for (let i = 0; i < 100_000; i++) values.push((next() - 0.5) * 10 ** Math.floor(next() * 14 - 4));
    for (let i = 0; i < 20_000; i++) values.push(Math.round((next() - 0.5) * 1e6) / 1e4);
    expect(values.filter((v) => coordinateText(v) !== viaFloat(v))).toEqual([]);
  });
});
