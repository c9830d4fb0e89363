import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';
import { buildChains } from './chains';
import { buildNetwork } from './network';
import { line } from '../geometry/segment';

const mm = (...entities: d.Pairs[]) => analyseDieline(d.dxf(entities, { insunits: 4 })).metrics;

describe('joining rule ends', () => {
  // A 10 × 10 mm square of four lines, one corner open by a gap: under 0.05 mm the ends join
  // (one closed contour, 4 bends); a 0.1 mm gap stays open (no closed contour, 3 bends).
  const square = (gap: number) =>
    mm(
      d.line('CUT', 0, 0, 10, 0),
      d.line('CUT', 10, 0, 10, 10),
      d.line('CUT', 10, 10, 0, 10),
      d.line('CUT', 0, 10, 0, gap),
    );
  it('joins gaps under 0.05 mm', () => {
    const r = square(0.04);
    expect(r.closedContours).toBe(1);
    expect(r.bends).toBe(4);
    expect(r.joints).toBe(0);
  });
  it('does not join a 0.1 mm gap', () => {
    const r = square(0.1);
    expect(r.closedContours).toBe(0);
    expect(r.bends).toBe(3);
  });

  // Tightly spaced vertices of one polyline (0.01 mm apart) stay separate: a run of 100 steps
  // along a line is still 1 mm long, open, with its two ends free.
  it('keeps fine polyline vertices apart', () => {
    const v: Array<[number, number]> = Array.from({ length: 101 }, (_, i) => [i * 0.01, 0]);
    const r = mm(d.lwpolyline('CUT', v));
    expect(r.lengthMm.cut).toBeCloseTo(1, 9);
    expect(r.closedContours).toBe(0);
  });
});

describe('chains', () => {
  it('walks open and closed chains', () => {
    const p = (x: number, y: number) => ({ x, y });
    const net = buildNetwork([
      { layer: 'c', ruleType: 'cut', closed: false, segments: [line(p(0, 0), p(1, 0))] },
      { layer: 'c', ruleType: 'cut', closed: false, segments: [line(p(2, 0), p(1, 0))] }, // drawn backwards
      {
        layer: 'c',
        ruleType: 'cut',
        closed: true,
        segments: [line(p(5, 5), p(6, 5)), line(p(6, 5), p(5, 6)), line(p(5, 6), p(5, 5))],
      },
    ]);
    const chains = buildChains(net);
    expect(chains.map((c) => [c.segments.length, c.closed])).toEqual([
      [2, false],
      [3, true],
    ]);
  });
});
