/**
 * CSS absolute units in px (CSS Values and Units Level 3, 5.2 "Absolute lengths"):
 * 1in = 96px = 2.54cm = 25.4mm = 72pt = 6pc, 1Q = 1/40 cm. SVG user units are px.
 */
const PX_PER_UNIT: Readonly<Record<string, number>> = {
  '': 1,
  px: 1,
  in: 96,
  cm: 96 / 2.54,
  mm: 96 / 25.4,
  q: 96 / 101.6,
  pt: 96 / 72,
  pc: 16,
};

export interface Length {
  /** In px (user units). */
  px: number;
  /** The unit as written, lower case; '' for a bare number. */
  unit: string;
}

/** Parses an SVG length such as "210mm", "8.5in", "12" or "1e2px"; null for %, em, auto or junk. */
export function parseLength(value: unknown): Length | null {
  if (typeof value !== 'string') return null;
  const m = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*([a-z]*)\s*$/i.exec(value);
  if (!m) return null;
  const unit = m[2]!.toLowerCase();
  const factor = PX_PER_UNIT[unit];
  const n = Number(m[1]);
  if (factor === undefined || !Number.isFinite(n)) return null;
  return { px: n * factor, unit };
}

/** A list of numbers separated by commas and/or white space (points, viewBox). */
export function parseNumberList(value: unknown): number[] {
  if (typeof value !== 'string') return [];
  const out: number[] = [];
  const re = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/g;
  for (let m = re.exec(value); m; m = re.exec(value)) out.push(Number(m[0]));
  return out;
}
