import type { Drawing, DrawingUnits, LayerInfo, RulePath } from './drawing';
import { DielineError } from './errors';
import { type DielineFormat, decodeInput, detectFormat, FORMATS } from './input';
import { DEFAULT_LIMITS, type Limits } from './limits';
import { countBends } from './metrics/bends';
import { boardSize, boundsOf, DEFAULT_MARGIN_IN, fitsPress, type Press, type Size, sizeOf } from './metrics/board';
import { type Complexity, complexityOf } from './metrics/complexity';
import { countContours } from './metrics/contours';
import { countJoints, networkIds } from './metrics/joints';
import { countCurves, type LengthByType, lengthsByType, toMm } from './metrics/lengths';
import { buildPreview, type DielinePreview } from './preview';
import { createRuleTypeResolver, isRuleType, type LayerMap } from './ruleType';
import { readDxf } from './dxf/readDxf';
import { type LayoutReport, stepAndRepeat, type UpsLayout } from './layout/stepAndRepeat';
import { readPdf } from './pdf/readPdf';
import { readSvg } from './svg/readSvg';
import { buildChains } from './topology/chains';
import { removeDuplicates } from './topology/duplicates';
import { buildNetwork } from './topology/network';
import { isUnitName, type UnitName } from './unitNames';

export interface AnalyseOptions {
  /** Only words errors; the format is found from the content. */
  fileName?: string;
  /** Reads the content as this format, skipping detection. */
  format?: DielineFormat;
  /** Layer or label name → rule type, over the keywords; names match case-insensitively. */
  layerMap?: LayerMap;
  /** Die board margin around the rules on each side, in inches (default 1). */
  marginIn?: number;
  /** The press to check the board against; fitsPress is null without one. */
  press?: Press | null;
  /** What one drawing unit is, over $INSUNITS (DXF) or width/height/viewBox (SVG); a PDF's are points. */
  units?: UnitName;
  /** The PDF page to measure, from 1 (default: the first with stroked lines). */
  page?: number;
  /** The drawing is one up: lay it out into the whole die, which is what is measured. */
  layout?: UpsLayout | null;
  /** Tighter or looser bounds than DEFAULT_LIMITS. */
  limits?: Partial<Limits>;
}

/** The metrics as JSON: every length in inches, lengthMm repeating `length` in millimetres. */
export interface DielineMetrics {
  units: 'in';
  length: LengthByType;
  lengthMm: LengthByType;
  curves: number;
  minRadius: number | null;
  bends: number;
  joints: number;
  closedContours: number;
  punches: number;
  bbox: Size;
  board: Size;
  complexity: Complexity;
  warnings: string[];
  fitsPress: boolean | null;
  layers: LayerInfo[];
  /** For a PDF: the page measured, from 1, and how many pages it has. */
  page?: { number: number; count: number };
  /** For a one-up drawing: how the whole die measured here was laid out, and one up's lengths. */
  layout?: LayoutReport & { oneUpLength: LengthByType };
}

export interface DielineAnalysis {
  metrics: DielineMetrics;
  /** Geometry to draw the dieline, kept apart from the metrics. */
  preview: DielinePreview;
  format: DielineFormat;
  /** What one unit of the drawing was taken to be. */
  drawingUnits: DrawingUnits;
}

/**
 * Analyses a DXF or SVG dieline, synchronously. A PDF needs analyseDielineAsync (its reader is
 * asynchronous). Throws DielineError, with a code and a plain message, on bad input.
 */
export function analyseDieline(content: string | Uint8Array, opts: AnalyseOptions = {}): DielineAnalysis {
  const { text, format, limits, resolve } = prepare(content, opts);
  if (format === 'pdf') {
    throw new DielineError('UNSUPPORTED_FORMAT', 'A PDF dieline is read by analyseDielineAsync.');
  }
  const drawing =
    format === 'dxf'
      ? readDxf(text, { resolve, limits, units: opts.units })
      : readSvg(text, { resolve, limits, units: opts.units });
  return measure(drawing, format, opts, limits);
}

/** Analyses a DXF, SVG or PDF dieline. Rejects with DielineError, with a code and a plain message, on bad input. */
export async function analyseDielineAsync(
  content: string | Uint8Array,
  opts: AnalyseOptions = {},
): Promise<DielineAnalysis> {
  const { format, limits, resolve } = prepare(content, opts);
  if (format !== 'pdf') return analyseDieline(content, { ...opts, format });
  if (typeof content === 'string') {
    throw new DielineError('BINARY', 'A PDF is binary: pass its bytes, not text.');
  }
  const drawing = await readPdf(content, { resolve, limits, page: opts.page });
  return measure(drawing, format, opts, limits);
}

function prepare(content: string | Uint8Array, opts: AnalyseOptions) {
  checkOptions(opts);
  const limits: Limits = { ...DEFAULT_LIMITS, ...opts.limits };
  const text = decodeInput(content, limits.maxBytes);
  const format = opts.format ?? detectFormat(text, opts.fileName);
  return { text, format, limits, resolve: createRuleTypeResolver(opts.layerMap) };
}

/** The metrics and preview of a drawing read from any format. */
function measure(read: Drawing, format: DielineFormat, opts: AnalyseOptions, limits: Limits): DielineAnalysis {
  if (read.paths.length === 0) {
    throw new DielineError('NO_GEOMETRY', 'The drawing has no lines, arcs or curves to measure.');
  }
  const warnings = [...read.warnings];
  let drawing = read;
  let layout: DielineMetrics['layout'];
  if (opts.layout) {
    const laid = stepAndRepeat(read, opts.layout, {
      press: opts.press,
      marginIn: opts.marginIn ?? DEFAULT_MARGIN_IN,
      limits,
    });
    drawing = laid.drawing;
    warnings.push(...laid.notes);
    layout = { ...laid.report, oneUpLength: lengthsByType(removeDuplicates(read.paths).paths) };
  }

  const dedup = removeDuplicates(drawing.paths);
  if (dedup.removed > 0) {
    const at = dedup.firstAt!;
    warnings.push(
      `${dedup.removed} duplicate or overlapping segment${dedup.removed === 1 ? ' was' : 's were'} counted once ` +
        `(the first near x ${at.x.toFixed(3)} in, y ${at.y.toFixed(3)} in).`,
    );
  }
  const paths = dedup.paths;
  const priced: RulePath[] = paths.filter((p) => p.ruleType !== 'other');
  const otherLayers = [...new Set(drawing.layers.filter((l) => l.ruleType === 'other').map((l) => l.name))];
  if (otherLayers.length > 0) {
    warnings.push(
      `Not priced (no rule type): ${otherLayers.map((n) => `"${n}"`).join(', ')}. Name the rule type in the layer or map the layer.`,
    );
  }
  if (priced.length === 0) warnings.push('No cutting, creasing, perforating or kiss-cut rules were found.');

  const net = buildNetwork(priced);
  const chains = buildChains(net);
  const length = lengthsByType(paths);
  const { curves, minRadius } = countCurves(net.segments);
  const bends = countBends(net);
  const joints = countJoints(
    net,
    undefined,
    dedup.index ? { index: dedup.index, netOf: networkIds(paths, dedup.origin, dedup.index.numItems) } : undefined,
  );
  const { closedContours, punches } = countContours(net, chains);
  const pricedBounds = boundsOf(priced);
  const bbox = sizeOf(pricedBounds);
  const board = priced.length > 0 ? boardSize(bbox, opts.marginIn ?? DEFAULT_MARGIN_IN) : { width: 0, height: 0 };
  const pricedLength = length.total - length.other;

  const metrics: DielineMetrics = {
    units: 'in',
    length,
    lengthMm: toMm(length),
    curves,
    minRadius,
    bends,
    joints,
    closedContours,
    punches,
    bbox,
    board,
    complexity: complexityOf({ bends, curves, joints, punches }, pricedLength),
    warnings,
    fitsPress: opts.press && priced.length > 0 ? fitsPress(board, opts.press) : null,
    layers: [...drawing.layers].sort((a, b) => a.name.localeCompare(b.name) || a.ruleType.localeCompare(b.ruleType)),
    ...(drawing.page ? { page: drawing.page } : {}),
    ...(layout ? { layout } : {}),
  };
  // With every rule priced the preview's frame is the same box: not measured twice.
  const allBounds = priced.length === paths.length ? pricedBounds : boundsOf(paths);
  return { metrics, preview: buildPreview(paths, allBounds, drawing.yUp), format, drawingUnits: drawing.units };
}

function checkOptions(opts: AnalyseOptions): void {
  const bad = (what: string) => {
    throw new DielineError('BAD_OPTION', what);
  };
  if (opts.format !== undefined && !(FORMATS as readonly string[]).includes(opts.format))
    bad(`Unknown format "${opts.format}".`);
  if (opts.marginIn !== undefined && !(Number.isFinite(opts.marginIn) && opts.marginIn >= 0)) {
    bad('The board margin must be a number of inches, 0 or more.');
  }
  if (opts.press) {
    const { widthIn, lengthIn } = opts.press;
    if (!(widthIn > 0 && lengthIn > 0 && Number.isFinite(widthIn) && Number.isFinite(lengthIn))) {
      bad('The press sheet size must be two positive numbers of inches.');
    }
  }
  if (opts.units !== undefined && !isUnitName(opts.units))
    bad(`Unknown units "${String(opts.units)}"; use in, mm, cm, m, ft or px.`);
  if (opts.page !== undefined && !(Number.isInteger(opts.page) && opts.page >= 1))
    bad('The page must be a whole number, 1 or more.');
  for (const [layer, type] of Object.entries(opts.layerMap ?? {})) {
    if (!isRuleType(type))
      bad(`Layer "${layer}" is mapped to "${String(type)}"; use cut, crease, perf, kiss or other.`);
  }
}
