import { describe, expect, it } from 'vitest';
import { rectangleDxf } from '../../fixtures/testDielines';
import { analyseDieline } from '../analyse';
import { DielineError } from '../errors';

// The one-up drawing: a 4 × 3 in rectangle of cutting rule (14 in) with a 4 in crease across
// it. Every answer below is counted by hand from the grid the ups make (plain geometry).
const oneUp = (layout: Parameters<typeof analyseDieline>[1]) => analyseDieline(rectangleDxf, layout).metrics;

describe('one up, stepped and repeated', () => {
  it('counts shared cuts once at a zero gutter (common-line cutting)', () => {
    const m = oneUp({ layout: { across: 3, along: 4, gutterIn: 0 } });
    // 3 × 4 ups of 4 × 3 in make a 12 × 12 in grid: 5 rows of 12 in and 4 columns of 12 in.
    expect(m.length.cut).toBeCloseTo(5 * 12 + 4 * 12, 9);
    expect(m.length.crease).toBeCloseTo(12 * 4, 9);
    expect(m.bbox).toEqual({ width: 12, height: 12 });
    expect(m.board).toEqual({ width: 14, height: 14 });
    expect(m.layout).toMatchObject({ across: 3, along: 4, gutterIn: 0, rotated: false, up: { width: 4, height: 3 } });
    expect(m.layout!.oneUpLength.cut).toBeCloseTo(14, 9);
    expect(m.warnings.join(' ')).toMatch(/3 across × 4 along \(12 up\), gutter 0 in, neighbouring ups sharing/);
  });

  it('keeps every cut with a gutter between the ups', () => {
    const m = oneUp({ layout: { across: 3, along: 4, gutterIn: 0.25 } });
    expect(m.length.cut).toBeCloseTo(12 * 14, 9);
    expect(m.bbox.width).toBeCloseTo(3 * 4 + 2 * 0.25, 9);
    expect(m.bbox.height).toBeCloseTo(4 * 3 + 3 * 0.25, 9);
    expect(m.closedContours).toBe(12); // one closed cutting outline per up
  });

  it('turns the ups when that lets the die fit the press and the grain may run either way', () => {
    // As drawn the board is 14 × 14 in: too wide for a 13 × 20 in sheet either way round.
    // Turned, the ups are 3 × 4 in: 9 × 16 in of rules, an 11 × 18 in board, which fits.
    const press = { widthIn: 13, lengthIn: 20 };
    const m = oneUp({ press, layout: { across: 3, along: 4, gutterIn: 0, pieceGrain: 'either' } });
    expect(m.layout!.rotated).toBe(true);
    expect(m.bbox).toEqual({ width: 9, height: 16 });
    expect(m.fitsPress).toBe(true);
    expect(m.length.cut).toBeCloseTo(5 * 9 + 4 * 16, 9);
  });

  it('turns the ups only when the grain allows it', () => {
    const press = { widthIn: 13, lengthIn: 20 };
    // Long grain runs with the sheet's 20 in side. Turned, the piece's width runs along the
    // die's y, the 18 in side of the board, which lies on the sheet's length: with the grain.
    const withWidth = oneUp({
      press,
      layout: { across: 3, along: 4, gutterIn: 0, pieceGrain: 'with-width', sheetGrain: 'long' },
    });
    expect(withWidth.layout!.rotated).toBe(true);
    // The piece's height would then run across the grain: the ups stay as drawn, with a note.
    const withHeight = oneUp({
      press,
      layout: { across: 3, along: 4, gutterIn: 0, pieceGrain: 'with-height', sheetGrain: 'long' },
    });
    expect(withHeight.layout!.rotated).toBe(false);
    expect(withHeight.fitsPress).toBe(false);
    expect(withHeight.warnings.join(' ')).toMatch(
      /long-grain sheets, no way .* runs the grain with the piece's height/,
    );
    // Without the sheet's grain the ups are never turned for a grain that matters.
    const unknown = oneUp({ press, layout: { across: 3, along: 4, gutterIn: 0, pieceGrain: 'with-width' } });
    expect(unknown.layout!.rotated).toBe(false);
    expect(unknown.warnings.join(' ')).toMatch(/sheet grain is not given/);
  });

  it('refuses a layout that is not whole ups or a sensible gutter', () => {
    expect(() => oneUp({ layout: { across: 0, along: 4, gutterIn: 0 } })).toThrow(DielineError);
    expect(() => oneUp({ layout: { across: 2.5, along: 4, gutterIn: 0 } })).toThrow(/whole numbers/);
    expect(() => oneUp({ layout: { across: 30, along: 30, gutterIn: 0 } })).toThrow(/500 ups at most/);
    expect(() => oneUp({ layout: { across: 2, along: 2, gutterIn: -1 } })).toThrow(/gutter/);
  });
});
