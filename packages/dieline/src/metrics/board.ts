import type { RulePath } from '../drawing';
import { bbox, type Box } from '../geometry/segment';

export interface Size {
  width: number;
  height: number;
}

export interface Press {
  /** Largest sheet the press takes, in inches, either way round. */
  widthIn: number;
  lengthIn: number;
}

/** Margin of die board around the rules on each side, in inches, unless the caller says. */
export const DEFAULT_MARGIN_IN = 1;

export function boundsOf(paths: RulePath[]): Box | null {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  let any = false;
  for (const p of paths) {
    for (const s of p.segments) {
      const b = bbox(s);
      if (any) {
        minX = Math.min(minX, b.minX);
        minY = Math.min(minY, b.minY);
        maxX = Math.max(maxX, b.maxX);
        maxY = Math.max(maxY, b.maxY);
      } else {
        ({ minX, minY, maxX, maxY } = b);
        any = true;
      }
    }
  }
  return any ? { minX, minY, maxX, maxY } : null;
}

export const sizeOf = (box: Box | null): Size =>
  box ? { width: box.maxX - box.minX, height: box.maxY - box.minY } : { width: 0, height: 0 };

/** The die board: the rules' box plus the margin on every side. */
export function boardSize(rules: Size, marginIn: number): Size {
  return { width: rules.width + 2 * marginIn, height: rules.height + 2 * marginIn };
}

/** Does the board fit the press's largest sheet, turned either way? */
export function fitsPress(board: Size, press: Press): boolean {
  const eps = 1e-9;
  const fits = (w: number, l: number) => board.width <= w + eps && board.height <= l + eps;
  return fits(press.widthIn, press.lengthIn) || fits(press.lengthIn, press.widthIn);
}
