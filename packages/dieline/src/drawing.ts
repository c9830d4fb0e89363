import { DielineError } from './errors';
import type { Limits } from './limits';
import { ZERO_LENGTH_IN, JOIN_TOLERANCE_IN } from './limits';
import type { RuleType, RuleTypeChoice } from './ruleType';
import { arc, length, type Segment, TAU } from './geometry/segment';
import { dist } from './geometry/vec';

/** A run of connected segments from one entity, in inches, with its rule type. */
export interface RulePath {
  layer: string;
  ruleType: RuleType;
  segments: Segment[];
  closed: boolean;
}

export interface LayerInfo {
  /** DXF layer, or the SVG id / class / label that set the rule type. */
  name: string;
  ruleType: RuleType;
  /** Entities (DXF) or shapes (SVG) on it. */
  entities: number;
}

export interface DrawingUnits {
  /** What one drawing unit is, e.g. "mm" or "px (1/96 in)". */
  name: string;
  inchesPerUnit: number;
  /** Where the unit came from. */
  source: 'file' | 'option' | 'assumed';
}

/** What a reader hands to the analysis: paths in inches, layers, units and warnings. */
export interface Drawing {
  paths: RulePath[];
  layers: LayerInfo[];
  units: DrawingUnits;
  warnings: string[];
  /** Drawing y axis points up (DXF) rather than down (SVG); the preview flips it. */
  yUp: boolean;
  /** For a PDF: the page measured, from 1, and how many there are. */
  page?: { number: number; count: number };
}

/** Collects paths and counts while a reader walks a file, and enforces the size limits. */
export class DrawingBuilder {
  readonly paths: RulePath[] = [];
  readonly warnings: string[] = [];
  private readonly layers = new Map<string, LayerInfo>();
  /** A reader that hands the same choice object for each entity of a layer skips the name key. */
  private readonly layerOfChoice = new WeakMap<RuleTypeChoice, LayerInfo>();
  private readonly skipped = new Map<string, number>();
  private entities = 0;
  private segments = 0;
  private zeroLength = 0;

  constructor(private readonly limits: Limits) {}

  /** Counts one entity on a layer; throws past the entity limit. */
  countEntity(choice: RuleTypeChoice): void {
    this.entities++;
    if (this.entities > this.limits.maxEntities) {
      throw new DielineError(
        'TOO_MANY_ENTITIES',
        `The drawing has more than ${this.limits.maxEntities} entities (after expanding blocks); simplify it or split it into several files.`,
      );
    }
    const known = this.layerOfChoice.get(choice);
    if (known) {
      known.entities++;
      return;
    }
    const key = `${choice.layer}\u0000${choice.ruleType}`;
    let info = this.layers.get(key);
    if (info) info.entities++;
    else this.layers.set(key, (info = { name: choice.layer, ruleType: choice.ruleType, entities: 1 }));
    this.layerOfChoice.set(choice, info);
  }

  /** Notes an entity that is not a rule (text, dimension …), reported once per kind. */
  skip(kind: string): void {
    this.skipped.set(kind, (this.skipped.get(kind) ?? 0) + 1);
  }

  warn(message: string): void {
    if (!this.warnings.includes(message)) this.warnings.push(message);
  }

  /**
   * Adds the connected segments of one entity. Zero-length segments are dropped, and
   * consecutive arcs on one circle (a circle drawn as two half arcs) become one arc.
   */
  addPath(choice: RuleTypeChoice, segments: Segment[], closed: boolean): void {
    const kept: Segment[] = [];
    for (const s of segments) {
      if (!(length(s) > ZERO_LENGTH_IN)) {
        this.zeroLength++;
        continue;
      }
      const prev = kept[kept.length - 1];
      const merged = prev ? mergeArcs(prev, s) : null;
      if (merged) kept[kept.length - 1] = merged;
      else kept.push(s);
    }
    if (closed && kept.length > 1) {
      const merged = mergeArcs(kept[kept.length - 1]!, kept[0]!);
      if (merged) {
        kept.pop();
        kept[0] = merged;
      }
    }
    if (kept.length === 0) return;
    this.segments += kept.length;
    if (this.segments > this.limits.maxSegments) {
      throw new DielineError(
        'TOO_MANY_ENTITIES',
        `The drawing has more than ${this.limits.maxSegments} lines, arcs and curves; simplify it or split it into several files.`,
      );
    }
    const first = kept[0]!;
    const last = kept[kept.length - 1]!;
    const isClosed = closed || dist(first.a, last.b) <= JOIN_TOLERANCE_IN;
    this.paths.push({ layer: choice.layer, ruleType: choice.ruleType, segments: kept, closed: isClosed });
  }

  finish(units: DrawingUnits, yUp: boolean): Drawing {
    if (this.skipped.size > 0) {
      const list = [...this.skipped].map(([kind, n]) => `${n} ${kind}`).join(', ');
      this.warnings.push(`Skipped ${list}: not rules, so not measured.`);
    }
    if (this.zeroLength > 0) {
      this.warnings.push(`Dropped ${this.zeroLength} zero-length segment${this.zeroLength === 1 ? '' : 's'}.`);
    }
    return { paths: this.paths, layers: [...this.layers.values()], units, warnings: this.warnings, yUp };
  }
}

/** Two consecutive arcs on the same circle turning the same way, as one arc (or null). */
function mergeArcs(p: Segment, q: Segment): Segment | null {
  if (p.kind !== 'arc' || q.kind !== 'arc') return null;
  const tol = 1e-9 * Math.max(1, p.r);
  if (Math.abs(p.r - q.r) > tol || dist(p.center, q.center) > tol || dist(p.b, q.a) > tol) return null;
  if (Math.sign(p.sweep) !== Math.sign(q.sweep) || Math.abs(p.sweep + q.sweep) > TAU + 1e-12) return null;
  return arc(p.center, p.r, p.start, p.sweep + q.sweep);
}
