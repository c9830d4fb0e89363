import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { type Drawing, DrawingBuilder } from '../drawing';
import { DielineError } from '../errors';
import { toSvgMatrix } from '../geometry/matrix';
import type { Limits } from '../limits';
import type { RuleTypeResolver } from '../ruleType';
import type { UnitName } from '../unitNames';
import { pathSegments } from './pathSegments';
import { isShape, shapePathData } from './shapes';
import { rootViewport } from './viewport';

export interface ReadSvgOptions {
  resolve: RuleTypeResolver;
  limits: Limits;
  /** Says what one user unit is, instead of width, height and viewBox. */
  units?: UnitName;
}

/** fast-xml-parser's ordered form: one key naming the element, ':@' holding its attributes. */
type XmlNode = Record<string, unknown>;
type Attrs = Record<string, unknown>;

/** Elements whose content is never drawn as rules. */
const NOT_DRAWN = new Set([
  'defs',
  'symbol',
  'clipPath',
  'mask',
  'pattern',
  'marker',
  'metadata',
  'title',
  'desc',
  'style',
  'script',
  'text',
  'foreignObject',
  'image',
  'linearGradient',
  'radialGradient',
  'filter',
]);

/** Attributes that may name a rule type, nearest first: labels, then id, then classes. */
const LABEL_ATTRIBUTES = ['inkscape:label', 'data-label', 'data-name', 'aria-label', 'sodipodi:label', 'id'];

// fast-xml-parser throws a plain Error where it refuses a document (a DOCTYPE with external
// entities, which are never expanded): every refusal is the user's file, so say so.
function parseXml(parser: XMLParser, text: string): XmlNode[] {
  try {
    return parser.parse(text) as XmlNode[];
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    throw new DielineError(
      'MALFORMED',
      `The SVG file could not be read: ${why}. Export it again as plain SVG, without a DOCTYPE.`,
    );
  }
}

/** Reads an SVG document into rule paths in inches. */
export function readSvg(text: string, opts: ReadSvgOptions): Drawing {
  const valid = XMLValidator.validate(text);
  if (valid !== true) {
    const { msg, line, col } = valid.err;
    const truncated = endsEarly(text);
    throw new DielineError(
      truncated ? 'TRUNCATED' : 'MALFORMED',
      truncated
        ? `The SVG file ends before its elements are closed (at line ${text.split('\n').length}): it looks cut short. Export it again.`
        : `The SVG file is not well-formed XML: ${msg} (line ${line}, column ${col}).`,
    );
  }
  const parser = new XMLParser({
    preserveOrder: true,
    ignoreAttributes: false,
    attributeNamePrefix: '',
    parseAttributeValue: false,
    parseTagValue: false,
    processEntities: false,
    ignoreDeclaration: true,
    ignorePiTags: true,
  });
  const doc = parseXml(parser, text);
  const root = doc.find((n) => localName(tagOf(n)) === 'svg');
  if (!root) throw new DielineError('MALFORMED', 'The file is XML but has no <svg> root element.');

  const b = new DrawingBuilder(opts.limits);
  const viewport = rootViewport(attrsOf(root), opts.units, (m) => b.warn(m));
  const rootTransform = toSvgMatrix(viewport.matrix);

  const walk = (node: XmlNode, transforms: string[], names: string[], isRoot: boolean): void => {
    const tag = tagOf(node);
    const name = localName(tag);
    if (name === null || NOT_DRAWN.has(name)) return;
    const attrs = attrsOf(node);
    if (hidden(attrs)) {
      b.warn('Hidden elements (display: none) were skipped.');
      return;
    }
    const own = typeof attrs.transform === 'string' ? [attrs.transform] : [];
    if (name === 'svg' && !isRoot) {
      // A nested viewport: its x and y move it; its own viewBox scaling is not applied.
      own.unshift(
        `translate(${Number.parseFloat(String(attrs.x ?? 0)) || 0} ${Number.parseFloat(String(attrs.y ?? 0)) || 0})`,
      );
      if (attrs.viewBox !== undefined)
        b.warn('A nested <svg> viewBox was not applied; check the scale of its contents.');
    }
    const chain = [...transforms, ...own];
    const nearNames = [...labels(attrs), ...names];
    if (name === 'use') {
      b.warn('<use> references were not followed; draw those rules as paths.');
      return;
    }
    if (isShape(name)) {
      shape(name, attrs, chain, nearNames);
      return;
    }
    for (const child of childrenOf(node)) walk(child, chain, nearNames, false);
  };

  const shape = (name: Parameters<typeof shapePathData>[0], attrs: Attrs, chain: string[], names: string[]) => {
    const choice = opts.resolve(names);
    b.countEntity(choice);
    const d = shapePathData(name, attrs);
    if (d.startsWith('!')) {
      b.warn(`Skipped ${d.slice(1)}.`);
      return;
    }
    if (d.trim() === '') return;
    const result = pathSegments(d, chain.join(' '));
    if (result.error) b.warn(`Path data with an error was read up to the error: ${result.error}.`);
    for (const sp of result.subpaths) b.addPath(choice, sp.segments, sp.closed);
  };

  walk(root, [rootTransform], [], true);
  return b.finish(viewport.units, false);
}

function tagOf(node: XmlNode): string {
  for (const k of Object.keys(node)) if (k !== ':@') return k;
  return '';
}

/** The SVG element name without an "svg:" prefix; null for text nodes and foreign elements. */
function localName(tag: string): string | null {
  if (tag === '' || tag.startsWith('#') || tag.startsWith('?') || tag.startsWith('!')) return null;
  const colon = tag.indexOf(':');
  if (colon < 0) return tag;
  return tag.slice(0, colon) === 'svg' ? tag.slice(colon + 1) : null;
}

const attrsOf = (node: XmlNode): Attrs => (node[':@'] as Attrs | undefined) ?? {};
const childrenOf = (node: XmlNode): XmlNode[] => {
  const c = node[tagOf(node)];
  return Array.isArray(c) ? (c as XmlNode[]) : [];
};

function labels(attrs: Attrs): string[] {
  const out: string[] = [];
  for (const key of LABEL_ATTRIBUTES) {
    const v = attrs[key];
    if (typeof v === 'string' && v.trim() !== '') out.push(v.trim());
  }
  if (typeof attrs.class === 'string') out.push(...attrs.class.split(/\s+/).filter(Boolean));
  return out;
}

function hidden(attrs: Attrs): boolean {
  if (attrs.display === 'none') return true;
  return typeof attrs.style === 'string' && /(^|;)\s*display\s*:\s*none\s*(;|$)/i.test(attrs.style);
}

/** An invalid document that does not end with its closing </svg> tag was likely cut short. */
function endsEarly(text: string): boolean {
  return !/<\/\s*(svg:)?svg\s*>$/.test(text.trimEnd());
}
