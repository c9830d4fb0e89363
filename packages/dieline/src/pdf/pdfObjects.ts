import {
  decodePDFRawStream,
  PDFArray,
  PDFDict,
  PDFHexString,
  PDFName,
  PDFNumber,
  PDFRawStream,
  PDFRef,
  PDFString,
  type PDFObject,
} from 'pdf-lib';
import { DielineError } from '../errors';
import type { Matrix } from '../geometry/matrix';

// Small lookups over pdf-lib's objects: the resources a page's drawing instructions name.

const n = (name: string) => PDFName.of(name);

/** The text of a name or string object, or null. */
export function textOf(o: PDFObject | undefined): string | null {
  if (o instanceof PDFName) return o.decodeText();
  if (o instanceof PDFString || o instanceof PDFHexString) return o.decodeText();
  return null;
}

/** An entry of a named resource category (ColorSpace, XObject, Properties), dereferenced. */
export function resource(resources: PDFDict | undefined, category: string, name: string): PDFObject | undefined {
  const dict = resources?.lookupMaybe(n(category), PDFDict);
  const entry = dict?.get(n(name));
  return entry instanceof PDFRef ? dict!.context.lookup(entry) : entry;
}

const DEVICE_SPACES = new Set(['DeviceGray', 'DeviceRGB', 'DeviceCMYK', 'Pattern', 'G', 'RGB', 'CMYK']);

/**
 * The colorant names of a colour space: a Separation's one name, a DeviceN's names (without
 * "None"); an empty list for device, ICC-based and other spaces (ISO 32000-1, 8.6.6.4–8.6.6.5).
 */
export function colorantNames(resources: PDFDict | undefined, name: string): string[] {
  if (DEVICE_SPACES.has(name)) return [];
  const space = resource(resources, 'ColorSpace', name);
  if (!(space instanceof PDFArray) || space.size() < 2) return [];
  const family = textOf(space.lookup(0));
  if (family === 'Separation') {
    const colorant = textOf(space.lookup(1));
    return colorant && colorant !== 'None' ? [colorant] : [];
  }
  if (family === 'DeviceN') {
    const names = space.lookup(1);
    if (!(names instanceof PDFArray)) return [];
    return Array.from({ length: names.size() }, (_, i) => textOf(names.lookup(i))).filter(
      (s): s is string => !!s && s !== 'None',
    );
  }
  return [];
}

/** The name of an optional-content group, or of the first group of a membership dictionary. */
export function optionalContentName(o: PDFObject | undefined, depth = 0): string | null {
  if (!(o instanceof PDFDict) || depth > 4) return null;
  const type = textOf(o.get(n('Type')));
  if (type === 'OCMD') {
    const groups = o.lookup(n('OCGs'));
    if (groups instanceof PDFArray && groups.size() > 0) return optionalContentName(groups.lookup(0), depth + 1);
    return optionalContentName(groups, depth + 1);
  }
  return textOf(o.lookup(n('Name')));
}

export function numberOf(o: PDFObject | undefined): number | null {
  return o instanceof PDFNumber && Number.isFinite(o.asNumber()) ? o.asNumber() : null;
}

/** A form XObject's /Matrix, identity when absent or malformed. */
export function formMatrix(form: PDFRawStream): Matrix {
  const m = form.dict.lookup(n('Matrix'));
  const v = m instanceof PDFArray && m.size() === 6 ? m.asArray().map((x) => numberOf(x)) : null;
  if (!v || v.some((x) => x === null)) return { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };
  const [a, b, c, d, e, f] = v as number[];
  return { a: a!, b: b!, c: c!, d: d!, e: e!, f: f! };
}

/**
 * A stream's decoded bytes, refusing to decode more than `budget` bytes (a small file can
 * inflate to gigabytes). Image compressions (DCT, JPX, JBIG2, CCITT) are not decoded.
 */
export function streamBytes(stream: PDFRawStream, budget: number): Uint8Array {
  const chunks: Uint8Array[] = [];
  let size = 0;
  try {
    const decoded = decodePDFRawStream(stream);
    // In chunks: asking for the whole budget at once would allocate all of it.
    for (;;) {
      const chunk = decoded.getBytes(65536);
      if (chunk.length === 0) break;
      chunks.push(Uint8Array.from(chunk));
      size += chunk.length;
      if (size > budget) break;
    }
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    throw new DielineError(
      'MALFORMED',
      `A drawing stream of the PDF could not be decoded (${why}). Save the PDF again from the drawing program.`,
    );
  }
  if (size > budget) {
    throw new DielineError(
      'TOO_LARGE',
      `The PDF page's drawing instructions unpack to more than ${Math.round(budget / 1048576)} MB; simplify the page or export the dieline alone.`,
    );
  }
  return concat(chunks, size);
}

export function concat(chunks: Uint8Array[], size = chunks.reduce((t, c) => t + c.length, 0)): Uint8Array {
  if (chunks.length === 1) return chunks[0]!;
  const out = new Uint8Array(size);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}
