import { PDFDict, PDFName, PDFRawStream, PDFRef, type PDFObject } from 'pdf-lib';
import type { DrawingBuilder } from '../drawing';
import { DielineError } from '../errors';
import { bezier } from '../geometry/bezier';
import { apply, type Matrix, multiply } from '../geometry/matrix';
import { line, type Segment } from '../geometry/segment';
import type { Pt } from '../geometry/vec';
import { MAX_BLOCK_DEPTH } from '../limits';
import type { RuleTypeResolver } from '../ruleType';
import { ContentLexer, type Operand, PdfName } from './contentLexer';
import { colorantNames, formMatrix, optionalContentName, resource, streamBytes, textOf } from './pdfObjects';

/** What walking one page found besides its rules. */
export interface PageTally {
  stroked: number;
  /** Paths only filled (artwork, text outlines): not rules, not measured. */
  fillOnly: number;
  images: number;
  separations: Set<string>;
  layers: Set<string>;
}

export interface PageBudget {
  /** Operators left to run across the page and its forms. */
  operators: number;
  /** Decoded content bytes left. */
  bytes: number;
}

interface GraphicsState {
  ctm: Matrix;
  /** Colorant names of the stroke colour space (Separation or DeviceN). */
  strokeColorants: string[];
}

interface Subpath {
  segments: Segment[];
  closed: boolean;
  start: Pt;
}

const NO_LAYER = '(no separation or layer)';

/**
 * Walks a page's drawing instructions (ISO 32000-1, 8.2–8.5 and 8.10): the graphics state
 * with q/Q/cm, path construction (m l c v y h re), painting (stroked paths are rules, filled
 * ones are counted and left), colour spaces for separation names, marked content for layers,
 * and form XObjects with their own matrix, resources and layer. Text, images and shadings are
 * not rules. Every stroked path goes to the builder in inches.
 */
export class PageRules {
  readonly tally: PageTally = { stroked: 0, fillOnly: 0, images: 0, separations: new Set(), layers: new Set() };
  private state: GraphicsState;
  private readonly saved: GraphicsState[] = [];
  /** Layer names of the open marked-content sequences, outermost first (null: not a layer). */
  private readonly marked: Array<string | null> = [];
  private path: Subpath[] = [];
  private current: Pt | null = null;
  private readonly formsOpen = new Set<PDFObject>();
  /** Colorant names by resource dictionary and colour space name: a page sets the same few spaces often. */
  private readonly colorants = new Map<PDFDict | undefined, Map<string, string[]>>();

  constructor(
    private readonly builder: DrawingBuilder,
    private readonly resolve: RuleTypeResolver,
    private readonly budget: PageBudget,
    pageMatrix: Matrix,
  ) {
    this.state = { ctm: pageMatrix, strokeColorants: [] };
  }

  /** Runs one content stream (the page's, or a form's) under its resources. */
  run(content: Uint8Array, resources: PDFDict | undefined, depth = 0): void {
    const lexer = new ContentLexer(content);
    for (let o = lexer.next(); o; o = lexer.next()) {
      if (--this.budget.operators < 0) {
        throw new DielineError(
          'TOO_MANY_ENTITIES',
          'The PDF page has too many drawing instructions to measure; export the dieline alone, without the artwork.',
        );
      }
      this.operate(o.op, o.operands, resources, depth);
    }
  }

  private operate(op: string, args: Operand[], resources: PDFDict | undefined, depth: number): void {
    const num = (i: number) => (typeof args[i] === 'number' ? (args[i] as number) : 0);
    const at = (i: number): Pt => apply(this.state.ctm, { x: num(i), y: num(i + 1) });
    switch (op) {
      case 'q':
        this.saved.push({ ...this.state });
        break;
      case 'Q':
        this.state = this.saved.pop() ?? this.state;
        break;
      case 'cm':
        this.state = {
          ...this.state,
          ctm: multiply(this.state.ctm, { a: num(0), b: num(1), c: num(2), d: num(3), e: num(4), f: num(5) }),
        };
        break;
      case 'm':
        this.moveTo(at(0));
        break;
      case 'l':
        this.lineTo(at(0));
        break;
      case 'c':
        this.curveTo([at(0), at(2), at(4)]);
        break;
      case 'v':
        if (this.current) this.curveTo([this.current, at(0), at(2)]);
        break;
      case 'y':
        this.curveTo([at(0), at(2), at(2)]);
        break;
      case 'h':
        this.closePath();
        break;
      case 're': {
        const [x, y, w, h] = [num(0), num(1), num(2), num(3)];
        const m = this.state.ctm;
        this.moveTo(apply(m, { x, y }));
        this.lineTo(apply(m, { x: x + w, y }));
        this.lineTo(apply(m, { x: x + w, y: y + h }));
        this.lineTo(apply(m, { x, y: y + h }));
        this.closePath();
        break;
      }
      case 's':
        this.closePath();
        this.paint(true);
        break;
      case 'S':
        this.paint(true);
        break;
      case 'b':
      case 'b*':
        this.closePath();
        this.paint(true);
        break;
      case 'B':
      case 'B*':
        this.paint(true);
        break;
      case 'f':
      case 'F':
      case 'f*':
        this.paint(false);
        break;
      case 'n':
        this.endPath();
        break;
      case 'CS':
        this.state = {
          ...this.state,
          strokeColorants: args[0] instanceof PdfName ? this.colorantsOf(resources, args[0].name) : [],
        };
        break;
      case 'G':
      case 'RG':
      case 'K':
        this.state = { ...this.state, strokeColorants: [] };
        break;
      case 'BMC':
        this.marked.push(null);
        break;
      case 'BDC':
        this.marked.push(this.markedLayer(args, resources));
        break;
      case 'EMC':
        this.marked.pop();
        break;
      case 'Do':
        if (args[0] instanceof PdfName) this.drawXObject(args[0].name, resources, depth);
        break;
      case 'ID':
        this.tally.images++; // an inline image (BI … ID … EI)
        break;
      default:
        break; // text, colours of fills, line style, shading: not rules
    }
  }

  private colorantsOf(resources: PDFDict | undefined, name: string): string[] {
    let known = this.colorants.get(resources);
    if (!known) this.colorants.set(resources, (known = new Map()));
    let names = known.get(name);
    if (!names) known.set(name, (names = colorantNames(resources, name)));
    return names;
  }

  private moveTo(p: Pt): void {
    this.path.push({ segments: [], closed: false, start: p });
    this.current = p;
  }

  private lineTo(p: Pt): void {
    if (!this.current) return this.moveTo(p);
    this.openSubpath().segments.push(line(this.current, p));
    this.current = p;
  }

  private curveTo([c1, c2, p]: [Pt, Pt, Pt]): void {
    if (!this.current) return this.moveTo(p);
    this.openSubpath().segments.push(bezier([this.current, c1, c2, p]));
    this.current = p;
  }

  /** The subpath being drawn; a new one from the current point after a close. */
  private openSubpath(): Subpath {
    const last = this.path[this.path.length - 1];
    if (last && !last.closed) return last;
    const fresh = { segments: [], closed: false, start: this.current! };
    this.path.push(fresh);
    return fresh;
  }

  private closePath(): void {
    const sp = this.path[this.path.length - 1];
    if (!sp || sp.closed || !this.current) return;
    const { x, y } = sp.start;
    if (this.current.x !== x || this.current.y !== y) sp.segments.push(line(this.current, sp.start));
    sp.closed = true;
    this.current = sp.start;
  }

  private paint(stroked: boolean): void {
    const drawn = this.path.filter((sp) => sp.segments.length > 0);
    if (drawn.length > 0) {
      if (!stroked) this.tally.fillOnly++;
      else {
        this.tally.stroked++;
        for (const c of this.state.strokeColorants) this.tally.separations.add(c);
        const choice = this.resolve(this.names(), NO_LAYER);
        this.builder.countEntity(choice);
        for (const sp of drawn) this.builder.addPath(choice, sp.segments, sp.closed);
      }
    }
    this.endPath();
  }

  private endPath(): void {
    this.path = [];
    this.current = null;
  }

  /** Names that may say a stroke's rule type, nearest first: its separation, then its layers inside out. */
  private names(): string[] {
    const layers = this.marked.filter((l): l is string => l !== null).reverse();
    return [...this.state.strokeColorants, ...layers];
  }

  /** The layer a BDC opens: /OC with a name in /Properties, or inline (ISO 32000-1, 8.11.3.2). */
  private markedLayer(args: Operand[], resources: PDFDict | undefined): string | null {
    if (!(args[0] instanceof PdfName) || args[0].name !== 'OC') return null;
    const props = args[1];
    const name = props instanceof PdfName ? optionalContentName(resource(resources, 'Properties', props.name)) : null;
    if (name) this.tally.layers.add(name);
    return name;
  }

  private drawXObject(name: string, resources: PDFDict | undefined, depth: number): void {
    const xobject = resource(resources, 'XObject', name);
    if (!(xobject instanceof PDFRawStream)) return;
    const subtype = textOf(xobject.dict.get(PDFName.of('Subtype')));
    if (subtype === 'Image') {
      this.tally.images++;
      return;
    }
    if (subtype !== 'Form') return;
    if (depth >= MAX_BLOCK_DEPTH || this.formsOpen.has(xobject)) {
      throw new DielineError(
        'MALFORMED',
        'The PDF draws a form inside itself, or nests forms too deep to follow; save the PDF again from the drawing program.',
      );
    }
    const content = streamBytes(xobject, this.budget.bytes);
    this.budget.bytes -= content.length;
    const own = xobject.dict.lookupMaybe(PDFName.of('Resources'), PDFDict);
    const ocEntry = xobject.dict.get(PDFName.of('OC'));
    const layer = optionalContentName(ocEntry instanceof PDFRef ? xobject.dict.context.lookup(ocEntry) : ocEntry);
    if (layer) this.tally.layers.add(layer);

    // A form runs as if between q and Q, with its matrix on the CTM (ISO 32000-1, 8.10.1).
    const outer = { state: this.state, saved: this.saved.length, marked: this.marked.length, path: this.path };
    this.state = { ...this.state, ctm: multiply(this.state.ctm, formMatrix(xobject)) };
    this.marked.push(layer);
    this.path = [];
    this.formsOpen.add(xobject);
    try {
      this.run(content, own ?? resources, depth + 1);
    } finally {
      this.formsOpen.delete(xobject);
      this.state = outer.state;
      this.saved.length = Math.min(this.saved.length, outer.saved);
      this.marked.length = outer.marked;
      this.path = outer.path;
      this.current = null;
    }
  }
}
