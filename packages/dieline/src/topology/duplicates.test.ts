import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';

const m = (...entities: d.Pairs[]) => analyseDieline(d.dxf(entities, { insunits: 1 })).metrics;

describe('duplicate rules', () => {
  it('counts a rule drawn twice once, either way round, with a warning', () => {
    const r = m(d.line('CUT', 0, 0, 4, 0), d.line('CUT', 4, 0, 0, 0), d.line('CUT', 0, 0, 4, 0));
    expect(r.length.cut).toBe(4);
    expect(r.warnings.join(' ')).toMatch(
      /^2 duplicate or overlapping segments were counted once \(the first near x 4\.000 in, y 0\.000 in\)/,
    );
  });

  // A closed 2 × 1 rectangle twice (polyline, then four lines) is one rectangle: 6 in, 4 bends.
  it('counts a whole contour drawn twice once', () => {
    const r = m(
      d.lwpolyline(
        'CUT',
        [
          [0, 0],
          [2, 0],
          [2, 1],
          [0, 1],
        ],
        true,
      ),
      d.line('CUT', 0, 0, 2, 0),
      d.line('CUT', 2, 0, 2, 1),
      d.line('CUT', 2, 1, 0, 1),
      d.line('CUT', 0, 1, 0, 0),
    );
    expect(r.length.cut).toBe(6);
    expect(r.bends).toBe(4);
    expect(r.closedContours).toBe(1);
  });

  it('counts circles and arcs drawn twice once', () => {
    const r = m(
      d.circle('CUT', 0, 0, 1),
      d.circle('CUT', 0, 0, 1),
      d.arc('CUT', 5, 0, 1, 0, 90),
      d.arc('CUT', 5, 0, 1, 0, 90),
    );
    expect(r.length.cut).toBeCloseTo(2 * Math.PI + Math.PI / 2, 12);
    expect(r.curves).toBe(2);
  });

  // Overlapping collinear lines: 0–4 and 2–6 cover 0–6 (6 in); 1–3 inside 0–4 adds nothing.
  it('counts the overlap of collinear lines once', () => {
    expect(m(d.line('CUT', 0, 0, 4, 0), d.line('CUT', 2, 0, 6, 0)).length.cut).toBeCloseTo(6, 12);
    expect(m(d.line('CUT', 0, 0, 4, 0), d.line('CUT', 1, 0, 3, 0)).length.cut).toBeCloseTo(4, 12);
    expect(m(d.line('CUT', 1, 0, 3, 0), d.line('CUT', 0, 0, 4, 0)).length.cut).toBeCloseTo(4, 12);
  });

  it('keeps rules of different types that lie on each other, and lines meeting end to end', () => {
    expect(m(d.line('CUT', 0, 0, 4, 0), d.line('CREASE', 0, 0, 4, 0)).length.total).toBe(8);
    const r = m(d.line('CUT', 0, 0, 4, 0), d.line('CUT', 4, 0, 8, 0));
    expect(r.length.cut).toBe(8);
    expect(r.warnings).toEqual([]);
  });
});
