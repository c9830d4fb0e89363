import { describe, expect, it } from 'vitest';
import * as d from '../../fixtures/dxf';
import { analyseDieline } from '../analyse';
import { boardSize, fitsPress } from './board';

describe('board and press', () => {
  // Rules box 10 × 20 in plus 1 in each side: 12 × 22 in.
  it('adds the margin on every side', () => {
    expect(boardSize({ width: 10, height: 20 }, 1)).toEqual({ width: 12, height: 22 });
  });

  // Common practice: a small press takes sheets up to about 22 × 30 in, so a 24 × 31 in board
  // does not fit; a 21 × 29 board fits either way round.
  it('checks the press sheet size in either orientation', () => {
    expect(fitsPress({ width: 24, height: 31 }, { widthIn: 22, lengthIn: 30 })).toBe(false);
    expect(fitsPress({ width: 29, height: 21 }, { widthIn: 22, lengthIn: 30 })).toBe(true);
    expect(fitsPress({ width: 22, height: 30 }, { widthIn: 30, lengthIn: 22 })).toBe(true);
  });

  // The box covers priced rules only: a 2 × 1 in cut rectangle with notes far away.
  it('boxes priced rules only, and gives fitsPress only with a press', () => {
    const file = d.dxf(
      [
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
        d.line('NOTES', 50, 50, 60, 60),
      ],
      { insunits: 1 },
    );
    const a = analyseDieline(file).metrics;
    expect(a.bbox).toEqual({ width: 2, height: 1 });
    expect(a.board).toEqual({ width: 4, height: 3 });
    expect(a.fitsPress).toBeNull();
    const b = analyseDieline(file, { marginIn: 0.5, press: { widthIn: 3, lengthIn: 2 } }).metrics;
    expect(b.board).toEqual({ width: 3, height: 2 });
    expect(b.fitsPress).toBe(true);
  });
});
