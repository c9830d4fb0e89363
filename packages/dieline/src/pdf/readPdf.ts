import { PDFArray, PDFDocument, PDFName, type PDFPage, PDFRawStream } from 'pdf-lib';
import { type Drawing, DrawingBuilder } from '../drawing';
import { DielineError } from '../errors';
import { scale } from '../geometry/matrix';
import type { Limits } from '../limits';
import type { RuleTypeResolver } from '../ruleType';
import { type PageBudget, PageRules, type PageTally } from './pageRules';
import { concat, numberOf, streamBytes } from './pdfObjects';

export interface ReadPdfOptions {
  resolve: RuleTypeResolver;
  limits: Limits;
  /** The page to measure, from 1; without it, the first page with stroked lines. */
  page?: number;
}

const plural = (k: number, one: string, many = `${one}s`) => `${k} ${k === 1 ? one : many}`;

/**
 * Reads the stroked paths of one PDF page into rule paths in inches: PDF units are points,
 * 1/72 in, times the page's /UserUnit (ISO 32000-1, 14.11.2). pdf-lib parses the file; nothing
 * in it is run (JavaScript, actions and annotations are never looked at).
 */
export async function readPdf(bytes: Uint8Array, opts: ReadPdfOptions): Promise<Drawing> {
  const doc = await load(bytes);
  const pages = pagesOf(doc);
  if (pages.length === 0) throw new DielineError('NO_GEOMETRY', 'The PDF has no pages.');
  const chosen = opts.page;
  if (chosen !== undefined && !(Number.isInteger(chosen) && chosen >= 1 && chosen <= pages.length)) {
    throw new DielineError(
      'BAD_OPTION',
      `The PDF has ${plural(pages.length, 'page')}; there is no page ${String(chosen)} to measure.`,
    );
  }
  const budget: PageBudget = { operators: opts.limits.maxPdfOperators, bytes: opts.limits.maxPdfContentBytes };
  const tried: Array<{ number: number; tally: PageTally }> = [];
  for (const index of chosen ? [chosen - 1] : pages.map((_, i) => i)) {
    const page = pages[index]!;
    const userUnit = numberOf(page.node.get(PDFName.of('UserUnit'))) ?? 1;
    const builder = new DrawingBuilder(opts.limits);
    const rules = new PageRules(builder, opts.resolve, budget, scale(userUnit / 72));
    rules.run(pageContent(page, budget), page.node.Resources());
    const number = index + 1;
    if (rules.tally.stroked === 0) {
      tried.push({ number, tally: rules.tally });
      continue;
    }
    noteWhatWasLeft(builder, rules.tally, { number, count: pages.length, chosen: chosen !== undefined });
    const units = {
      name: userUnit === 1 ? 'pt (1/72 in)' : `pt × UserUnit ${userUnit} (${userUnit}/72 in)`,
      inchesPerUnit: userUnit / 72,
      source: 'file' as const,
    };
    return { ...builder.finish(units, true), page: { number, count: pages.length } };
  }
  throw nothingToMeasure(tried, pages.length);
}

async function load(bytes: Uint8Array): Promise<PDFDocument> {
  let doc: PDFDocument;
  try {
    doc = await PDFDocument.load(bytes, { ignoreEncryption: true, updateMetadata: false, throwOnInvalidObject: false });
  } catch (error) {
    const why = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new DielineError('MALFORMED', `The PDF could not be read (${why}). Save it again from the drawing program.`);
  }
  if (doc.isEncrypted) {
    throw new DielineError(
      'ENCRYPTED',
      'The PDF is encrypted (password-protected or restricted), so its drawing cannot be read. Save a copy without security and upload that.',
    );
  }
  return doc;
}

function pagesOf(doc: PDFDocument): PDFPage[] {
  try {
    return doc.getPages();
  } catch (error) {
    const why = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new DielineError(
      'MALFORMED',
      `The PDF's list of pages is broken (${why}); it may be cut short. Save it again from the drawing program.`,
    );
  }
}

/** A page's content streams, decoded and joined (ISO 32000-1, 7.7.3.3: an array reads as one stream). */
function pageContent(page: PDFPage, budget: PageBudget): Uint8Array {
  const contents = page.node.Contents();
  const streams =
    contents instanceof PDFArray ? contents.asArray().map((o) => page.node.context.lookup(o)) : [contents];
  const parts: Uint8Array[] = [];
  for (const s of streams) {
    if (!(s instanceof PDFRawStream)) continue;
    const bytes = streamBytes(s, budget.bytes);
    budget.bytes -= bytes.length;
    parts.push(bytes, new Uint8Array([10]));
  }
  return concat(parts);
}

function noteWhatWasLeft(
  b: DrawingBuilder,
  tally: PageTally,
  page: { number: number; count: number; chosen: boolean },
): void {
  if (page.count > 1) {
    b.warn(
      `The PDF has ${page.count} pages; page ${page.number} was measured${page.chosen ? '' : ' (the first with stroked lines)'}. Choose another page to measure that one instead.`,
    );
  }
  if (tally.fillOnly > 0) {
    b.warn(
      `${plural(tally.fillOnly, 'filled shape')} (artwork or text) ${tally.fillOnly === 1 ? 'was' : 'were'} not measured: only stroked lines are rules.`,
    );
  }
  if (tally.images > 0)
    b.warn(`${plural(tally.images, 'image')} on the page ${tally.images === 1 ? 'was' : 'were'} not measured.`);
  if (b.paths.every((p) => p.ruleType === 'other')) {
    const list = (label: string, names: Set<string>) =>
      names.size > 0 ? `${label} ${[...names].map((n) => `"${n}"`).join(', ')}` : `no ${label}`;
    b.warn(
      `No separation or layer says cut, crease, perf or kiss (found ${list('separations', tally.separations)}; ${list('layers', tally.layers)}). Map them to rule types.`,
    );
  }
}

function nothingToMeasure(tried: Array<{ number: number; tally: PageTally }>, count: number): DielineError {
  const where = tried.length === 1 && count > 1 ? `Page ${tried[0]!.number} of the PDF` : 'The PDF';
  const fills = tried.reduce((t, p) => t + p.tally.fillOnly, 0);
  const images = tried.reduce((t, p) => t + p.tally.images, 0);
  if (fills > 0) {
    return new DielineError(
      'NO_GEOMETRY',
      `${where} has only filled shapes (${plural(fills, 'shape')}), no stroked lines to measure as rules. Export the dieline with its rules as stroked paths.`,
    );
  }
  return new DielineError(
    'NO_VECTORS',
    images > 0
      ? `${where} holds only ${images === 1 ? 'an image' : 'images'} (a scan or a flattened export), no vector lines to measure. Export the dieline from the drawing program as a vector PDF, DXF or SVG.`
      : `${where} has no vector lines to measure. Export the dieline from the drawing program as a vector PDF, DXF or SVG.`,
  );
}
