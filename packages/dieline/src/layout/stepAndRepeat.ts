import type { Drawing, RulePath } from '../drawing';
import { DielineError } from '../errors';
import { apply, applyLinear, type Matrix, multiply, rotate, translate } from '../geometry/matrix';
import { arc, type Segment } from '../geometry/segment';
import type { Limits } from '../limits';
import { boundsOf, fitsPress, type Press, type Size, sizeOf } from '../metrics/board';

/** Which way the grain must run across one piece, as drawn; `either` lets the ups turn. */
export const PIECE_GRAINS = ['either', 'with-width', 'with-height'] as const;
export type PieceGrain = (typeof PIECE_GRAINS)[number];

/** A one-up drawing stepped and repeated into the whole die. */
export interface UpsLayout {
  /** Ups side by side along the drawing's x axis, and rows of them along y. */
  across: number;
  along: number;
  /** Space between neighbouring ups, in inches; 0 for common-line cutting (shared cuts). */
  gutterIn: number;
  pieceGrain?: PieceGrain;
  /** The sheet's grain: long grain runs with the sheet's long side. */
  sheetGrain?: 'long' | 'short' | null;
}

/** How the layout was made, reported with the whole die's metrics. */
export interface LayoutReport {
  across: number;
  along: number;
  gutterIn: number;
  /** The ups were turned a quarter turn from the drawing. */
  rotated: boolean;
  pieceGrain: PieceGrain;
  /** One up's rules box as drawn, in inches. */
  up: Size;
}

export const MAX_UPS = 500;

/**
 * Lays the ups out in a grid at a pitch of the up's rules box plus the gutter. Turning the ups
 * a quarter turn is tried only when the grain allows it: when the piece's grain may run either
 * way, or when the sheet's grain needs it; a turn is taken only when it lets the die fit the
 * press (or the grain asks for it). Shared cuts at a zero gutter lie on top of each other and
 * are counted once by the duplicate-segment rule that follows.
 */
export function stepAndRepeat(
  drawing: Drawing,
  layout: UpsLayout,
  opts: { press?: Press | null; marginIn: number; limits: Limits },
): { drawing: Drawing; report: LayoutReport; notes: string[] } {
  checkLayout(layout);
  const { across, along, gutterIn } = layout;
  const pieceGrain = layout.pieceGrain ?? 'either';
  const priced = drawing.paths.filter((p) => p.ruleType !== 'other');
  const up = sizeOf(boundsOf(priced.length > 0 ? priced : drawing.paths));
  const segments = drawing.paths.reduce((t, p) => t + p.segments.length, 0) * across * along;
  if (segments > opts.limits.maxSegments) {
    throw new DielineError(
      'TOO_MANY_ENTITIES',
      `${across} × ${along} ups of this drawing make more than ${opts.limits.maxSegments} lines, arcs and curves; simplify the drawing.`,
    );
  }
  const { rotated, notes } = chooseTurn(up, layout, pieceGrain, opts);
  const box = boundsOf(priced.length > 0 ? priced : drawing.paths)!;
  // Turn the up about its box's corner so it starts at the origin again.
  const turn: Matrix = rotated
    ? multiply(translate(up.height, 0), multiply(rotate(Math.PI / 2), translate(-box.minX, -box.minY)))
    : translate(-box.minX, -box.minY);
  const pitch = rotated
    ? { x: up.height + gutterIn, y: up.width + gutterIn }
    : { x: up.width + gutterIn, y: up.height + gutterIn };
  const paths: RulePath[] = [];
  for (let j = 0; j < along; j++) {
    for (let i = 0; i < across; i++) {
      const m = multiply(translate(i * pitch.x, j * pitch.y), turn);
      for (const p of drawing.paths) paths.push({ ...p, segments: p.segments.map((s) => moveSegment(s, m)) });
    }
  }
  notes.unshift(
    `Laid out from one up: ${across} across × ${along} along (${across * along} up), gutter ${gutterIn} in` +
      `${gutterIn === 0 ? ', neighbouring ups sharing their cuts' : ''}${rotated ? ', ups turned a quarter turn' : ''}.`,
  );
  return { drawing: { ...drawing, paths }, report: { across, along, gutterIn, rotated, pieceGrain, up }, notes };
}

function checkLayout({ across, along, gutterIn }: UpsLayout): void {
  const whole = (n: number) => Number.isInteger(n) && n >= 1;
  if (!whole(across) || !whole(along) || across * along > MAX_UPS) {
    throw new DielineError('BAD_OPTION', `Ups across and along must be whole numbers, ${MAX_UPS} ups at most.`);
  }
  if (!(Number.isFinite(gutterIn) && gutterIn >= 0 && gutterIn <= 10)) {
    throw new DielineError('BAD_OPTION', 'The gutter must be 0 to 10 inches.');
  }
}

/** Does the piece's grain run with the sheet's grain, with the die's x axis on the sheet's width or length? */
function grainAgrees(
  pieceGrain: PieceGrain,
  rotated: boolean,
  xOnLength: boolean,
  press: Press,
  sheet: 'long' | 'short',
) {
  if (pieceGrain === 'either') return true;
  // The piece's grain axis in the die: its drawn width is the die's x unless turned.
  const grainOnDieX = (pieceGrain === 'with-width') !== rotated;
  const onLength = grainOnDieX === xOnLength;
  const lengthIsLong = press.lengthIn >= press.widthIn;
  return onLength === (lengthIsLong === (sheet === 'long'));
}

function chooseTurn(
  up: Size,
  layout: UpsLayout,
  pieceGrain: PieceGrain,
  opts: { press?: Press | null; marginIn: number },
): { rotated: boolean; notes: string[] } {
  const { across, along, gutterIn } = layout;
  const board = (rotated: boolean): Size => {
    const w = rotated ? up.height : up.width;
    const h = rotated ? up.width : up.height;
    return {
      width: across * w + (across - 1) * gutterIn + 2 * opts.marginIn,
      height: along * h + (along - 1) * gutterIn + 2 * opts.marginIn,
    };
  };
  const press = opts.press;
  const sheet = layout.sheetGrain ?? null;
  if (!press) return { rotated: false, notes: [] };
  if (pieceGrain !== 'either' && !sheet) {
    return {
      rotated: false,
      notes: [
        'The sheet grain is not given, so the ups are kept as drawn; give it to check the grain runs the right way.',
      ],
    };
  }
  for (const rotated of [false, true]) {
    const b = board(rotated);
    const onWidth = b.width <= press.widthIn + 1e-9 && b.height <= press.lengthIn + 1e-9;
    const onLength = b.height <= press.widthIn + 1e-9 && b.width <= press.lengthIn + 1e-9;
    const ok = (xOnLength: boolean) => !sheet || grainAgrees(pieceGrain, rotated, xOnLength, press, sheet);
    if ((onWidth && ok(false)) || (onLength && ok(true))) return { rotated, notes: [] };
  }
  const fitsSomeWay =
    fitsPress(board(false), press) || (pieceGrain === 'either' ? false : fitsPress(board(true), press));
  const side = pieceGrain === 'with-width' ? 'width' : 'height';
  return {
    rotated: false,
    notes: [
      fitsSomeWay
        ? `With ${sheet}-grain sheets, no way of laying the ups out on this press runs the grain with the piece's ${side}; the ups are kept as drawn. Check the stock's grain and the press.`
        : 'The laid-out die does not fit the press either way round, nor with the ups turned; the ups are kept as drawn.',
    ],
  };
}

/** A segment moved by a rigid motion (turns and shifts keep lengths and radii). */
function moveSegment(s: Segment, m: Matrix): Segment {
  switch (s.kind) {
    case 'line':
      return { kind: 'line', a: apply(m, s.a), b: apply(m, s.b), box: undefined };
    case 'arc': {
      const turn = Math.atan2(m.b, m.a);
      return arc(apply(m, s.center), s.r, s.start + turn, s.sweep);
    }
    case 'curve':
      return {
        ...s,
        box: undefined,
        a: apply(m, s.a),
        b: apply(m, s.b),
        points: s.points.map((p) => apply(m, p)),
        startDir: applyLinear(m, s.startDir),
        endDir: applyLinear(m, s.endDir),
      };
  }
}
